import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { paths } from '@/config/paths.ts';

/** Shown by any route whose loader or component throws. */
export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'Unknown error';
  return (
    <div className="mx-auto max-w-xl py-16 text-center">
      <h1 className="text-xl font-semibold">Something went wrong</h1>
      <p className="mt-2 text-ink-soft">{message}</p>
      <p className="mt-6 flex justify-center gap-4">
        <button type="button" className="text-copper underline" onClick={() => window.location.reload()}>
          Reload
        </button>
        <Link className="text-copper underline" to={paths.home}>
          Back to the start page
        </Link>
      </p>
    </div>
  );
}
