import { isRouteErrorResponse, Link, useLocation, useRouteError } from 'react-router-dom';
import { Button } from '../components/ui/button';
import { paths } from '../config/paths';
import { isApiError } from '../lib/api-error';
import { NotForYourRole } from './not-for-your-role';
import { NotFoundMessage } from './not-found-message';
import type { WrongRole } from './require-role';

/** Every route's error boundary: says what happened in plain words and offers the way on. */
export function RouteError() {
  const error = useRouteError();
  const location = useLocation();

  if (isRouteErrorResponse(error) && error.status === 403) return <NotForYourRole allowed={(error.data as WrongRole)?.allowed} />;
  if (isApiError(error, 'FORBIDDEN')) return <NotForYourRole />;
  if ((isRouteErrorResponse(error) && error.status === 404) || isApiError(error, 'NOT_FOUND')) return <NotFoundMessage />;
  if (isApiError(error, 'UNAUTHENTICATED')) {
    return (
      <div className="mx-auto max-w-xl py-12">
        <h1 className="text-3xl font-extrabold">You are signed out</h1>
        <p className="mt-3">Your session has ended. Sign in again to carry on where you were.</p>
        <Link to={paths.signIn(location.pathname + location.search)} className="mt-6 inline-block text-link">
          Sign in
        </Link>
      </div>
    );
  }
  return (
    <div role="alert" className="mx-auto max-w-xl py-12">
      <h1 className="text-3xl font-extrabold">Something went wrong</h1>
      <p className="mt-3">{isApiError(error) ? error.message : 'This page could not be shown.'} Try again in a moment.</p>
      <Button className="mt-6" onClick={() => window.location.reload()}>
        Try again
      </Button>
    </div>
  );
}
