import { formatRange, pageCount } from '../../utils/format';
import { Button } from './button';

interface PaginationProps {
  page: number;
  pageSize: number;
  total: number;
  onPageChange: (page: number) => void;
  busy?: boolean;
  label: string;
}

export function Pagination({ page, pageSize, total, onPageChange, busy, label }: PaginationProps) {
  const pages = pageCount(pageSize, total);
  return (
    <nav aria-label={`${label} pages`} className="no-print mt-4 flex flex-wrap items-center justify-between gap-3 text-sm text-ink-soft">
      <p aria-live="polite">
        {formatRange(page, pageSize, total)} · page {Math.min(page, pages)} of {pages}
      </p>
      <div className="flex gap-2">
        <Button variant="secondary" size="sm" disabled={page <= 1 || busy} onClick={() => onPageChange(page - 1)}>
          ← Previous
        </Button>
        <Button variant="secondary" size="sm" disabled={page >= pages || busy} onClick={() => onPageChange(page + 1)}>
          Next →
        </Button>
      </div>
    </nav>
  );
}
