import { isRouteErrorResponse, Link, useParams, useRouteError } from 'react-router-dom';
import { Button, buttonClasses } from '../components/button';
import { paths } from '../config/paths';
import { ApiError } from '../lib/api-error';

/** Words for what broke. A failed chunk load usually means a new version was deployed meanwhile. */
function describe(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  if (isRouteErrorResponse(error) && error.status === 404) return 'There is no page at this address.';
  if (error instanceof TypeError && /dynamically imported module|Importing a module script failed/i.test(error.message)) {
    return 'Part of the page could not be loaded, perhaps because Porestack was updated a moment ago or the connection dropped.';
  }
  return 'Something went wrong while showing this page. Nothing you entered was sent twice.';
}

/** Per-route error page: say what happened, offer a retry and a way back home. */
export function RouteErrorBoundary() {
  const error = useRouteError();
  const { orgId } = useParams();
  return (
    <div role="alert" className="mx-auto my-12 max-w-lg rounded-lg border border-red-200 bg-white p-6">
      <h1 className="text-lg font-semibold text-slate-900">This page could not be shown</h1>
      <p className="mt-2 text-sm text-slate-700">{describe(error)}</p>
      <p className="mt-2 text-sm text-slate-700">Try again; if it keeps failing, go back to your organisation home and tell your administrator what you were doing.</p>
      <div className="mt-5 flex flex-wrap gap-2">
        <Button onClick={() => window.location.reload()}>Try again</Button>
        <Link to={orgId ? paths.org.home.to(orgId) : paths.root.to()} className={buttonClasses('secondary')}>
          Go to your organisation home
        </Link>
      </div>
    </div>
  );
}
