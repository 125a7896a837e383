import { useEffect, useRef, useState, type FormEvent, type ReactNode } from 'react';
import { useNavigate } from 'react-router-dom';
import { signatureMeaningLabels, signatureMeaningValues, type SheetDetail, type SignatureMeaning } from '../../../../shared/schemas/sheets';
import { Button } from '../../../components/ui/button';
import { Field, TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { isApiError } from '../../../lib/api-client';
import { useReturnSheet, useReviseSheet, useSignSheet, useSubmitSheet } from '../api/sheet-actions';

const textareaClass =
  'block w-full rounded-md border border-slate-line bg-paper-raised px-3 py-2 text-ink aria-[invalid=true]:border-over aria-[invalid=true]:bg-over-light/30';

function messageOf(error: unknown): string {
  return isApiError(error) ? error.message : 'Something went wrong; try again.';
}

/** A modal dialog (native <dialog>: focus stays inside, Escape closes). */
function Dialog({ open, title, onClose, children }: { open: boolean; title: string; onClose: () => void; children: ReactNode }) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const node = ref.current;
    if (!node) return;
    if (open && !node.open) node.showModal();
    if (!open && node.open) node.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-label={title}
      onClose={onClose}
      className="m-auto w-[min(36rem,calc(100vw-2rem))] rounded-lg border border-slate-line bg-paper-raised p-0 text-ink shadow-xl backdrop:bg-ink/40"
    >
      <div className="flex flex-col gap-4 p-5">
        <h2 className="text-lg font-semibold">{title}</h2>
        {children}
      </div>
    </dialog>
  );
}

function SignDialog({ sheet, open, onClose }: { sheet: SheetDetail; open: boolean; onClose: () => void }) {
  const sign = useSignSheet();
  const [password, setPassword] = useState('');
  const [meaning, setMeaning] = useState<SignatureMeaning | ''>('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [problem, setProblem] = useState<string>();
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const missing: Record<string, string> = {};
    if (!meaning) missing.meaning = 'Choose what your signature means.';
    if (!password) missing.password = 'Enter your password to sign.';
    setErrors(missing);
    setProblem(undefined);
    if (Object.keys(missing).length > 0 || !meaning) return;
    try {
      await sign.mutateAsync({ id: sheet.id, input: { password, meaning } });
      setPassword('');
      onClose();
    } catch (error) {
      setPassword('');
      if (isApiError(error)) setErrors(error.fields ?? {});
      setProblem(messageOf(error));
    }
  };
  return (
    <Dialog open={open} title={`Sign ${sheet.number} revision ${sheet.revision}`} onClose={onClose}>
      <form onSubmit={submit} noValidate className="flex flex-col gap-4">
        <p className="text-sm text-ink-soft">
          Your electronic signature is yours alone. It records your printed name, your role, the date and time (UTC) and the meaning below on the sheet
          and in its PDF; the PDF as signed can never change afterwards.
        </p>
        <fieldset className="flex flex-col gap-2" aria-describedby={errors.meaning ? 'sign-meaning-error' : undefined}>
          <legend className="mb-1 text-sm font-semibold">Meaning of your signature</legend>
          {signatureMeaningValues.map((value) => (
            <label key={value} className="flex min-h-11 items-start gap-2 rounded-md border border-slate-line px-3 py-2">
              <input type="radio" name="meaning" value={value} checked={meaning === value} onChange={() => setMeaning(value)} className="mt-1" />
              <span>{signatureMeaningLabels[value]}</span>
            </label>
          ))}
          {errors.meaning && (
            <p id="sign-meaning-error" className="text-sm font-medium text-over">
              ✕ {errors.meaning}
            </p>
          )}
        </fieldset>
        <TextField label="Your password" type="password" autoComplete="current-password" value={password} onChange={(e) => setPassword(e.target.value)} error={errors.password} />
        {problem && <Notice tone="error" title="Not signed">{problem}</Notice>}
        <div className="flex flex-wrap gap-2">
          <Button type="submit" busy={sign.isPending}>
            Sign sheet
          </Button>
          <Button variant="secondary" onClick={onClose}>
            Cancel
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

function ReturnDialog({ sheet, open, onClose }: { sheet: SheetDetail; open: boolean; onClose: () => void }) {
  const giveBack = useReturnSheet();
  const [comments, setComments] = useState('');
  const [error, setError] = useState<string>();
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (!comments.trim()) {
      setError('Tell the author what to change.');
      return;
    }
    try {
      await giveBack.mutateAsync({ id: sheet.id, input: { comments } });
      setComments('');
      setError(undefined);
      onClose();
    } catch (e) {
      setError(isApiError(e) ? (e.fields?.comments ?? e.message) : messageOf(e));
    }
  };
  return (
    <Dialog open={open} title={`Return ${sheet.number} revision ${sheet.revision}`} onClose={onClose}>
      <form onSubmit={submit} noValidate className="flex flex-col gap-4">
        <Field label="Comments for the author" error={error} hint="They are e-mailed to the author and printed on the sheet’s next PDF of this revision.">
          {({ id, describedBy, invalid }) => (
            <textarea id={id} aria-describedby={describedBy} aria-invalid={invalid} rows={5} className={textareaClass} value={comments} onChange={(e) => setComments(e.target.value)} />
          )}
        </Field>
        <div className="flex flex-wrap gap-2">
          <Button type="submit" variant="danger" busy={giveBack.isPending}>
            Return to author
          </Button>
          <Button variant="secondary" onClick={onClose}>
            Cancel
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

/** The workflow steps open to the signed-in person on this revision (the server checks again). */
export function SheetActionsPanel({ sheet }: { sheet: SheetDetail }) {
  const navigate = useNavigate();
  const submit = useSubmitSheet();
  const revise = useReviseSheet();
  const [dialog, setDialog] = useState<'sign' | 'return'>();
  const [problem, setProblem] = useState<string>();
  const actions = sheet.allowedActions;
  if (actions.length === 0) return null;

  const run = async (task: () => Promise<unknown>) => {
    setProblem(undefined);
    try {
      await task();
    } catch (error) {
      setProblem(messageOf(error));
    }
  };
  return (
    <section aria-label="Review actions" className="no-print flex flex-col gap-3">
      <div className="flex flex-wrap gap-2">
        {actions.includes('submit') && (
          <Button busy={submit.isPending} onClick={() => run(() => submit.mutateAsync(sheet.id))}>
            Submit for review
          </Button>
        )}
        {actions.includes('sign') && <Button onClick={() => setDialog('sign')}>Sign…</Button>}
        {actions.includes('return') && (
          <Button variant="danger" onClick={() => setDialog('return')}>
            Return with comments…
          </Button>
        )}
        {actions.includes('revise') && (
          <Button
            variant="secondary"
            busy={revise.isPending}
            onClick={() =>
              run(async () => {
                const next = await revise.mutateAsync({ id: sheet.id, input: {} });
                await navigate(`/sheets/${next.id}`);
              })
            }
          >
            New revision from the latest check
          </Button>
        )}
      </div>
      {problem && <Notice tone="error" title="Not done">{problem}</Notice>}
      <SignDialog sheet={sheet} open={dialog === 'sign'} onClose={() => setDialog(undefined)} />
      <ReturnDialog sheet={sheet} open={dialog === 'return'} onClose={() => setDialog(undefined)} />
    </section>
  );
}
