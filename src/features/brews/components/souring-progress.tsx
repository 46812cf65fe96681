import { Check, Hourglass } from 'lucide-react';
import { souringProgress } from '@shared/brewmath';
import type { BrewReading } from '@shared/schemas/brews';
import { dateTimeText } from './describe';

const hoursText = (h: number) => (h === 0 ? 'first reading' : `${Number(h.toFixed(1))} h after the first`);

/** The souring readings over time: hours since the first, and whether each is at or below the recipe's target pH. */
export function SouringProgress({ readings, targetPh }: { readings: readonly BrewReading[]; targetPh: number }) {
  const steps = souringProgress(
    readings.filter((r) => r.kind === 'souring_ph').map((r) => ({ id: r.id, ph: r.corrected, takenAt: r.takenAt })),
    targetPh,
  );
  if (steps.length === 0) return <p className="text-ink-soft">No souring pH yet. Log the first reading when the wort is held for souring.</p>;
  const reached = steps.some((s) => s.reached);
  return (
    <section aria-labelledby="souring-progress-title" className="space-y-2">
      <h3 id="souring-progress-title" className="text-lg font-bold text-cellar-900">
        Souring progress
      </h3>
      <p className="font-semibold text-cellar-900">
        {reached ? `Target pH ${targetPh.toFixed(2)} reached: on to the boil when you are ready.` : `Not yet at pH ${targetPh.toFixed(2)}: keep souring and read again.`}
      </p>
      <ol className="space-y-1">
        {steps.map((s) => (
          <li key={s.id} className="flex min-h-touch items-center gap-2 rounded-lg bg-white px-3 py-2 ring-1 ring-cellar-100">
            {s.reached ? <Check aria-hidden className="size-5 shrink-0 text-cellar-700" /> : <Hourglass aria-hidden className="size-5 shrink-0 text-ink-soft" />}
            <span>
              <span className="font-semibold">pH&nbsp;{s.ph.toFixed(2)}</span>, {hoursText(s.hoursSinceFirst)} ({dateTimeText(s.takenAt)}):{' '}
              {s.reached ? 'target reached' : 'above target'}
            </span>
          </li>
        ))}
      </ol>
    </section>
  );
}
