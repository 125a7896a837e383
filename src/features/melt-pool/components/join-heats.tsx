import { useState } from 'react';
import type { MeltPoolInputBody } from '../../../../shared/schemas/melt-pool';
import { Button } from '../../../components/ui/button';
import { Field, Select } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { formatSignificant } from '../../../../shared/units/format-significant';
import { useHeats, useMeltPoolChecks, useMeltPoolSetups, useSaveMeltPoolSetup } from '../api/melt-pool-api';

/** Links two heats being joined to a melt-pool check with this pool, and shows the sulfur comparison. */
export function JoinHeats({ input, canSave }: { input: MeltPoolInputBody; canSave: boolean }) {
  const checks = useMeltPoolChecks();
  const heats = useHeats();
  const [checkId, setCheckId] = useState('');
  const [first, setFirst] = useState('');
  const [second, setSecond] = useState('');
  const save = useSaveMeltPoolSetup();
  const setups = useMeltPoolSetups(checkId || null);
  const latest = save.data ?? setups.data?.items[0];

  const heatSelect = (label: string, value: string, onChange: (id: string) => void) => (
    <Field label={label}>
      {({ id }) => (
        <Select id={id} value={value} onChange={(e) => onChange(e.target.value)}>
          <option value="">Choose a heat…</option>
          {(heats.data?.items ?? []).map((h) => (
            <option key={h.id} value={h.id}>
              {h.heatNumber} ({formatSignificant(h.sulfurPpm, 3)} ppm S)
            </option>
          ))}
        </Select>
      )}
    </Field>
  );

  return (
    <section aria-labelledby="join-title" className="flex flex-col gap-3">
      <h2 id="join-title" className="text-xl font-semibold">Parts to be joined</h2>
      <div className="grid gap-3 rounded-md border border-slate-line bg-paper-raised p-4 sm:grid-cols-3">
        <Field label="Melt-pool check">
          {({ id }) => (
            <Select id={id} value={checkId} onChange={(e) => setCheckId(e.target.value)}>
              <option value="">Choose a check…</option>
              {(checks.data?.items ?? []).map((c) => (
                <option key={c.id} value={c.id}>
                  {c.title} (revision {c.revision})
                </option>
              ))}
            </Select>
          )}
        </Field>
        {heatSelect('First heat', first, setFirst)}
        {heatSelect('Second heat', second, setSecond)}
        {canSave && (
          <div className="sm:col-span-3">
            <Button disabled={!checkId || !first || !second} busy={save.isPending} onClick={() => save.mutate({ checkId, input, firstHeatId: first, secondHeatId: second })}>
              Link the heats and this pool to the check
            </Button>
          </div>
        )}
      </div>
      {save.isError && <Notice tone="error" title="Could not link the heats">{save.error.message}</Notice>}
      {latest && (
        <div className="flex flex-col gap-2">
          <p className="text-sm text-ink-soft">
            {latest.firstHeat.heatNumber} ({formatSignificant(latest.firstHeat.sulfurPpm, 3)} ppm S, flow {latest.comparison.parts[0].flowDirection}) joined to {latest.secondHeat.heatNumber} (
            {formatSignificant(latest.secondHeat.sulfurPpm, 3)} ppm S, flow {latest.comparison.parts[1].flowDirection}) at {Math.round(latest.comparison.poolTemperature)} K mean pool temperature.
          </p>
          {latest.comparison.warnings.length > 0 ? (
            <Notice tone="caution" title="The joined parts' sulfur moves the flow">
              <ul className="list-disc pl-5">
                {latest.comparison.warnings.map((w) => (
                  <li key={w.code}>{w.message}</li>
                ))}
              </ul>
            </Notice>
          ) : (
            <Notice tone="success" title="Sulfur of the joined parts is close enough">
              Both parts give the same flow direction and neither sits inside or across the 30–70 ppm band.
            </Notice>
          )}
          <ul className="list-disc pl-5 text-sm text-ink-soft">
            {latest.comparison.notes.map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        </div>
      )}
    </section>
  );
}
