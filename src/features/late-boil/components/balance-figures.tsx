/** Bitterness and colour at the end of the boil, for a brew day that knows its recipe (brew day only: its own chunk). */
import { predictBoilBalance, type BalanceRecipe, type BoilCheckOutcome, type OptionBalance } from '@shared/boil-check';
import { SRM_TO_EBC } from '@shared/brewmath';
import type { BoilCheckParsed } from '@shared/schemas/boil-check';
import { Figure } from '@/components/ui/figure';
import { formatColour, useColourScale } from '@/lib/colour';

/** The figures with no action, under the summary. */
export function AsIsBalance({ input, outcome, recipe }: { input: BoilCheckParsed; outcome: BoilCheckOutcome; recipe: BalanceRecipe }) {
  const balance = predictBoilBalance(input, outcome, recipe);
  return balance && <BalanceFigures balance={balance.asIs} testId="projected" />;
}

function signed(value: number, digits: number) {
  const text = Math.abs(value).toFixed(digits);
  return Number(text) === 0 ? 'on target' : `${value > 0 ? '+' : '\u2212'}${text} vs target`;
}

/** Bitterness and colour at the end, with the gap to the recipe's targets; a number only, no colour swatch. */
export function BalanceFigures({ balance, testId }: { balance: OptionBalance; testId: string }) {
  const scale = useColourScale();
  const colourGap =
    balance.colourDeviationSrm === null ? null : scale === 'ebc' ? signed(balance.colourDeviationSrm * SRM_TO_EBC, 0).replace('vs', 'EBC vs') : signed(balance.colourDeviationSrm, 1).replace('vs', 'SRM vs');
  return (
    <dl className="mt-2 grid grid-cols-2 gap-2 text-sm">
      <Figure
        className="min-w-0"
        labelStyle="plain"
        size="lg"
        label="Bitterness"
        value={balance.ibu === null ? 'no hops' : `${balance.ibu.toFixed(1)}\u00a0IBU`}
        hint={balance.ibuDeviation !== null && signed(balance.ibuDeviation, 1).replace('vs', 'IBU vs')}
        valueTestId={`ibu-${testId}`}
      />
      <Figure
        className="min-w-0"
        labelStyle="plain"
        size="lg"
        label="Colour"
        value={balance.colourSrm === null ? 'malt colours unknown' : formatColour(balance.colourSrm, scale)}
        hint={colourGap}
        valueTestId={`colour-${testId}`}
      />
    </dl>
  );
}
