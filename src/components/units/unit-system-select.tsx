import { useId } from 'react';
import { unitSystemLabels, unitSystemValues, useUnitSystem, type UnitSystem } from '../../lib/unit-system';

/** The person's choice of display units; kept in this browser and applied on every page at once. */
export function UnitSystemSelect() {
  const [system, setSystem] = useUnitSystem();
  const id = useId();
  return (
    <div className="no-print flex items-center gap-2">
      <label htmlFor={id} className="text-sm font-semibold text-ink-soft">
        Show units in
      </label>
      <select
        id={id}
        data-testid="unit-system"
        value={system}
        onChange={(event) => setSystem(event.target.value as UnitSystem)}
        className="min-h-10 rounded-md border border-slate-line bg-paper-raised px-2 text-[0.95rem]"
      >
        {unitSystemValues.map((value) => (
          <option key={value} value={value}>
            {unitSystemLabels[value]}
          </option>
        ))}
      </select>
    </div>
  );
}
