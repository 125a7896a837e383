import { useEffect, useId, useState, type FormEvent } from 'react';
import { Button } from './button';
import { Input } from './field';

interface SearchBoxProps {
  label: string;
  value: string;
  placeholder?: string;
  onSearch: (value: string) => void;
}

/** A labelled search field that applies on Enter or the button, and can be cleared in one step. */
export function SearchBox({ label, value, placeholder, onSearch }: SearchBoxProps) {
  const id = useId();
  const [draft, setDraft] = useState(value);
  useEffect(() => setDraft(value), [value]);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onSearch(draft.trim());
  };
  return (
    <form role="search" onSubmit={submit} className="no-print flex flex-wrap items-end gap-2">
      <div className="flex min-w-56 flex-1 flex-col gap-1">
        <label htmlFor={id} className="text-sm font-semibold">
          {label}
        </label>
        <Input id={id} type="search" value={draft} placeholder={placeholder} maxLength={200} onChange={(event) => setDraft(event.target.value)} />
      </div>
      <Button type="submit" variant="secondary">
        Search
      </Button>
      {value && (
        <Button variant="quiet" onClick={() => onSearch('')}>
          Clear
        </Button>
      )}
    </form>
  );
}
