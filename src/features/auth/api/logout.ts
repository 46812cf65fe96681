import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';
import { forgetBrewer, unsentCount } from '@/lib/offline/use-offline-sync';

export const logout = () => api.post<void>('/api/auth/logout');
/** Ends every session of the account, on every device. */
export const logoutEverywhere = () => api.post<void>('/api/auth/logout-everywhere');

/**
 * Asks first when entries made offline have not been sent: signing out clears them from the
 * device. Resolves false when the brewer chose to stay signed in.
 */
export async function confirmSignOut(userId: number, ask: (message: string) => boolean = (m) => window.confirm(m)): Promise<boolean> {
  const unsent = await unsentCount(userId).catch(() => 0);
  if (unsent === 0) return true;
  return ask(
    `${unsent} ${unsent === 1 ? 'entry has' : 'entries have'} not been sent to Wortwise yet. Signing out deletes ${unsent === 1 ? 'it' : 'them'} from this device. Sign out anyway?`,
  );
}

export function useLogout({ everywhere = false }: { everywhere?: boolean } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => {
      const me = queryClient.getQueryData(meQueryOptions().queryKey);
      await (everywhere ? logoutEverywhere() : logout());
      // The queue and the offline copies belong to that brewer only.
      if (me) await forgetBrewer(me.id);
    },
    onSuccess: () => {
      queryClient.clear();
      queryClient.setQueryData(meQueryOptions().queryKey, null);
    },
  });
}
