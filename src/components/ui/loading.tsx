export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <div role="status" aria-live="polite" className="flex items-center gap-3 py-8 text-ink-soft">
      <span aria-hidden="true" className="size-5 animate-spin rounded-full border-2 border-brand border-r-transparent" />
      {label}
    </div>
  );
}
