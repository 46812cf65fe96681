import { useId } from 'react';
import { describeDeviation } from '@shared/brew-deviations';
import type { BrewDecision, BrewDeviation } from '@shared/schemas/brews';
import { Notice } from '@/components/ui/notice';
import { useUnits } from '@/lib/units';
import { decisionAction, decisionOutcomeText, decisionReadingText, timeText, deviationTitle } from './describe';

/** A late-boil decision as recorded: what was read, what was chosen, where it leads, and why. */
export function DecisionCard({ decision, deviations, level = 4 }: { decision: BrewDecision; deviations: readonly BrewDeviation[]; level?: 3 | 4 }) {
  // An h4 under the brew day's stage sections, an h3 straight under a log's "Timeline" h2.
  const Heading = level === 3 ? 'h3' : 'h4';
  const units = useUnits();
  const headingId = useId();
  const outcome = decisionOutcomeText(decision, units);
  const mine = deviations.filter((d) => d.decisionId === decision.id);
  return (
    <article aria-labelledby={headingId} className="rounded-xl bg-white p-4 shadow-sm ring-1 ring-malt-300" data-testid="decision">
      <header className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="text-xs font-semibold uppercase tracking-wide text-malt-700">Late-boil decision</p>
        <span className="text-sm text-ink-faint">{timeText(decision.decidedAt)}</span>
      </header>
      <Heading id={headingId} className="mt-1 text-2xl font-bold text-cellar-900">
        {decision.choice.kind === 'own' ? `Own action: ${decisionAction(decision, units)}` : decisionAction(decision, units)}
      </Heading>
      <p className="mt-1 text-sm text-ink-soft">Reading: {decisionReadingText(decision, units)}</p>
      {outcome && <p className="mt-1 font-semibold">{outcome}</p>}
      {decision.note && <p className="mt-2 whitespace-pre-line">Why: {decision.note}</p>}
      {mine.map((d) => (
        <Notice key={d.code} tone="caution" className="mt-2" title={deviationTitle(d)}>
          {describeDeviation(d, units)}
        </Notice>
      ))}
    </article>
  );
}
