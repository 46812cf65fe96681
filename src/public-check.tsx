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
import { PublicCheckPage } from './app/public-check-page';
import './index.css';

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <PublicCheckPage />
  </StrictMode>,
);
