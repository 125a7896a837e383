import { Link } from 'react-router-dom';
import type { Role } from '../../../../shared/schemas/roles';

/**
 * "Issue process sheet" for a layer check page: opens the new-sheet form with this check chosen.
 * Only process engineers issue sheets (the server checks again), so others see nothing.
 *
 * @example <IssueSheetLink checkId={check.id} role={me.role} />
 */
export function IssueSheetLink({ checkId, role }: { checkId: string; role: Role }) {
  if (role !== 'engineer') return null;
  return (
    <Link
      to={`/sheets?new=1&checkId=${encodeURIComponent(checkId)}`}
      className="inline-flex min-h-11 items-center justify-center rounded-md border border-slate-line bg-paper-raised px-4 font-medium text-ink hover:border-brand hover:text-brand-dark"
    >
      Issue process sheet
    </Link>
  );
}
