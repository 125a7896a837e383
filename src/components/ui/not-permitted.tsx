import { Link } from 'react-router-dom';
import { paths } from '../../config/paths';

/** Shown when someone opens a page their role may not use (the server refuses the data too). */
export function NotPermitted({ roleLabel, pageName }: { roleLabel: string; pageName?: string }) {
  return (
    <section aria-labelledby="not-permitted-title" className="mx-auto max-w-xl rounded-md border border-close/50 bg-close-light/50 p-6">
      <h1 id="not-permitted-title" className="text-xl font-semibold text-ink">
        <span aria-hidden="true">▲ </span>Not permitted for your role
      </h1>
      <p className="mt-2 text-ink">
        {pageName ? `${pageName} is` : 'This page is'} not open to the {roleLabel} role. If you need it, ask an administrator to change your role.
      </p>
      <p className="mt-4">
        <Link className="font-semibold text-brand underline underline-offset-2" to={paths.home}>
          Back to Home
        </Link>
      </p>
    </section>
  );
}
