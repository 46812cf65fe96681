/** App-wide: who owns the device queue, and catching up whenever the brewer and a connection are back. */
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect } from 'react';
import { clearCopiesOf, saveMeCopy, setCopyOwner } from './device-copy';
import { clearQueueOf, itemsOf } from './queue';
import { queueOwner, setAcceptedHandler, setQueueOwner, signedInAgain } from './send';
import { hasIndexedDb } from './storage';
import { useCatchUp } from './use-offline-queue';

export function useOfflineSync(me: { id: number } | null | undefined) {
  const queryClient = useQueryClient();
  useEffect(() => {
    if (!me) return;
    // A sign-in sets "me" without asking the server again: the queue is theirs from now on.
    setQueueOwner(me.id);
    setCopyOwner(me.id);
    signedInAgain();
    void saveMeCopy(me).catch(() => undefined);
  }, [me]);
  // After each accepted item the pages show the server's version of the log.
  const onAccepted = useCallback(() => void queryClient.invalidateQueries(), [queryClient]);
  useEffect(() => {
    setAcceptedHandler(onAccepted);
    return () => setAcceptedHandler(null);
  }, [onAccepted]);
  // Keyed on the object, not the id: signing in again as the same brewer must send what waited.
  useCatchUp(me ?? null, onAccepted);
}

/** How many entries of this brewer have not reached the server (0 where IndexedDB is missing). */
export async function unsentCount(userId: number): Promise<number> {
  if (!hasIndexedDb()) return 0;
  return (await itemsOf(userId)).length;
}

/** Sign-out: the queue and the page copies belong to that brewer only. */
export async function forgetBrewer(userId: number) {
  if (hasIndexedDb()) {
    await clearQueueOf(userId);
    await clearCopiesOf(userId);
  }
  if (queueOwner() === userId) setQueueOwner(null);
  setCopyOwner(null);
}
