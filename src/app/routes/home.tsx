import { useSuspenseQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { roleLabels } from '../../../shared/schemas/roles';
import { PageHeader } from '../../components/ui/page-header';
import { navigationFor } from '../../config/navigation';
import { paths } from '../../config/paths';
import { roleGuides } from '../../config/role-guides';
import { meQueryOptions } from '../../features/auth/api/get-me';
import { useDocumentTitle } from '../use-document-title';

export function HomeRoute() {
  useDocumentTitle('Home');
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const guide = roleGuides[me.role];
  const places = navigationFor(me.role).filter((item) => item.to !== paths.home);

  return (
    <>
      <PageHeader
        title={`Welcome, ${me.displayName}`}
        lead={
          <>
            Signed in as <span className="break-all">{me.email}</span> · role <strong className="text-ink" data-testid="home-role">{roleLabels[me.role]}</strong>
          </>
        }
      />
      <div className={places.length > 0 ? 'grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]' : 'max-w-3xl'}>
        <section aria-labelledby="role-title" className="rounded-md border border-slate-line bg-paper-raised p-5">
          <h2 id="role-title" className="text-lg font-semibold">
            Your part as {roleLabels[me.role]}
          </h2>
          <p className="mt-1 text-ink-soft">{guide.summary}</p>
          <ul className="mt-4 flex flex-col gap-2">
            {guide.duties.map((duty) => (
              <li key={duty} className="flex gap-2.5">
                <span aria-hidden="true" className="mt-2 size-1.5 shrink-0 rounded-full bg-quiet" />
                <span>{duty}</span>
              </li>
            ))}
          </ul>
          {guide.limits.length > 0 && (
            <div className="mt-4 border-t border-slate-line pt-3 text-sm text-ink-soft">
              {guide.limits.map((limit) => (
                <p key={limit}>{limit}</p>
              ))}
            </div>
          )}
        </section>
        {places.length > 0 && (
          <nav aria-labelledby="places-title" className="rounded-md border border-slate-line bg-paper-raised p-5">
            <h2 id="places-title" className="text-lg font-semibold">
              Go to
            </h2>
            <ul className="mt-3 flex flex-col gap-2">
              {places.map((item) => (
                <li key={item.to}>
                  <Link
                    to={item.to}
                    className="flex min-h-11 items-center justify-between rounded-md border border-slate-line px-4 font-medium text-brand-dark hover:border-brand hover:bg-brand-light/40"
                  >
                    {item.label}
                    <span aria-hidden="true">→</span>
                  </Link>
                </li>
              ))}
            </ul>
          </nav>
        )}
      </div>
    </>
  );
}
