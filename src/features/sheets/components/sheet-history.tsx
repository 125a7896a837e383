import { Link } from 'react-router-dom';
import type { SheetDetail } from '../../../../shared/schemas/sheets';
import { formatDateTime } from '../../../utils/format';
import { SheetStateBadge } from './sheet-state-badge';

const actionWords: Record<string, string> = {
  'sheet.created': 'Sheet issued (Draft)',
  'sheet.revised': 'New revision made',
  'sheet.submitted': 'Submitted for review',
  'sheet.returned': 'Returned with comments',
  'sheet.signed': 'Signed',
  'sheet.superseded': 'Superseded by a later signed revision',
  'sheet.sign_failed': 'Signing refused: wrong password',
  'sheet.verified': 'A copy of the PDF was verified',
};

/** Every revision of the sheet and the audit entries of all of them, newest first. */
export function SheetHistory({ sheet }: { sheet: SheetDetail }) {
  const revisionOf = new Map(sheet.revisions.map((r) => [r.id, r.revision]));
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,18rem)_minmax(0,1fr)]">
      <section aria-labelledby="revisions-heading">
        <h2 id="revisions-heading" className="mb-2 text-lg font-semibold">
          Revisions
        </h2>
        <ol className="flex flex-col gap-2">
          {sheet.revisions.map((r) => (
            <li key={r.id} className="flex flex-wrap items-center gap-2">
              {r.id === sheet.id ? (
                <span className="font-semibold">Revision {r.revision} (this one)</span>
              ) : (
                <Link to={`/sheets/${r.id}`} className="text-brand-dark underline underline-offset-2">
                  Revision {r.revision}
                </Link>
              )}
              <SheetStateBadge state={r.state} />
              <span className="text-sm text-ink-soft">
                {r.authorName}, {formatDateTime(r.createdAt)}
              </span>
            </li>
          ))}
        </ol>
      </section>
      <section aria-labelledby="trail-heading" className="min-w-0">
        <h2 id="trail-heading" className="mb-2 text-lg font-semibold">
          Audit entries
        </h2>
        <div className="overflow-x-auto rounded-md border border-slate-line bg-paper-raised">
          <table className="w-full border-collapse text-left text-[0.95rem]">
            <caption className="sr-only">Audit entries of this sheet</caption>
            <thead className="bg-paper-sunk text-sm text-ink-soft">
              <tr>
                <th scope="col" className="px-3 py-2">When</th>
                <th scope="col" className="px-3 py-2">Rev.</th>
                <th scope="col" className="px-3 py-2">What</th>
                <th scope="col" className="px-3 py-2">Who</th>
              </tr>
            </thead>
            <tbody>
              {sheet.audit.map((a) => (
                <tr key={a.id} className="border-t border-slate-line align-top">
                  <td className="px-3 py-2 whitespace-nowrap tabular-nums">{formatDateTime(a.occurredAt)}</td>
                  <td className="px-3 py-2 tabular-nums">{a.revisionId ? (revisionOf.get(a.revisionId) ?? '—') : '—'}</td>
                  <td className="px-3 py-2">
                    {actionWords[a.action] ?? a.action}
                    {a.reason && <p className="text-sm text-ink-soft">“{a.reason}”</p>}
                  </td>
                  <td className="px-3 py-2 break-all">{a.actorEmail ?? 'system'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>
    </div>
  );
}
