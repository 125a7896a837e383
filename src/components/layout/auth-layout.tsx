import type { ReactNode } from 'react';
import { BrandName } from './brand-mark';

/** The frame for pages used before signing in: the name, one card, and an optional side panel. */
export function AuthLayout({ title, lead, children, aside }: { title: string; lead?: ReactNode; children: ReactNode; aside?: ReactNode }) {
  return (
    <div className="min-h-screen bg-paper">
      <div className="border-b border-slate-line bg-paper-raised">
        <div className="mx-auto flex max-w-5xl items-center px-4 py-3 sm:px-6">
          <BrandName />
        </div>
      </div>
      <main id="main" className="mx-auto grid max-w-5xl gap-6 px-4 py-10 sm:px-6 md:grid-cols-[minmax(0,26rem)_minmax(0,1fr)] md:items-start">
        <section className="rounded-lg border border-slate-line bg-paper-raised p-6 shadow-sm" aria-labelledby="auth-title">
          <h1 id="auth-title" className="text-2xl font-semibold tracking-tight">
            {title}
          </h1>
          {lead && <div className="mt-1 text-ink-soft">{lead}</div>}
          <div className="mt-6">{children}</div>
        </section>
        {aside && <div>{aside}</div>}
      </main>
    </div>
  );
}
