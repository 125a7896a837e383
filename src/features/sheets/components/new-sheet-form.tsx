import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { createSheetInputSchema } from '../../../../shared/schemas/sheets';
import { Button } from '../../../components/ui/button';
import { Field, Select, TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { isApiError } from '../../../lib/api-client';
import { useCheckOptions } from '../api/get-check-options';
import { useCreateSheet } from '../api/sheet-actions';

const textareaClass =
  'block w-full rounded-md border border-slate-line bg-paper-raised px-3 py-2 text-ink aria-[invalid=true]:border-over aria-[invalid=true]:bg-over-light/30';

/** "New sheet from check…": pick a layer check, name the line and the purpose; makes revision 1 as a Draft. */
export function NewSheetForm({ initialCheckId, onCancel }: { initialCheckId?: string; onCancel?: () => void }) {
  const navigate = useNavigate();
  const [filter, setFilter] = useState('');
  const checks = useCheckOptions(filter || undefined);
  const create = useCreateSheet();
  const [checkId, setCheckId] = useState(initialCheckId ?? '');
  const [line, setLine] = useState('');
  const [purpose, setPurpose] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [problem, setProblem] = useState<string>();

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    setProblem(undefined);
    const parsed = createSheetInputSchema.safeParse({ checkId, line, purpose });
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message])));
      return;
    }
    setErrors({});
    try {
      const sheet = await create.mutateAsync(parsed.data);
      await navigate(`/sheets/${sheet.id}`);
    } catch (error) {
      if (isApiError(error)) {
        setErrors(error.fields ?? {});
        setProblem(error.message);
      } else setProblem('The sheet could not be made.');
    }
  };

  const options = checks.data?.items ?? [];
  const selectedMissing = checkId && !options.some((c) => c.id === checkId);
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4 rounded-md border border-slate-line bg-paper-raised p-4" aria-label="New process sheet">
      <h2 className="text-lg font-semibold">New sheet from a layer check</h2>
      <p className="text-sm text-ink-soft">
        The sheet freezes the check’s newest revision, the fluid’s properties with their sources and the results as they are now. Later changes to the
        check or the fluid need a new revision of the sheet.
      </p>
      <TextField label="Find a check" value={filter} onChange={(e) => setFilter(e.target.value)} placeholder="Part of the title" />
      <Field label="Layer check" error={errors.checkId} hint={checks.isPending ? 'Loading checks…' : `${options.length} shown, newest first`}>
        {({ id, describedBy, invalid }) => (
          <Select id={id} aria-describedby={describedBy} aria-invalid={invalid} value={checkId} onChange={(e) => setCheckId(e.target.value)}>
            <option value="">Choose a check…</option>
            {selectedMissing && <option value={checkId}>The check you came from</option>}
            {options.map((c) => (
              <option key={c.id} value={c.id}>
                {c.title} (rev. {c.revision}, {c.fluidName})
              </option>
            ))}
          </Select>
        )}
      </Field>
      <TextField label="Line" value={line} onChange={(e) => setLine(e.target.value)} error={errors.line} placeholder="e.g. Line 2" />
      <Field label="Purpose" error={errors.purpose} hint="What this sheet releases, e.g. “Primer at 60 µm wet through oven zone 1”.">
        {({ id, describedBy, invalid }) => (
          <textarea id={id} aria-describedby={describedBy} aria-invalid={invalid} rows={3} className={textareaClass} value={purpose} onChange={(e) => setPurpose(e.target.value)} />
        )}
      </Field>
      {problem && <Notice tone="error" title="Not made">{problem}</Notice>}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={create.isPending}>
          Make draft sheet
        </Button>
        {onCancel && (
          <Button variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
