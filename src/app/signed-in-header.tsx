/**
 * The header's parts that only a signed-in brewer sees, in their own chunk: a visitor's first page
 * and the public check never download the device queue, its sending, or the preferences menu.
 */
import { useMe } from '@/lib/auth';
import { useOfflineSync } from '@/lib/offline/use-offline-sync';

export { QueueCount } from '@/components/offline/queued-list';
export { PreferencesMenu } from '@/features/auth/components/preferences-menu';

/** Owns the device queue for the signed-in brewer and sends what waited when a connection is back. */
export function OfflineSync() {
  const { data: me } = useMe();
  useOfflineSync(me);
  return null;
}
