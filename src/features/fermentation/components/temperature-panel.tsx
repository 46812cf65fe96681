import type { TemperatureRange, TemperatureSummary } from '@shared/schemas/fermentation';
import { countOf } from '@/lib/plural';
import { Notice } from '@/components/ui/notice';
import { useUnits } from '@/lib/units';
import { shortDateTime } from './words';
import { Figure } from '@/components/ui/figure';

const tile = { className: 'rounded-lg bg-cellar-50 p-3', labelStyle: 'plain', size: 'lg', tone: 'strong' } as const;

/** Fermenter temperature: the last 24 hours, the whole fermentation, and every swing beyond the recipe's range. */
export function TemperaturePanel({ summary }: { summary: TemperatureSummary }) {
  const units = useUnits();
  const t = (c: number) => units.format('temperature', c);
  const range = (r: TemperatureRange | null) => (r ? (r.minC === r.maxC ? t(r.minC) : `${t(r.minC)} – ${t(r.maxC)}`) : '—');
  return (
    <div className="space-y-3">
      <dl className="grid grid-cols-2 gap-3">
        <Figure {...tile} label="Last 24 hours" value={range(summary.last24h)} hint={summary.last24h ? countOf(summary.last24h.count, 'reading') : 'No reading in the last 24 hours'} />
        <Figure {...tile} label="Whole fermentation" value={range(summary.overall)} hint={summary.overall ? countOf(summary.overall.count, 'reading') : 'No readings yet'} />
        <Figure {...tile} label="Recipe range" value={summary.target ? `${t(summary.target.minC)} – ${t(summary.target.maxC)}` : '—'} />
        <Figure {...tile} label="Latest" value={summary.latest ? t(summary.latest.tempC) : '—'} hint={summary.latest ? shortDateTime(summary.latest.takenAt) : undefined} />
      </dl>
      {summary.excursionCount > 0 && (
        <Notice tone="caution" title={`${countOf(summary.excursionCount, 'reading')} outside the recipe's range`}>
          {summary.excursionCount > summary.excursions.length && <p>The latest {summary.excursions.length} are listed here.</p>}
          <ul className="mt-1 space-y-0.5">
            {summary.excursions.map((e) => (
              <li key={`${e.takenAt}-${e.tempC}`}>
                {shortDateTime(e.takenAt)}: {t(e.tempC)}, {units.format('temperatureDelta', e.byC)} too {e.direction}
              </li>
            ))}
          </ul>
        </Notice>
      )}
      {summary.swingFlagged && summary.largestSwing24hC !== null && (
        <Notice tone="caution">
          The temperature moved by {units.format('temperatureDelta', summary.largestSwing24hC)} within one day. Yeast works best when it stays steady.
        </Notice>
      )}
    </div>
  );
}
