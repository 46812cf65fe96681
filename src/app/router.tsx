import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter } from 'react-router';
import { meQueryOptions } from '@/lib/auth';
import { requireSignedIn } from './guards';
import { RootLayout } from './routes/root-layout';
import { RouteError } from './routes/route-error';

/**
 * Every page is its own chunk (route `lazy`), so the first page loads only what it shows.
 * Route modules export `Component` and, where they need data, `loader(queryClient)`.
 */
export function createAppRouter(queryClient: QueryClient) {
  const withClient = (load: () => Promise<{ Component: React.ComponentType; loader?: (qc: QueryClient) => unknown }>) => async () => {
    const { Component, loader } = await load();
    return { Component, ...(loader ? { loader: loader(queryClient) as never } : {}) };
  };
  return createBrowserRouter([
    {
      id: 'root',
      element: <RootLayout />,
      errorElement: <RouteError />,
      loader: () => queryClient.ensureQueryData(meQueryOptions()),
      HydrateFallback: () => null,
      children: [
        { path: 'sign-in', lazy: withClient(() => import('./routes/sign-in')) },
        { path: 'sign-up', lazy: withClient(() => import('./routes/sign-up')) },
        {
          loader: requireSignedIn(queryClient),
          children: [{ index: true, lazy: withClient(() => import('./routes/home')) }],
        },
        { path: '*', lazy: withClient(() => import('./routes/not-found')) },
      ],
    },
  ]);
}
