import { useState } from 'react';
import type { DryingPathInputBody } from '../../../../shared/schemas/drying-paths';
import { Button } from '../../../components/ui/button';
import { Field, Select, TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { isApiError } from '../../../lib/api-client';
import { formatDateTime } from '../../../utils/format';
import { useDryingChecks, useDryingSetups, useSaveDryingSetup } from '../api/drying-path-api';

/** Engineers save the current inputs as a drying set-up of a drying-coat or cast-film check's current revision. */
export function SaveDryingSetup({ input, canSave }: { input: DryingPathInputBody; canSave: boolean }) {
  const checks = useDryingChecks();
  const [checkId, setCheckId] = useState('');
  const [title, setTitle] = useState('');
  const save = useSaveDryingSetup();
  const setups = useDryingSetups(checkId || null);
  const fields = isApiError(save.error) ? (save.error.fields ?? {}) : {};

  return (
    <section aria-labelledby="drying-save" className="rounded-md border border-slate-line bg-paper-raised p-4">
      <h2 id="drying-save" className="font-semibold text-ink">Drying set-ups of a layer check</h2>
      {checks.data && checks.data.length === 0 ? (
        <p className="mt-2 text-ink-soft">No drying-coat or cast-film check yet: create one under Layer checks, then save this drying path with it.</p>
      ) : (
        <div className="mt-3 grid gap-3 sm:grid-cols-2">
          <Field label="Layer check" error={fields.processKind}>
            {({ id, describedBy, invalid }) => (
              <Select id={id} aria-describedby={describedBy} aria-invalid={invalid} value={checkId} onChange={(e) => setCheckId(e.target.value)}>
                <option value="">Choose a check…</option>
                {(checks.data ?? []).map((c) => (
                  <option key={c.id} value={c.id}>
                    {c.title} (revision {c.revision})
                  </option>
                ))}
              </Select>
            )}
          </Field>
          {canSave && <TextField label="Set-up title" value={title} error={fields.title} onChange={(e) => setTitle(e.target.value)} placeholder="e.g. Line 2 at 30 m/min" />}
        </div>
      )}
      {canSave && (
        <div className="mt-3 flex flex-wrap items-center gap-3">
          <Button variant="secondary" disabled={!checkId || !title.trim()} busy={save.isPending} onClick={() => save.mutate({ checkId, title: title.trim(), input })}>
            Save with this check revision
          </Button>
          {save.isSuccess && <span className="text-sm text-quiet-dark">✓ Saved with revision {save.data.revision}.</span>}
        </div>
      )}
      {save.isError && (
        <Notice tone="error" title="Could not save the set-up" className="mt-3">
          {save.error.message}
        </Notice>
      )}
      {checkId && setups.data && (
        <ul className="mt-3 flex flex-col gap-1 text-sm">
          {setups.data.items.length === 0 && <li className="text-ink-soft">No drying set-up saved with this check yet.</li>}
          {setups.data.items.map((s) => (
            <li key={s.id} className="flex flex-wrap gap-x-3">
              <span className="font-medium">{s.title}</span>
              <span className="text-ink-soft">revision {s.revision}</span>
              <span>{s.summary.verdictText.split(':')[0]}</span>
              <span className="text-ink-soft">{formatDateTime(s.createdAt)}{s.createdByName ? `, ${s.createdByName}` : ''}</span>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
