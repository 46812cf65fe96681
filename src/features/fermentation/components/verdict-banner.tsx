import { CircleCheck, Hourglass, OctagonPause, TrendingDown } from 'lucide-react';
import type { FermentationVerdict } from '@shared/schemas/fermentation';
import { useUnits } from '@/lib/units';
import { shortDate, verdictTitles } from './words';
import { Figure } from '@/components/ui/figure';

const looks = {
  'no-reading': { box: 'bg-cellar-50 ring-cellar-300 text-cellar-900', Icon: Hourglass },
  'too-early': { box: 'bg-cellar-50 ring-cellar-300 text-cellar-900', Icon: Hourglass },
  moving: { box: 'bg-malt-50 ring-malt-300 text-malt-700', Icon: TrendingDown },
  stuck: { box: 'bg-malt-50 ring-malt-300 text-malt-700', Icon: OctagonPause },
  stable: { box: 'bg-ok-50 ring-ok-500 text-ok-700', Icon: CircleCheck },
} as const;

/** The verdict, big enough to read at arm's length, with its reason in words. */
export function VerdictBanner({ verdict, now }: { verdict: FermentationVerdict; now: string }) {
  const units = useUnits();
  const { box, Icon } = looks[verdict.state];
  const day = Math.max(0, Math.floor(verdict.daysSincePitch));
  return (
    <section aria-labelledby="verdict-title" className={`rounded-xl p-4 ring-2 sm:p-5 ${box}`} data-state={verdict.state}>
      <div className="flex items-start gap-3">
        <Icon aria-hidden className="mt-1 size-8 shrink-0" />
        <div className="min-w-0">
          <p className="text-sm font-semibold uppercase tracking-wide opacity-80">Final-gravity verdict</p>
          <h2 id="verdict-title" className="text-2xl font-bold sm:text-3xl">
            {verdictTitles[verdict.state]}
          </h2>
          <p className="mt-1 text-base text-ink" data-testid="verdict-reason">
            {verdict.reason}
          </p>
          <dl className="mt-2 flex flex-wrap gap-x-6 gap-y-1 text-sm text-ink-soft">
            <Figure inline label="Since pitching" value={`${day} ${day === 1 ? 'day' : 'days'}`} />
            {verdict.latestSg !== null && <Figure inline label="Latest gravity" value={units.format('gravity', verdict.latestSg)} />}
            {verdict.nextCheckAt && <Figure inline label="Next gravity reading" value={Date.parse(verdict.nextCheckAt) <= Date.parse(now) ? 'now' : shortDate(verdict.nextCheckAt)} />}
          </dl>
        </div>
      </div>
    </section>
  );
}
