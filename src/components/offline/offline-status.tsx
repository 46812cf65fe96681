import { CloudOff, HardDrive, LogIn, Send, Wifi } from 'lucide-react';
import { Link, useLocation } from 'react-router';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import type { FlushOptions } from '@/lib/offline/send';
import { isStorageLow, useOnline, useQueuedItems, useSendNow, useSendState } from '@/lib/offline/use-offline-queue';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/**
 * The honest state of the brew day: online or not, what is waiting on this device, what the
 * server refused, and a button to send now.
 */
export function OfflineStatus({ brewId, onAccepted }: { brewId?: number; onAccepted?: FlushOptions['onAccepted'] }) {
  const online = useOnline();
  const all = useQueuedItems();
  const items = brewId === undefined ? all : all.filter((i) => i.brewId === brewId);
  const send = useSendState();
  const sendNow = useSendNow({ onAccepted });
  const location = useLocation();
  const waiting = items.filter((i) => i.state === 'waiting').length;
  const refused = items.length - waiting;
  const next = encodeURIComponent(location.pathname + location.search);

  return (
    <section aria-label="Connection and waiting items" className="no-print space-y-2">
      <div className="flex flex-wrap items-center gap-2 rounded-xl bg-white p-3 shadow-sm ring-1 ring-cellar-100" data-testid="offline-status">
        <p className="flex items-center gap-2 font-semibold text-cellar-900">
          {online ? <Wifi aria-hidden className="size-5" /> : <CloudOff aria-hidden className="size-5 text-alert-700" />}
          {online ? 'Online' : 'Offline: new entries are kept on this device'}
        </p>
        <p className="text-ink-soft" aria-live="polite">
          {waiting === 0 && refused === 0 ? 'Nothing waiting to send.' : [waiting > 0 && `${plural(waiting, 'item', 'items')} waiting to send`, refused > 0 && `${refused} refused`].filter(Boolean).join(', ')}
        </p>
        {waiting > 0 && (
          <Button variant="secondary" className="ml-auto" busy={send.sending} disabled={!online || send.needsSignIn} icon={<Send aria-hidden className="size-5" />} onClick={() => void sendNow()}>
            Send now
          </Button>
        )}
      </div>
      {send.needsSignIn && waiting > 0 && (
        <Notice tone="caution" title="Your session has ended">
          <p>{plural(waiting, 'item waits', 'items wait')} on this device. Sign in again and they are sent.</p>
          <Link to={`/sign-in?next=${next}`} className="mt-1 inline-flex min-h-touch items-center gap-1 font-semibold underline">
            <LogIn aria-hidden className="size-4" /> Sign in again
          </Link>
        </Notice>
      )}
      {online && !send.needsSignIn && waiting > 0 && send.problem && !send.sending && <Notice tone="caution">Not sent yet: {send.problem} Kept on this device; sent again when the connection returns.</Notice>}
      {send.storageFull && (
        <Notice tone="error" title="This device is full">
          New entries cannot be kept offline. Free some space, or keep a connection until they are sent.
        </Notice>
      )}
      {!send.storageFull && isStorageLow() && (
        <Notice tone="caution" title="Little room left on this device">
          <HardDrive aria-hidden className="mr-1 inline size-4" />
          Offline entries may not fit. Free some space before relying on them.
        </Notice>
      )}
    </section>
  );
}
