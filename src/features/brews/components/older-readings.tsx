import { History } from 'lucide-react';
import type { LoadedReadings } from '../api/older-readings';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';

/** "The latest 50 of 2,000 readings" and a button for the page before them; nothing when every reading is shown. */
export function OlderReadings({ loaded }: { loaded: LoadedReadings }) {
  if (!loaded.hasOlder) return null;
  const shown = loaded.readings.length.toLocaleString('en');
  const total = loaded.total.toLocaleString('en');
  return (
    <div className="no-print flex flex-wrap items-center gap-3">
      <p className="text-ink-soft" role="status">
        Showing the latest {shown} of {total} readings.
      </p>
      <Button variant="secondary" busy={loaded.loadingOlder} icon={<History aria-hidden className="size-5" />} onClick={() => void loaded.showOlder()}>
        {loaded.loadingOlder ? 'Loading older readings…' : 'Show older readings'}
      </Button>
      {loaded.error && <Notice tone="error">Older readings could not be loaded: {loaded.error.message} Try again.</Notice>}
    </div>
  );
}
