/** Filters above a server-paged list; the page keeps their values in its URL search params. */

interface FilterSelectProps<V extends string> {
  label: string;
  /** '' means no filter. */
  value: V | '';
  /** The first option, meaning no filter ("All kinds"). */
  allLabel: string;
  values: readonly V[];
  labels: Readonly<Record<V, string>>;
  onChange: (value: V | '') => void;
}

/** A drop-down that narrows the list to one value, or shows all. */
export function FilterSelect<V extends string>({ label, value, allLabel, values, labels, onChange }: FilterSelectProps<V>) {
  return (
    <label className="flex flex-col gap-1 text-sm font-semibold">
      {label}
      <select
        value={value}
        onChange={(event) => onChange(event.target.value as V | '')}
        className="min-h-11 rounded-md border border-slate-line bg-paper-raised px-2 font-normal"
      >
        <option value="">{allLabel}</option>
        {values.map((v) => (
          <option key={v} value={v}>
            {labels[v]}
          </option>
        ))}
      </select>
    </label>
  );
}

/** A yes/no filter ("Show archived", "Only my checks"). */
export function FilterCheckbox({ label, checked, onChange }: { label: string; checked: boolean; onChange: (checked: boolean) => void }) {
  return (
    <label className="flex min-h-11 items-center gap-2 text-sm">
      <input type="checkbox" className="size-5" checked={checked} onChange={(event) => onChange(event.target.checked)} />
      {label}
    </label>
  );
}
