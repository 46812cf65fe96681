import { SaveNotice } from '@/components/ui/save-notice';
import { OFFLINE_MESSAGE } from '@/lib/api-client';

/**
 * Shown when a save never reached the server: what the brewer typed stays in the form, and the
 * shared save notice offers to send it again.
 */
export function NotSaved({ onRetry, busy }: { onRetry: () => void; busy?: boolean }) {
  return <SaveNotice failure={{ kind: 'offline', message: OFFLINE_MESSAGE }} busy={busy} onRetry={onRetry} />;
}
