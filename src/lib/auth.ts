/** The signed-in brewer, shared by every feature: who they are and which units they read. */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Me } from '@shared/schemas/auth';
import { api, ApiError, NetworkError } from './api-client';
import { loadMeCopy, saveMeCopy, setCopyOwner } from './offline/device-copy';
import { setQueueOwner, signedInAgain } from './offline/send';

function owns(me: Me) {
  setQueueOwner(me.id);
  setCopyOwner(me.id);
}

/**
 * The signed-in brewer, or null when nobody is signed in. With no connection, the brewer last
 * seen on this device, so an offline brew day still opens; the server checks the session again
 * when anything is sent.
 */
export async function getMe(signal?: AbortSignal): Promise<Me | null> {
  try {
    const me = await api.get<Me>('/api/auth/me', { signal });
    owns(me);
    signedInAgain();
    void saveMeCopy(me).catch(() => undefined);
    return me;
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    if (error instanceof NetworkError) {
      const copy = await loadMeCopy<Me>().catch(() => undefined);
      if (copy) {
        owns(copy);
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
