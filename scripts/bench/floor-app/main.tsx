/**
 * The framework floor for `npm run bench:ui`: the smallest app on Wortwise's client stack (React,
 * React Router, TanStack Query), one route with a heading, one query, and one input mirrored into
 * a text so the keystroke measurement has a baseline. Built by scripts/bench/ui.ts; not shipped.
 */
import { QueryClient, QueryClientProvider, useQuery } from '@tanstack/react-query';
import { StrictMode, useState } from 'react';
import { createRoot } from 'react-dom/client';
import { createBrowserRouter, RouterProvider } from 'react-router';

const queryClient = new QueryClient();

function Home() {
  const status = useQuery({ queryKey: ['floor'], queryFn: async () => (await fetch('/floor.json')).json() as Promise<{ ok: boolean }> });
  const [value, setValue] = useState('');
  return (
    <main>
      <h1>Floor</h1>
      <p>{status.data?.ok ? 'Loaded' : 'Loading'}</p>
      <label>
        Value <input id="floor-input" inputMode="decimal" value={value} onChange={(e) => setValue(e.target.value)} />
      </label>
      <p id="late-boil-answer">{value ? `You typed ${value}` : 'Type a value'}</p>
    </main>
  );
}

const router = createBrowserRouter([{ path: '*', element: <Home /> }]);

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>
  </StrictMode>,
);
