import { isRouteErrorResponse, Link, useRouteError } from 'react-router';

export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error) ? `${error.status} ${error.statusText}` : error instanceof Error ? error.message : 'Unexpected error';
  return (
    <main className="mx-auto max-w-xl px-4 py-16 text-center">
      <h1 className="text-2xl font-bold text-cellar-900">This page hit a snag</h1>
      <p className="mt-2 text-ink-soft">{message}</p>
      <Link to="/" className="mt-6 inline-block font-semibold text-cellar-700 underline">
        Back to Wortwise
      </Link>
    </main>
  );
}
