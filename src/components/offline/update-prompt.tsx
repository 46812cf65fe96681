import { RefreshCw } from 'lucide-react';
import { useRegisterSW } from 'virtual:pwa-register/react';
import { Button } from '@/components/ui/button';

/**
 * Registers the service worker. A new version never swaps under the brewer mid-brew: it waits
 * until they choose to reload.
 */
export function UpdatePrompt() {
  const {
    needRefresh: [needRefresh, setNeedRefresh],
    updateServiceWorker,
  } = useRegisterSW({
    onRegisterError: () => undefined,
  });
  if (!needRefresh) return null;
  return (
    <div role="status" className="no-print bg-malt-100 text-ink">
      <div className="mx-auto flex max-w-5xl flex-wrap items-center gap-2 px-3 py-2 sm:px-6">
        <p className="font-semibold">A new version is ready: reload</p>
        <div className="ml-auto flex gap-2">
          <Button variant="primary" icon={<RefreshCw aria-hidden className="size-5" />} onClick={() => void updateServiceWorker(true)}>
            Reload
          </Button>
          <Button variant="quiet" onClick={() => setNeedRefresh(false)}>
            Later
          </Button>
        </div>
      </div>
    </div>
  );
}
