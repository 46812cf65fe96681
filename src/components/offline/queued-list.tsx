import { Clock, RotateCcw, Trash2, TriangleAlert } from 'lucide-react';
import { Button } from '@/components/ui/button';
import { markWaiting, removeItem, type QueuedItem, type QueuedKind } from '@/lib/offline/queue';
import { useQueuedItems } from '@/lib/offline/use-offline-queue';

const timeFormat = new Intl.DateTimeFormat(undefined, { hour: '2-digit', minute: '2-digit', day: 'numeric', month: 'short' });

function QueuedCard({ item }: { item: QueuedItem }) {
  const refused = item.state === 'refused';
  return (
    <li
      data-testid="queued-item"
      data-state={item.state}
      className={`space-y-2 rounded-xl p-3 ring-1 ${refused ? 'bg-alert-50 ring-alert-500/30' : 'bg-malt-50 ring-malt-300'}`}
    >
      <div className="flex flex-wrap items-baseline gap-x-2">
        <p className="font-semibold text-ink">{item.label}</p>
        <p className="text-sm text-ink-soft">{timeFormat.format(new Date(item.takenAt))}</p>
      </div>
      {refused ? (
        <>
          <p className="flex items-start gap-1 text-sm font-semibold text-alert-700">
            <TriangleAlert aria-hidden className="mt-0.5 size-4 shrink-0" />
            <span>
              Refused: {item.refusal?.message}
              {item.refusal?.fields && Object.values(item.refusal.fields).length > 0 && <> ({Object.values(item.refusal.fields).join(' ')})</>}
            </span>
          </p>
          <div className="grid grid-cols-2 gap-2">
            <Button variant="secondary" icon={<RotateCcw aria-hidden className="size-5" />} onClick={() => void markWaiting(item.id)}>
              Send again
            </Button>
            <Button
              variant="danger"
              icon={<Trash2 aria-hidden className="size-5" />}
              onClick={() => {
                if (window.confirm(`Discard “${item.label}”? It was never stored and cannot be brought back.`)) void removeItem(item.id);
              }}
            >
              Discard
            </Button>
          </div>
        </>
      ) : (
        <p className="flex items-center gap-1 text-sm font-semibold text-malt-700">
          <Clock aria-hidden className="size-4" /> Waiting to send
        </p>
      )}
    </li>
  );
}

/** The entries made on this device that the server does not have yet, in the log where they belong. */
export function QueuedList({ brewId, kinds, title = 'Kept on this device' }: { brewId: number; kinds?: readonly QueuedKind[]; title?: string }) {
  const items = useQueuedItems().filter((i) => i.brewId === brewId && (!kinds || kinds.includes(i.kind)));
  if (items.length === 0) return null;
  return (
    <section aria-label={title} className="space-y-2">
      <h3 className="text-lg font-bold text-cellar-900">{title}</h3>
      <ul className="space-y-2">
        {items.map((item) => (
          <QueuedCard key={item.id} item={item} />
        ))}
      </ul>
    </section>
  );
}

/** For the app header: how many entries wait on this device. */
export function QueueCount() {
  const items = useQueuedItems();
  const waiting = items.filter((i) => i.state === 'waiting').length;
  const refused = items.length - waiting;
  if (items.length === 0) return null;
  return (
    <span role="status" data-testid="queue-count" className="whitespace-nowrap rounded-full bg-malt-300 px-2 py-0.5 text-sm font-semibold text-ink">
      {waiting > 0 && (
        <>
          {waiting} waiting<span className="sr-only"> to send</span>
        </>
      )}
      {waiting > 0 && refused > 0 ? ', ' : ''}
      {refused > 0 ? `${refused} refused` : ''}
    </span>
  );
}
