import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useState, type FormEvent } from 'react';
import { LAYER_SPREAD_FIELDS } from '../../../../shared/physics/spread/layer-margin-evaluator';
import { INLINE_SPREAD_LIMIT, spreadFieldLabels, type PropertySpread, type SpreadField, type SpreadUncertaintyInput } from '../../../../shared/schemas/property-spreads';
import { formatSignificant } from '../../../../shared/units/format-significant';
import { Button } from '../../../components/ui/button';
import { Field, Input, Select, TextField } from '../../../components/ui/field';
import { Loading } from '../../../components/ui/loading';
import { Notice } from '../../../components/ui/notice';
import { StatusBadge } from '../../../components/ui/status-badge';
import { isApiError } from '../../../lib/api-client';
import { formatDateTime } from '../../../utils/format';
import { useRunSpread, useSpread, useSpreadsOfCheck } from '../api/spread-api';
import { SpreadSensitivityChart } from './spread-sensitivity-chart';

const pct = (x: number) => (x < 1e-9 ? '0 %' : `${formatSignificant(x * 100, 3)} %`);
const margin = (x: number | null) => (x === null ? '∞' : `${formatSignificant(x, 3)} ×`);
const fieldLabel = (name: string) => spreadFieldLabels[name as SpreadField] ?? name;

function ProgressBar({ spread }: { spread: PropertySpread }) {
  const percent = Math.round(spread.progress * 100);
  return (
    <div>
      <div className="mb-1 flex justify-between text-sm">
        <span>
          {spread.status === 'queued' ? 'Waiting for a worker…' : 'Sampling…'} {spread.evaluatedSamples.toLocaleString('en-GB')} of {spread.samples.toLocaleString('en-GB')} samples
        </span>
        <span className="font-semibold">{percent} %</span>
      </div>
      <div role="progressbar" aria-label="Property spread progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={percent} className="h-3 overflow-hidden rounded-full bg-paper-sunk">
        <div className="h-full rounded-full bg-brand transition-[width]" style={{ width: `${percent}%` }} />
      </div>
    </div>
  );
}

function SpreadResultView({ spread }: { spread: PropertySpread }) {
  const r = spread.result;
  if (!r) return null;
  const p = r.marginPercentiles as { p5: number | null; p50: number | null; p95: number | null };
  const tone = r.onsetProbability >= 0.05 ? 'over' : r.onsetProbability > 0.001 ? 'close' : 'quiet';
  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <div className="rounded-md border border-slate-line bg-paper-raised p-4">
          <p className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Probability of onset</p>
          <p className="mt-1 text-3xl font-semibold">{pct(r.onsetProbability)}</p>
          <p className="mt-1 text-sm text-ink-soft">
            95 % interval {pct(r.onsetInterval95[0])} – {pct(r.onsetInterval95[1])} (Wilson), {r.validSamples.toLocaleString('en-GB')} samples
          </p>
          <div className="mt-2">
            <StatusBadge tone={tone}>{tone === 'quiet' ? 'Onset unlikely' : tone === 'close' ? 'Onset possible' : 'Onset likely in part of the spread'}</StatusBadge>
          </div>
        </div>
        <div className="rounded-md border border-slate-line bg-paper-raised p-4">
          <p className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Onset margin percentiles</p>
          <dl className="mt-2 grid grid-cols-3 gap-2 text-center">
            {(['p5', 'p50', 'p95'] as const).map((key) => (
              <div key={key}>
                <dt className="text-sm text-ink-soft">{key === 'p5' ? '5th' : key === 'p50' ? '50th' : '95th'}</dt>
                <dd className="text-xl font-semibold">{margin(p[key])}</dd>
              </div>
            ))}
          </dl>
          <p className="mt-2 text-sm text-ink-soft">
            {r.method === 'surrogate' ? 'Validated response surface of the stability solver.' : 'Full stability solver for every sample.'} Seed {spread.seed}: the same seed reproduces these figures.
          </p>
        </div>
      </div>
      {r.minimumMargin === null ? (
        <Notice tone="info" title="No onset possible in any sample">
          Every sample is heated from the stable side or has no drive, so the margin is infinite throughout and no property moves it.
        </Notice>
      ) : (
        <div>
          <h3 className="mb-1 font-semibold">Which property moves the margin most</h3>
          <SpreadSensitivityChart result={r} />
          <p className="text-sm text-ink-soft">Rank correlation between each sampled property and the margin; ± {formatSignificant(r.sensitivityStandardError, 2)} sampling error near 0.</p>
        </div>
      )}
    </div>
  );
}

/**
 * The Property spread of one saved layer check: run form (samples, seed, optional uncertainties),
 * a progress bar while a large run is on the queue, and the result with the sensitivity chart.
 */
export function PropertySpreadSection({ checkId, canRun }: { checkId: string; canRun: boolean }) {
  const [samples, setSamples] = useState('5000');
  const [seed, setSeed] = useState('1');
  const [custom, setCustom] = useState(false);
  const [rows, setRows] = useState<SpreadUncertaintyInput[]>([{ name: 'viscosity', uncertaintyPercent: 10, distribution: 'normal' }]);
  const run = useRunSpread();
  const history = useSpreadsOfCheck(checkId);
  const [shownId, setShownId] = useState<string | null>(null);
  useEffect(() => setShownId(null), [checkId]);
  const currentId = shownId ?? history.data?.items[0]?.id ?? null;
  const shown = useSpread(currentId);
  const fields = isApiError(run.error) ? (run.error.fields ?? {}) : {};
  const client = useQueryClient();
  const shownStatus = shown.data?.status;
  // When a queued run finishes, the list of runs shows its result too.
  useEffect(() => {
    if (shownStatus === 'done' || shownStatus === 'failed') void client.invalidateQueries({ queryKey: ['property-spreads', 'list', checkId] });
  }, [shownStatus, checkId, client]);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    run.mutate(
      { checkId, body: { samples: Number(samples), seed: Number(seed), ...(custom ? { uncertainties: rows } : {}) } },
      { onSuccess: (spread) => setShownId(spread.id) },
    );
  };
  const queued = Number(samples) > INLINE_SPREAD_LIMIT;

  return (
    <section aria-labelledby="spread-title" className="flex flex-col gap-4">
      <h2 id="spread-title" className="text-xl font-semibold">Property spread</h2>
      {canRun ? (
        <form onSubmit={submit} className="flex flex-col gap-3 rounded-md border border-slate-line bg-paper-raised p-4" aria-label="Run a property spread">
          <div className="grid gap-3 sm:grid-cols-3">
            <TextField label="Samples" inputMode="numeric" value={samples} onChange={(e) => setSamples(e.target.value)} error={fields.samples} hint={queued ? 'More than 10,000: runs on the job queue with a progress bar' : 'Up to 10,000 run at once'} />
            <TextField label="Seed" inputMode="numeric" value={seed} onChange={(e) => setSeed(e.target.value)} error={fields.seed} hint="The same seed and inputs reproduce the run exactly" />
            <Field label="Uncertainties">
              {({ id }) => (
                <Select id={id} value={custom ? 'custom' : 'library'} onChange={(e) => setCustom(e.target.value === 'custom')}>
                  <option value="library">As stated in the fluid library</option>
                  <option value="custom">Set them for this run</option>
                </Select>
              )}
            </Field>
          </div>
          {custom && (
            <div className="flex flex-col gap-2">
              {rows.map((row, i) => (
                <div key={i} className="grid grid-cols-[minmax(0,2fr)_minmax(0,1fr)_minmax(0,1.5fr)_auto] items-end gap-2">
                  <Field label={`Property ${i + 1}`} error={fields[`uncertainties.${i}.name`]}>
                    {({ id }) => (
                      <Select id={id} value={row.name} onChange={(e) => setRows(rows.map((r, j) => (j === i ? { ...r, name: e.target.value as SpreadField } : r)))}>
                        {LAYER_SPREAD_FIELDS.map((f) => (
                          <option key={f} value={f}>
                            {fieldLabel(f)}
                          </option>
                        ))}
                      </Select>
                    )}
                  </Field>
                  <Field label="± %" error={fields[`uncertainties.${i}.uncertaintyPercent`]}>
                    {({ id, invalid }) => (
                      <Input id={id} aria-invalid={invalid} inputMode="decimal" value={String(row.uncertaintyPercent)} onChange={(e) => setRows(rows.map((r, j) => (j === i ? { ...r, uncertaintyPercent: Number(e.target.value) } : r)))} />
                    )}
                  </Field>
                  <Field label="Read as">
                    {({ id }) => (
                      <Select id={id} value={row.distribution} onChange={(e) => setRows(rows.map((r, j) => (j === i ? { ...r, distribution: e.target.value as 'normal' | 'uniform' } : r)))}>
                        <option value="normal">Normal (± is 1σ)</option>
                        <option value="uniform">Uniform (± is half-width)</option>
                      </Select>
                    )}
                  </Field>
                  <Button variant="quiet" size="sm" disabled={rows.length <= 1} onClick={() => setRows(rows.filter((_, j) => j !== i))}>
                    Remove
                  </Button>
                </div>
              ))}
              <div>
                <Button variant="secondary" size="sm" onClick={() => setRows([...rows, { name: 'surfaceTension', uncertaintyPercent: 5, distribution: 'normal' }])}>
                  Add a property
                </Button>
              </div>
            </div>
          )}
          <div>
            <Button type="submit" busy={run.isPending}>
              {queued ? 'Queue the spread' : 'Run the spread'}
            </Button>
          </div>
          {run.isError && (
            <Notice tone="error" title="The spread could not start">
              {run.error.message}
            </Notice>
          )}
        </form>
      ) : (
        <p className="text-ink-soft">Process engineers run spreads; you can read every stored run below.</p>
      )}

      {shown.data ? (
        <div className="flex flex-col gap-3">
          <p className="text-sm text-ink-soft">
            Run of {formatDateTime(shown.data.createdAt)} on revision {shown.data.revision}: {shown.data.samples.toLocaleString('en-GB')} samples, seed {shown.data.seed};{' '}
            {shown.data.uncertainties.map((u) => `${fieldLabel(u.name)} ± ${u.uncertaintyPercent} % (${u.distribution})`).join(', ')}.
          </p>
          {(shown.data.status === 'queued' || shown.data.status === 'running') && <ProgressBar spread={shown.data} />}
          {shown.data.status === 'failed' && (
            <Notice tone="error" title="This spread failed">
              {shown.data.error}
            </Notice>
          )}
          {shown.data.status === 'done' && <SpreadResultView spread={shown.data} />}
        </div>
      ) : history.isPending || shown.isFetching ? (
        <Loading label="Loading spreads…" />
      ) : (
        <p className="rounded-md border border-dashed border-slate-line p-4 text-ink-soft">No spread has been run on this check yet{canRun ? ': choose samples and a seed above.' : '.'}</p>
      )}

      {history.data && history.data.items.length > 1 && (
        <div>
          <h3 className="mb-1 font-semibold">Earlier runs</h3>
          <ul className="flex flex-col gap-1 text-sm">
            {history.data.items.map((s) => (
              <li key={s.id}>
                <button type="button" className="text-brand underline-offset-2 hover:underline" onClick={() => setShownId(s.id)} aria-current={s.id === currentId || undefined}>
                  {formatDateTime(s.createdAt)} · {s.samples.toLocaleString('en-GB')} samples · seed {s.seed} · {s.status === 'done' && s.result ? `onset ${pct(s.result.onsetProbability)}` : s.status}
                </button>
              </li>
            ))}
          </ul>
        </div>
      )}
    </section>
  );
}
