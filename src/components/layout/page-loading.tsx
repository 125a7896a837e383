import { BrandName } from './brand-mark';

/** What shows while the first page of a visit loads (session check). */
export function PageLoading() {
  return (
    <div className="flex min-h-screen flex-col items-center justify-center gap-4" role="status" aria-live="polite">
      <BrandName />
      <p className="text-ink-soft">Loading…</p>
    </div>
  );
}
