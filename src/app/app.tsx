import { useState } from 'react';
import { RouterProvider } from 'react-router';
import { setUnauthorizedHandler } from '@/lib/api-client';
import { createQueryClient } from '@/lib/query-client';
import { meQueryOptions } from '@/lib/auth';
import { AppProvider } from './provider';
import { linkFeatureCaches } from './query-links';
import { createAppRouter } from './router';

export function App() {
  const [{ queryClient, router }] = useState(() => {
    const queryClient = createQueryClient();
    linkFeatureCaches(queryClient);
    const router = createAppRouter(queryClient);
    setUnauthorizedHandler(() => {
      queryClient.setQueryData(meQueryOptions().queryKey, null);
      const here = window.location.pathname + window.location.search;
      void router.navigate(`/sign-in?next=${encodeURIComponent(here)}`);
    });
    return { queryClient, router };
  });
  return (
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>
  );
}
