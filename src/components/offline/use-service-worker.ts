/**
 * Registers the service worker (Workbox's, built by vite-plugin-pwa) and says when a new version
 * is waiting. The few lines workbox-window would do for us, without its 2 kB on every first page:
 * a new version waits until the brewer reloads (the worker's SKIP_WAITING message), never swaps
 * under them mid-brew.
 */
import { useEffect, useState } from 'react';

let registration: Promise<ServiceWorkerRegistration | undefined> | null = null;
const listeners = new Set<(waiting: boolean) => void>();
let waitingNow = false;

function announce(waiting: boolean) {
  waitingNow = waiting;
  for (const listener of listeners) listener(waiting);
}

function register() {
  if (registration || typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
  registration = navigator.serviceWorker
    .register('/sw.js', { scope: '/' })
    .then((reg) => {
      // Only an update waits behind a controlling worker; the first install takes the page at once.
      if (reg.waiting && navigator.serviceWorker.controller) announce(true);
      reg.addEventListener('updatefound', () => {
        const installing = reg.installing;
        installing?.addEventListener('statechange', () => {
          if (installing.state === 'installed' && navigator.serviceWorker.controller) announce(true);
        });
      });
      return reg;
    })
    .catch(() => undefined);
}

/** Swaps in the waiting version and reloads into it once it controls the page. */
async function update() {
  const reg = await registration;
  const waiting = reg?.waiting;
  if (!waiting) return;
  navigator.serviceWorker.addEventListener('controllerchange', () => window.location.reload(), { once: true });
  waiting.postMessage({ type: 'SKIP_WAITING' });
}

export function useServiceWorker() {
  const [needRefresh, setNeedRefresh] = useState(waitingNow);
  useEffect(() => {
    listeners.add(setNeedRefresh);
    register();
    return () => {
      listeners.delete(setNeedRefresh);
    };
  }, []);
  return { needRefresh, setNeedRefresh, updateServiceWorker: update };
}
