import { Link, useLocation } from 'react-router-dom';
import { BrandName } from '../../components/layout/brand-mark';
import { paths } from '../../config/paths';
import { useDocumentTitle } from '../use-document-title';

export function NotFoundRoute() {
  const location = useLocation();
  useDocumentTitle('Not found');
  return (
    <div className="flex min-h-screen flex-col items-center justify-center gap-6 px-4">
      <BrandName />
      <main className="max-w-md rounded-md border border-slate-line bg-paper-raised p-6 text-center">
        <h1 className="text-xl font-semibold">No page at this address</h1>
        <p className="mt-2 break-all text-ink-soft">
          <code className="rounded bg-paper-sunk px-1.5 py-0.5 text-ink">{location.pathname}</code> is not a QuietLayer page.
          Check the link, or start again from Home.
        </p>
        <Link to={paths.home} className="mt-5 inline-flex min-h-11 items-center rounded-md bg-brand px-4 font-medium text-white hover:bg-brand-dark">
          Go to Home
        </Link>
      </main>
    </div>
  );
}
