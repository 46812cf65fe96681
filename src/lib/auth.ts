/** The signed-in brewer, shared by every feature: who they are and which units they read. */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Me } from '@shared/schemas/auth';
import { api, ApiError, NetworkError } from './api-client';

/**
 * The device queue and copies, loaded only once someone is signed in (or may be, offline): a
 * visitor's first page and the public check never download them.
 */
async function offline() {
  const [copies, send] = await Promise.all([import('./offline/device-copy'), import('./offline/send')]);
  return {
    ...copies,
    ...send,
    owns(me: Me) {
      send.setQueueOwner(me.id);
      copies.setCopyOwner(me.id);
    },
  };
}

/**
 * The signed-in brewer, or null when nobody is signed in. With no connection, the brewer last
 * seen on this device, so an offline brew day still opens; the server checks the session again
 * when anything is sent.
 */
export async function getMe(signal?: AbortSignal): Promise<Me | null> {
  try {
    const me = await api.get<Me>('/api/auth/me', { signal });
    const device = await offline();
    device.owns(me);
    device.signedInAgain();
    void device.saveMeCopy(me).catch(() => undefined);
    return me;
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    if (error instanceof NetworkError) {
      const device = await offline().catch(() => undefined);
      const copy = await device?.loadMeCopy<Me>().catch(() => undefined);
      if (device && copy) {
        device.owns(copy);
        return copy;
      }
      // Nobody has signed in on this device yet: the public pages (the late-boil check) still open.
      return null;
    }
    throw error;
  }
}

// 'always': offline, answer from the device copy instead of pausing the page forever.
export const meQueryOptions = () => queryOptions({ queryKey: ['auth', 'me'], queryFn: ({ signal }) => getMe(signal), staleTime: 5 * 60_000, networkMode: 'always' });

export function useMe() {
  return useQuery(meQueryOptions());
}
