/**
 * The late-boil answer's option cards: one per thing the brewer can do, then what is not possible
 * now. Loaded on its own (late-boil-check.tsx), once the brewer starts on the form.
 */
import { Check, RotateCcw } from 'lucide-react';
import { memo, useId, type ReactNode } from 'react';
import {
  gapInWords,
  optionActionParts,
  optionTitle,
  reasonInWords,
  wholeMinutes,
  predictBoilBalance,
  type BalanceRecipe,
  type BoilCheckOutcome,
  type FeasibleOption,
  type InfeasibleOption,
  type OptionBalance,
} from '@shared/boil-check';
import { formatAbv } from '@shared/brewmath';
import type { BoilCheckParsed } from '@shared/schemas/boil-check';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Figure } from '@/components/ui/figure';
import type { Units } from '@/lib/units';
import { BalanceFigures } from './balance-figures';
import { optionKey, orderedOptions, type ChoiceState } from './check-summary';

interface ResultsProps {
  input: BoilCheckParsed;
  outcome: BoilCheckOutcome;
  units: Units;
  choice: ChoiceState | null;
  onChoose?: (option: FeasibleOption) => void;
  /** Above the option cards, so it is read before choosing (on brew day: why, saved with the choice). */
  beforeOptions?: ReactNode;
  /** The recipe's hops, grist and targets: bitterness and colour per option when given. */
  recipe?: BalanceRecipe;
}

/**
 * One card per thing the brewer can do, then what is not possible now. Rendered from a deferred
 * copy of the check by the answer panel, so a keystroke paints the summary first.
 */
export const CheckOptions = memo(function CheckOptions({ input, outcome, units, choice, onChoose, beforeOptions, recipe }: ResultsProps) {
  const { result, warnings } = outcome;
  const balance = recipe ? predictBoilBalance(input, outcome, recipe) : null;
  const ordered = orderedOptions(result);
  const infeasible = result.options.filter((o): o is InfeasibleOption => !o.feasible);
  const anyExtract = ordered.some((o) => o.kind === 'extract');

  return (
    <>
      {warnings.map((w) => (
        <Notice key={w} tone="caution">
          {w}
        </Notice>
      ))}

      <h2 className="text-lg font-bold text-cellar-900">Your options</h2>
      {anyExtract && <p className="text-sm text-ink-soft">Adding extract or sugar: sprinkle it in slowly while stirring, as it can foam up and boil over.</p>}
      {beforeOptions}
      <ul className="space-y-3">
        {ordered.map((option) => (
          <li key={optionKey(option)}>
            <OptionCard
              option={option}
              input={input}
              outcome={outcome}
              units={units}
              choice={choice?.key === optionKey(option) ? choice : null}
              onChoose={onChoose}
              balance={balance ? balance.options[result.options.indexOf(option)] : undefined}
            />
          </li>
        ))}
      </ul>

      {balance && (
        <p className="text-xs text-ink-faint">
          Bitterness by Tinseth&apos;s formula from the recipe&apos;s hops, colour by Morey&apos;s equation from its malts. Water added now or in the fermenter dilutes both;
          extract adds its own colour and, by raising the gravity, bitters a little less; boiling on gives the hops already in more time. {balance.assumptions.join(' ')}
        </p>
      )}

      {infeasible.length > 0 && (
        <section aria-label="Not possible now" className="rounded-xl bg-cellar-50 p-4">
          <h3 className="text-sm font-semibold text-ink-soft">Not possible now</h3>
          <ul className="mt-2 space-y-2 text-sm">
            {groupReasons(infeasible, input, outcome, units).map(({ title, reason }) => (
              <li key={title}>
                <span className="font-semibold">{title}:</span> {reason}
              </li>
            ))}
          </ul>
        </section>
      )}
    </>
  );
});

/** The same reason for all four extracts (e.g. the wort is already over) reads once. */
function groupReasons(options: InfeasibleOption[], input: BoilCheckParsed, outcome: BoilCheckOutcome, units: Units) {
  const context = {
    result: outcome.result,
    targetVolumeL: input.targetVolumeL,
    kettleCapacityL: input.kettleCapacityL,
    boilOffLPerHour: input.boilOffLPerHour,
  };
  const rows = options.map((o) => ({ title: optionTitle(o), reason: reasonInWords(o, context, units.unitSystem), extract: o.kind === 'extract' }));
  const extractRows = rows.filter((r) => r.extract);
  const sameForAll = extractRows.length > 1 && extractRows.every((r) => r.reason === extractRows[0].reason);
  if (!sameForAll) return rows;
  return [{ title: 'Extract or sugar', reason: extractRows[0].reason }, ...rows.filter((r) => !r.extract)];
}

const lowerFirst = (text: string) => text.charAt(0).toLowerCase() + text.slice(1);

function hintFor(option: FeasibleOption, input: BoilCheckParsed, outcome: BoilCheckOutcome, units: Units): string | null {
  switch (option.kind) {
    case 'extract':
      return null;
    case 'water':
      return 'Clean drinking water, now or into the fermenter after chilling: the result is the same.';
    case 'boil-longer':
      return `Flame-out in ${input.minutesLeft + wholeMinutes(option.extraMinutes)} minutes from now instead of ${input.minutesLeft}.`;
    case 'as-is':
      return outcome.result.status === 'on-target' ? 'The wort will finish on target.' : `The wort will finish ${lowerFirst(gapInWords(outcome.result, units.gravityUnit))}.`;
  }
}

function OptionCard({
  option,
  input,
  outcome,
  units,
  choice,
  onChoose,
  balance,
}: {
  option: FeasibleOption;
  input: BoilCheckParsed;
  outcome: BoilCheckOutcome;
  units: Units;
  choice: ChoiceState | null;
  onChoose?: (option: FeasibleOption) => void;
  balance?: OptionBalance | null;
}) {
  const headingId = useId();
  const { before, amount, after } = optionActionParts(option, units.unitSystem);
  const hint = hintFor(option, input, outcome, units);
  // Leaving the wort short or strong is an option, not the headline.
  const quiet = option.kind === 'as-is' && outcome.result.status !== 'on-target';
  return (
    <article aria-labelledby={headingId} data-option={optionKey(option)} className="rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100">
      <p className="text-xs font-semibold uppercase tracking-wide text-ink-faint">{optionTitle(option)}</p>
      <h3 id={headingId} className="mt-1 text-2xl font-bold leading-tight text-cellar-900">
        {before && `${before} `}
        <span className={`${quiet ? 'text-3xl' : 'text-5xl'} tabular-nums text-ink`}>{amount}</span>
        {after && ` ${after}`}
      </h3>
      {hint && <p className="mt-1 text-sm text-ink-soft">{hint}</p>}
      <dl className="mt-3 grid grid-cols-3 gap-2 text-sm">
        <Figure className="min-w-0" labelStyle="plain" size="xl" label="OG" value={units.format('gravity', option.endSg)} />
        <Figure className="min-w-0" labelStyle="plain" size="xl" label="Into fermenter" value={units.format('volume', option.fermenterVolumeL)} />
        <Figure className="min-w-0" labelStyle="plain" size="xl" label="ABV" value={formatAbv(option.abvPercent)} />
      </dl>
      {balance && <BalanceFigures balance={balance} testId={optionKey(option)} />}
      {onChoose && (
        <div className="mt-3 space-y-2">
          {choice?.state === 'failed' ? (
            <>
              <Notice tone="error" title="Not saved">
                {choice.message} Everything you typed is still here.
              </Notice>
              <Button variant="primary" className="w-full" icon={<RotateCcw aria-hidden className="size-5" />} onClick={() => onChoose(option)}>
                Try again
              </Button>
            </>
          ) : choice?.state === 'saved' ? (
            <Notice tone="success">{choice.message ?? 'Saved to the brew-day log.'}</Notice>
          ) : (
            <Button
              variant="primary"
              className="w-full"
              busy={choice?.state === 'saving'}
              icon={<Check aria-hidden className="size-5" />}
              onClick={() => onChoose(option)}
              aria-describedby={headingId}
            >
              Choose this
            </Button>
          )}
        </div>
      )}
    </article>
  );
}
