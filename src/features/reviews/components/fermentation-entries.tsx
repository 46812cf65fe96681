import type { ReactNode } from 'react';
import type { FermentationReading, PackagingRecord } from '@shared/schemas/fermentation';
import type { BrewReview } from '@shared/schemas/comments';
import { Notice } from '@/components/ui/notice';
import type { Units } from '@/lib/units';
import { deviationText } from './review-deviations';

export interface ReviewEntry {
  at: string;
  rank: number;
  key: string;
  node: ReactNode;
}

const dayOf = (r: Pick<FermentationReading, 'day'>) => `Day ${Math.max(0, r.day).toFixed(1)}`;

function readingTitle(r: FermentationReading): string {
  if (r.kind === 'temperature') return 'Fermenter temperature';
  return r.estimate ? 'Gravity, refractometer estimate' : `Gravity, ${r.method}`;
}

function asRead(r: FermentationReading, units: Units): string {
  const raw = r.raw;
  if (raw.method === 'thermometer') return units.format('temperature', raw.tempC);
  if (raw.method === 'refractometer') return `${raw.brix.toFixed(1)}\u00a0°Bx (${raw.originalBrix.toFixed(1)}\u00a0°Bx at the start)`;
  return raw.sampleTempC === null ? units.format('gravity', raw.sg) : `${units.format('gravity', raw.sg)} at ${units.format('temperature', raw.sampleTempC)}`;
}

function FermentationEntry({ reading, review, units }: { reading: FermentationReading; review: BrewReview; units: Units }) {
  const value = reading.kind === 'temperature' ? units.format('temperature', reading.corrected) : units.format('gravity', reading.corrected);
  const mine = review.deviations.filter((d) => d.stage === 'fermentation' && d.fermentationReadingId === reading.id);
  return (
    <div>
      <p className="font-bold text-cellar-900">
        {readingTitle(reading)} <span className="font-normal text-ink-faint">· {dayOf(reading)}</span>
      </p>
      <p className="tabular-nums">
        As read <strong>{asRead(reading, units)}</strong> · corrected <strong>{value}</strong>
      </p>
      <p className="text-sm text-ink-soft">{reading.instrument.instrumentId === null ? `${reading.instrument.name}: common-practice defaults` : reading.instrument.name}</p>
      {reading.note && <p className="whitespace-pre-line">{reading.note}</p>}
      {mine.map((d) => (
        <Notice key={d.code} tone="caution" className="mt-1" title={d.code.startsWith('instrument-') ? 'Instrument' : 'Off target'}>
          {deviationText(d, units, review.brew.pitchedAt)}
        </Notice>
      ))}
    </div>
  );
}

function PackagingEntry({ packaging, review, units }: { packaging: PackagingRecord; review: BrewReview; units: Units }) {
  const early = review.deviations.find((d) => d.code === 'packaged-before-stable');
  return (
    <div>
      <p className="font-bold text-cellar-900">Packaged in {packaging.container === 'keg' ? 'a keg' : 'bottles'}</p>
      <p className="tabular-nums">
        {units.format('volume', packaging.volumeL)} · aiming for {packaging.targetCo2Volumes.toFixed(1)} volumes of CO2
        {packaging.primingSugarG !== null && <> · {units.format('smallMass', packaging.primingSugarG)} priming sugar</>}
      </p>
      <p className="text-sm text-ink-soft">Final-gravity verdict then: {packaging.verdictReason}</p>
      {packaging.note && <p className="whitespace-pre-line">{packaging.note}</p>}
      {early && (
        <Notice tone="caution" className="mt-1" title="Before the gravity was stable">
          {deviationText(early, units, review.brew.pitchedAt)}
        </Notice>
      )}
    </div>
  );
}

/** Fermentation readings and the packaging record as timeline entries, beside the brew day's own. */
export function fermentationEntries(review: BrewReview, units: Units): ReviewEntry[] {
  const entries: ReviewEntry[] = review.fermentation.readings.map((r) => ({
    at: r.takenAt,
    rank: 1,
    key: `f-${r.id}`,
    node: <FermentationEntry reading={r} review={review} units={units} />,
  }));
  const p = review.fermentation.packaging;
  if (p) entries.push({ at: p.packagedAt, rank: 1, key: 'packaging', node: <PackagingEntry packaging={p} review={review} units={units} /> });
  return entries;
}
