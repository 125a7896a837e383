import { isRouteErrorResponse, Link, Navigate, useLocation, useRouteError } from 'react-router-dom';
import { paths, signInPath } from '../../config/paths';
import { isApiError } from '../../lib/api-client';
import { Button } from '../../components/ui/button';

/** Error element for every route: a session that ended goes to sign-in; anything else explains and offers a retry. */
export function RouteError() {
  const error = useRouteError();
  const location = useLocation();

  if (isApiError(error) && error.status === 401) {
    return <Navigate to={signInPath(location.pathname + location.search)} replace />;
  }

  let title = 'This page could not be shown';
  let message = 'Something went wrong while loading this page.';
  if (isApiError(error)) {
    if (error.status === 403) title = 'Not permitted for your role';
    if (error.status === 404) title = 'Not found';
    message = error.message;
  } else if (isRouteErrorResponse(error)) {
    title = error.status === 404 ? 'No page at this address' : `Error ${error.status}`;
    message = error.statusText || message;
  } else if (error instanceof Error) {
    message = error.message;
  }

  return (
    <section role="alert" className="mx-auto my-10 max-w-xl rounded-md border border-over/40 bg-paper-raised p-6">
      <h1 className="text-xl font-semibold text-ink">{title}</h1>
      <p className="mt-2 text-ink">{message}</p>
      <div className="mt-5 flex flex-wrap gap-3">
        <Button onClick={() => window.location.reload()}>Try again</Button>
        <Link to={paths.home} className="inline-flex min-h-11 items-center rounded-md px-3 font-semibold text-brand underline underline-offset-2">
          Go to Home
        </Link>
      </div>
    </section>
  );
}
