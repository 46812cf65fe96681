import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, Navigate } from 'react-router';
import { meQueryOptions } from '@/lib/auth';
import { requireSignedIn } from './guards';
import { IndexPage } from './routes/index-page';
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
        { path: 'forgot-password', lazy: withClient(() => import('./routes/forgot-password')) },
        { path: 'reset-password/:token', lazy: withClient(() => import('./routes/reset-password')) },
        { path: 'invitations/:token', lazy: withClient(() => import('./routes/invitation')) },
        { path: 'late-boil-check', lazy: withClient(() => import('./routes/late-boil-check')) },
        // The front page for visitors, the home for brewers: decided after the root loader knows who.
        { index: true, Component: IndexPage },
        {
          loader: requireSignedIn(queryClient),
          children: [
            { path: 'recipes', lazy: withClient(() => import('./routes/recipes')) },
            { path: 'recipes/new', lazy: withClient(() => import('./routes/recipes-new')) },
            { path: 'recipes/:id', lazy: withClient(() => import('./routes/recipes-view')) },
            { path: 'recipes/:id/edit', lazy: withClient(() => import('./routes/recipes-edit')) },
            { path: 'brews', lazy: withClient(() => import('./routes/brews')) },
            { path: 'brews/:id', lazy: withClient(() => import('./routes/brews-day')) },
            { path: 'brews/:id/log', lazy: withClient(() => import('./routes/brews-log')) },
            { path: 'brews/:id/fermentation', lazy: withClient(() => import('./routes/fermentation')) },
            { path: 'instruments', lazy: withClient(() => import('./routes/instruments')) },
            { path: 'clubs', lazy: withClient(() => import('./routes/clubs')) },
            { path: 'clubs/:id', lazy: withClient(() => import('./routes/clubs-detail')) },
            { path: 'reviews', lazy: withClient(() => import('./routes/reviews')) },
            { path: 'reviews/:brewId', lazy: withClient(() => import('./routes/review-brew')) },
            { path: 'admin', element: <Navigate to="/admin/users" replace /> },
            { path: 'admin/users', lazy: withClient(() => import('./routes/admin-users')) },
            { path: 'admin/mail', lazy: withClient(() => import('./routes/admin-mail')) },
          ],
        },
        { path: '*', lazy: withClient(() => import('./routes/not-found')) },
      ],
    },
  ]);
}
