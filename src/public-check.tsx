/**
 * The public late-boil check's own page (late-boil-check.html): what a visitor without a session
 * gets at /late-boil-check (server/app.ts). It renders the same check as the app's route with
 * React and TanStack Query but without the router and the app shell, so a first visit from a
 * search or a shared link downloads about half the JavaScript (decision 0026). Its links are
 * plain links into the app. The service worker is registered here too, so the next visit, and
 * one without a connection, gets the whole app.
 */
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import './index.css';

// The page itself is a chunk of its own: only this file is the entry's, so the build's shell group
// (vite.config.ts) never pulls the check's code into the app's first page, or the app's into this one.
void import('./app/public-check-page').then(({ PublicCheckPage }) => {
  createRoot(document.getElementById('root')!).render(
    <StrictMode>
      <PublicCheckPage />
    </StrictMode>,
  );
});
