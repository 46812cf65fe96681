import { RotateCcw } from 'lucide-react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';

/**
 * Shown when a save never reached the server: what the brewer typed stays in the form, and one
 * big button sends it again.
 */
export function NotSaved({ onRetry, busy }: { onRetry: () => void; busy?: boolean }) {
  return (
    <div className="space-y-2">
      <Notice tone="error" title="Not saved — no connection">
        Everything you typed is still here. Check the connection, then try again.
      </Notice>
      <Button variant="primary" className="w-full" busy={busy} icon={<RotateCcw aria-hidden className="size-5" />} onClick={onRetry}>
        Retry
      </Button>
    </div>
  );
}
