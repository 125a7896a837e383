import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Field, Input, Select } from '../../../components/ui/field';
import { Loading } from '../../../components/ui/loading';
import { Notice } from '../../../components/ui/notice';
import { StatusBadge } from '../../../components/ui/status-badge';
import { useUnitSystem } from '../../../lib/unit-system';
import { useSpots, type SpotParams } from '../api/gauge-queries';
import { FlagBadge } from './flag-badge';
import { formatMargin, formatThickness } from './format-gauge';

const verdictWords = { within: 'Within', below: 'Below', above: 'Above' } as const;
const verdictTone = { within: 'quiet', below: 'over', above: 'over' } as const;

/**
 * Spots (mean of ≥ 3 readings) and areas (5 spots) of one run, judged against a range: spot means
 * within 80 % of the minimum and 120 % of the maximum, area means within the range itself
 * (SSPC-PA 2 practice; restriction level — verify against your specification).
 */
export function SpotsPanel({ revisionId, run }: { revisionId: string; run: string }) {
  const [system] = useUnitSystem();
  const [draft, setDraft] = useState<SpotParams>({ run, readingsPerSpot: 3 });
  const [params, setParams] = useState<SpotParams | null>(run ? { run, readingsPerSpot: 3 } : null);
  const spots = useSpots(revisionId, params);
  return (
    <section aria-labelledby="spots-heading" className="flex flex-col gap-3">
      <h2 id="spots-heading" className="text-lg font-semibold">
        Spots and areas
      </h2>
      <p className="text-sm text-ink-soft">
        Coating-thickness practice judges spots, not single noisy readings: a spot is the mean of at least 3 readings, an area 5 spots. Without a range, the quiet window’s
        limits are used.
      </p>
      <form
        className="no-print grid gap-3 sm:grid-cols-2 lg:grid-cols-6"
        onSubmit={(e) => {
          e.preventDefault();
          setParams({ ...draft });
        }}
      >
        <Field label="Run">{({ id }) => <Input id={id} value={draft.run} onChange={(e) => setDraft({ ...draft, run: e.target.value })} />}</Field>
        <Field label="Direction">
          {({ id }) => (
            <Select id={id} value={draft.direction ?? ''} onChange={(e) => setDraft({ ...draft, direction: (e.target.value || undefined) as 'md' | 'cd' | undefined })}>
              <option value="">Both</option>
              <option value="md">MD (along)</option>
              <option value="cd">CD (across)</option>
            </Select>
          )}
        </Field>
        <Field label="Readings per spot">
          {({ id }) => <Input id={id} type="number" min={3} max={20} value={draft.readingsPerSpot ?? 3} onChange={(e) => setDraft({ ...draft, readingsPerSpot: Number(e.target.value) })} />}
        </Field>
        <Field label="Specified minimum">{({ id }) => <Input id={id} placeholder="e.g. 60 µm" value={draft.specMin ?? ''} onChange={(e) => setDraft({ ...draft, specMin: e.target.value || undefined })} />}</Field>
        <Field label="Specified maximum">{({ id }) => <Input id={id} placeholder="e.g. 90 µm" value={draft.specMax ?? ''} onChange={(e) => setDraft({ ...draft, specMax: e.target.value || undefined })} />}</Field>
        <div className="flex items-end">
          <Button type="submit" variant="secondary">
            Group
          </Button>
        </div>
      </form>
      {params === null ? null : spots.isPending ? (
        <Loading label="Grouping…" />
      ) : spots.isError ? (
        <Notice tone="error" title="Could not group this run">
          {spots.error.message}
        </Notice>
      ) : (
        <div className="flex flex-col gap-2 text-sm tabular-nums">
          <p>
            Range {spots.data.spec.minimum === null ? 'no minimum' : formatThickness(spots.data.spec.minimum, system)} – {spots.data.spec.maximum === null ? 'no maximum' : formatThickness(spots.data.spec.maximum, system)} ({spots.data.spec.source === 'given' ? 'given' : 'quiet window'}); spot
            limits {spots.data.spotLimits.minimum === null ? 'no minimum' : formatThickness(spots.data.spotLimits.minimum, system)} – {spots.data.spotLimits.maximum === null ? 'no maximum' : formatThickness(spots.data.spotLimits.maximum, system)}.{' '}
            {spots.data.leftoverReadings > 0 && `${spots.data.leftoverReadings} reading(s) at the end make no full spot.`}
          </p>
          <div className="overflow-x-auto">
            <table className="min-w-full">
              <caption className="sr-only">Spots</caption>
              <thead>
                <tr className="border-b border-slate-line text-left text-ink-soft">
                  <th className="py-1 pr-3">Spot</th>
                  <th className="pr-3">Mean</th>
                  <th className="pr-3">Min – max</th>
                  <th className="pr-3">Against the range</th>
                  <th className="pr-3">Margin of the mean</th>
                  <th>Verdict</th>
                </tr>
              </thead>
              <tbody>
                {spots.data.spots.map((s) => (
                  <tr key={s.number} className="border-b border-slate-line/60">
                    <td className="py-1 pr-3">{s.number}</td>
                    <td className="pr-3">{formatThickness(s.mean, system)}</td>
                    <td className="pr-3 whitespace-nowrap">
                      {formatThickness(s.min, system)} – {formatThickness(s.max, system)}
                    </td>
                    <td className="pr-3">
                      <StatusBadge tone={verdictTone[s.verdict]}>{verdictWords[s.verdict]}</StatusBadge>
                    </td>
                    <td className="pr-3">{formatMargin(s.margin)}</td>
                    <td>
                      <FlagBadge flag={s.flag} />
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <ul className="flex flex-wrap gap-2">
            {spots.data.areas.map((a) => (
              <li key={a.number} className="rounded border border-slate-line px-2 py-1">
                Area {a.number} (spots {a.spotNumbers.join(', ')}{a.complete ? '' : ', incomplete'}): {formatThickness(a.mean, system)}{' '}
                <StatusBadge tone={verdictTone[a.verdict]}>{verdictWords[a.verdict]}</StatusBadge>
              </li>
            ))}
          </ul>
        </div>
      )}
    </section>
  );
}
