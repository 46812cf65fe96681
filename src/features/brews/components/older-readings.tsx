import type { LoadedReadings } from '../api/older-readings';
import { Notice } from '@/components/ui/notice';
import { ShowMore } from '@/components/ui/show-more';

/** "The latest 50 of 2,000 readings" and the list's "Show older readings" for the page before them; nothing when every reading is shown. */
export function OlderReadings({ loaded }: { loaded: LoadedReadings }) {
  if (!loaded.hasOlder) return null;
  const shown = loaded.readings.length.toLocaleString('en');
  const total = loaded.total.toLocaleString('en');
  return (
    <div className="no-print flex flex-wrap items-center gap-3">
      <p className="text-ink-soft" role="status">
        Showing the latest {shown} of {total} readings.
      </p>
      <ShowMore pages={{ hasNextPage: loaded.hasOlder, isFetchingNextPage: loaded.loadingOlder, fetchNextPage: loaded.showOlder }} label="Show older readings" />
      {loaded.error && <Notice tone="error">Older readings could not be loaded: {loaded.error.message} Try again.</Notice>}
    </div>
  );
}
