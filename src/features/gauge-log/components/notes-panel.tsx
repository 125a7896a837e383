import { useState } from 'react';
import { noteMeaningLabels, noteMeaningValues, noteStateLabels, type GaugeNote, type NoteMeaning } from '../../../../shared/schemas/gauge-log';
import { Button } from '../../../components/ui/button';
import { Field, Input, Select } from '../../../components/ui/field';
import { StatusBadge } from '../../../components/ui/status-badge';
import { formatDateTime } from '../../../utils/format';
import { useGaugeNotes } from '../api/gauge-queries';
import { useCloseNote, useDispositionNote } from '../api/gauge-mutations';
import { formatMargin } from './format-gauge';

const stateTone = { open: 'over', dispositioned: 'close', closed: 'quiet' } as const;

function NoteCard({ note }: { note: GaugeNote }) {
  const [disposition, setDisposition] = useState(note.disposition ?? '');
  const [password, setPassword] = useState('');
  const [meaning, setMeaning] = useState<NoteMeaning>('disposition-approved');
  const writing = useDispositionNote();
  const closing = useCloseNote();
  return (
    <li className="flex flex-col gap-2 rounded-md border border-slate-line p-3">
      <div className="flex flex-wrap items-center gap-2">
        <StatusBadge tone={stateTone[note.state]}>{noteStateLabels[note.state]}</StatusBadge>
        <strong>Run {note.run}</strong>
        <span className="text-sm text-ink-soft">
          {note.overCount} Over · worst margin {formatMargin(note.worstMargin)} · opened {formatDateTime(note.openedAt)} · owner {note.ownerName}
        </span>
      </div>
      {note.disposition && (
        <p className="text-sm">
          <span className="font-semibold">Disposition</span> ({note.dispositionByName}, {formatDateTime(note.dispositionAt)}): {note.disposition}
        </p>
      )}
      {note.signature && (
        <p className="rounded bg-paper-sunk px-2 py-1 text-sm">
          Signed by {note.signature.printedName} ({note.signature.role}), {formatDateTime(note.signature.signedAt)} — {note.signature.meaningText}
        </p>
      )}
      {note.allowedActions.includes('disposition') && (
        <form
          className="flex flex-col gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            writing.mutate({ id: note.id, disposition });
          }}
        >
          <Field label="Disposition" error={writing.error?.message}>
            {({ id, invalid }) => (
              <textarea
                id={id}
                aria-invalid={invalid}
                className="min-h-20 rounded-md border border-slate-line bg-paper-raised p-2"
                value={disposition}
                onChange={(e) => setDisposition(e.target.value)}
              />
            )}
          </Field>
          <div>
            <Button type="submit" size="sm" busy={writing.isPending}>
              Save disposition
            </Button>
          </div>
        </form>
      )}
      {note.allowedActions.includes('close') && (
        <form
          className="grid gap-2 md:grid-cols-3"
          onSubmit={(e) => {
            e.preventDefault();
            closing.mutate({ id: note.id, input: { password, meaning } });
          }}
        >
          <Field label="Meaning of your signature">
            {({ id }) => (
              <Select id={id} value={meaning} onChange={(e) => setMeaning(e.target.value as NoteMeaning)}>
                {noteMeaningValues.map((m) => (
                  <option key={m} value={m}>
                    {noteMeaningLabels[m]}
                  </option>
                ))}
              </Select>
            )}
          </Field>
          <Field label="Your password (to sign)" error={closing.error?.message}>
            {({ id, invalid }) => <Input id={id} type="password" autoComplete="current-password" aria-invalid={invalid} value={password} onChange={(e) => setPassword(e.target.value)} />}
          </Field>
          <div className="flex items-end">
            <Button type="submit" size="sm" busy={closing.isPending}>
              Sign and close
            </Button>
          </div>
        </form>
      )}
    </li>
  );
}

/** Nonconformance notes of a released check: opened by runs with Over readings, dispositioned by the owner, closed by QA with a signature. */
export function NotesPanel({ revisionId }: { revisionId: string }) {
  const notes = useGaugeNotes({ revisionId });
  if (notes.isPending || notes.isError || notes.data.items.length === 0) return null;
  return (
    <section aria-labelledby="notes-heading" className="flex flex-col gap-2">
      <h2 id="notes-heading" className="text-lg font-semibold">
        Nonconformance notes
      </h2>
      <ul className="flex flex-col gap-2">
        {notes.data.items.map((n) => (
          <NoteCard key={n.id} note={n} />
        ))}
      </ul>
    </section>
  );
}

