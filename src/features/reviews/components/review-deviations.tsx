import { describeDeviation } from '@shared/brew-deviations';
import { describeFermentationDeviation } from '@shared/fermentation-deviations';
import { brewStageLabels } from '@shared/schemas/brews';
import type { ReviewDeviation } from '@shared/schemas/comments';
import type { Units } from '@/lib/units';

const stageLabel = (d: ReviewDeviation) => (d.stage === 'fermentation' ? 'Fermentation' : brewStageLabels[d.stage]);

/** The timeline entry a deviation is about, for a "see it" link. */
export function deviationAnchor(d: ReviewDeviation): string | null {
  if (d.stage === 'fermentation') return d.fermentationReadingId !== null ? `entry-f-${d.fermentationReadingId}` : d.code === 'packaged-before-stable' ? 'entry-packaging' : null;
  if (d.readingId !== null) return `entry-r-${d.readingId}`;
  if (d.decisionId !== null) return `entry-d-${d.decisionId}`;
  return null;
}

/** One deviation in words, in the reader's own units. */
export function deviationText(d: ReviewDeviation, units: Units, pitchedAt: string | null): string {
  return d.stage === 'fermentation' ? describeFermentationDeviation(d, units, pitchedAt) : describeDeviation(d, units);
}

/**
 * Where the brew left its targets, called out at the top of the review: off-target numbers first
 * in the order they happened, then instruments that were not calibrated or were overdue.
 */
export function ReviewDeviations({ deviations, units, pitchedAt }: { deviations: readonly ReviewDeviation[]; units: Units; pitchedAt: string | null }) {
  if (deviations.length === 0) {
    return <p className="rounded-lg bg-ok-50 px-3 py-2 text-ok-700">Nothing outside the recipe’s targets, and every instrument was calibrated.</p>;
  }
  const instrument = (d: ReviewDeviation) => d.code === 'instrument-uncalibrated' || d.code === 'instrument-overdue';
  const ordered = [...deviations.filter((d) => !instrument(d)), ...deviations.filter(instrument)];
  return (
    <ul className="space-y-2" data-testid="review-deviations">
      {ordered.map((d, i) => {
        const anchor = deviationAnchor(d);
        return (
          <li key={`${d.code}-${anchor ?? i}`} className={`rounded-lg px-3 py-2 ${instrument(d) ? 'bg-cellar-50 text-cellar-900' : 'bg-malt-50 text-malt-700'}`}>
            <strong>{stageLabel(d)}:</strong> {deviationText(d, units, pitchedAt)}
            {anchor && (
              <>
                {' '}
                <a href={`#${anchor}`} className="-my-2 inline-flex min-h-touch items-center whitespace-nowrap px-1 font-semibold underline underline-offset-2">
                  See it
                </a>
              </>
            )}
          </li>
        );
      })}
    </ul>
  );
}
