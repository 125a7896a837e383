import type { ReactNode } from 'react';

/** What to show when a list is empty: say what is missing and what to do next. */
export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-md border border-dashed border-slate-line bg-paper-raised px-6 py-10 text-center">
      <p className="font-semibold text-ink">{title}</p>
      {children && <div className="mx-auto mt-2 max-w-prose text-ink-soft">{children}</div>}
    </div>
  );
}
