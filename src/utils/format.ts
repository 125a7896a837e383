/**
 * Date and time as people on the line read it: "2025-03-14 09:05" in the browser's time zone
 * (or the zone given). A fixed, sortable order avoids day/month mix-ups between sites.
 */
export function formatDateTime(iso: string | null | undefined, timeZone?: string): string {
  if (!iso) return '—';
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '—';
  const parts = new Intl.DateTimeFormat('en-GB', {
    timeZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  }).formatToParts(date);
  const get = (type: Intl.DateTimeFormatPartTypes) => parts.find((part) => part.type === type)?.value ?? '';
  return `${get('year')}-${get('month')}-${get('day')} ${get('hour')}:${get('minute')}`;
}

/** "1–25 of 312" for a page of a list; "0 of 0" when empty. */
export function formatRange(page: number, pageSize: number, total: number): string {
  if (total <= 0) return 'None';
  const first = (page - 1) * pageSize + 1;
  const last = Math.min(page * pageSize, total);
  return `${first}–${last} of ${total}`;
}

/** Number of pages for a list; at least 1 so "page 1 of 1" reads sensibly when empty. */
export function pageCount(pageSize: number, total: number): number {
  return Math.max(1, Math.ceil(total / pageSize));
}
