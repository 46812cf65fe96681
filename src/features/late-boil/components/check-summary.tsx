/**
 * The late-boil answer's first part, in the public check's own chunk: where the wort is heading,
 * or what is still needed. The option cards (check-results.tsx) and the bitterness and colour
 * figures (balance-figures.tsx) load on their own, when there is something to show.
 */
import { lazy, memo, Suspense, type ReactNode } from 'react';
import type { BalanceRecipe, BoilCheckOutcome, FeasibleOption } from '@shared/boil-check';
import { gapInWords } from '@shared/boil-check/words';
import { formatAbv, type ExtractKind } from '@shared/brewmath';
import type { BoilCheckParsed } from '@shared/schemas/boil-check';
import { Figure } from '@/components/ui/figure';
import type { Units } from '@/lib/units';

const AsIsBalance = lazy(() => import('./balance-figures').then((m) => ({ default: m.AsIsBalance })));

export type ChoiceState = { key: string; state: 'saving' | 'saved' | 'failed'; message?: string };

export function optionKey(option: { kind: string; extract?: ExtractKind }) {
  return option.kind === 'extract' ? `extract-${option.extract}` : option.kind;
}

/** Feasible options, the likely action first; "Leave it" leads only when the wort is on target. */
export function orderedOptions(result: BoilCheckOutcome['result']): FeasibleOption[] {
  const feasible = result.options.filter((o): o is FeasibleOption => o.feasible);
  const asIs = feasible.filter((o) => o.kind === 'as-is');
  const corrections = feasible.filter((o) => o.kind !== 'as-is');
  return result.status === 'on-target' ? [...asIs, ...corrections] : [...corrections, ...asIs];
}


interface SummaryProps {
  input: BoilCheckParsed;
  outcome: BoilCheckOutcome;
  units: Units;
  recipe?: BalanceRecipe;
}

/**
 * Where the wort is heading with no action: the figures that follow each keystroke at once.
 * Memoised, as is CheckOptions: each renders only when its own check changed.
 */
export const CheckSummary = memo(function CheckSummary({ input, outcome, units, recipe }: SummaryProps) {
  const { result, currentSg, reading } = outcome;
  const tone = result.status === 'on-target' ? 'text-ok-700' : 'text-malt-700';

  return (
    <section aria-label="Where the wort is heading" className="rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100">
      <p className="text-sm font-semibold text-ink-soft">With no action, at the end of the boil</p>
      <p role="status" className={`text-3xl font-bold ${tone}`} data-testid="gap">
        {gapInWords(result, units.gravityUnit)}
      </p>
      <dl className="mt-3 grid grid-cols-2 gap-x-4 gap-y-2 text-sm sm:grid-cols-3">
        <Stat label="Gravity now" value={units.format('gravity', currentSg)} note={reading.kind === 'refractometer' ? `from ${reading.brix} °Bx` : 'corrected for temperature, for wort, assuming it expands like water'} />
        <Stat label="OG at the end" value={units.format('gravity', result.projected.endSg)} note={`target ${units.format('gravity', result.targetSg)}`} testId="projected-og" />
        <Stat label="Hot at flame-out" value={units.format('volume', result.projected.endVolumeL)} testId="projected-hot" />
        <Stat
          label="Into the fermenter"
          value={units.format('volume', result.projected.fermenterVolumeL)}
          note={input.targetVolumeL !== undefined ? `recipe ${units.format('volume', input.targetVolumeL)}` : undefined}
          testId="projected-fermenter"
        />
        <Stat label="ABV" value={formatAbv(result.projected.abvPercent)} />
      </dl>
      <p className="mt-2 text-xs text-ink-faint" data-testid="kettle-losses">
        {result.kettleLossL > 0
          ? `Into the fermenter is after ${units.format('volume', result.kettleLossL)} of trub and dead space left in the kettle (${units.format('volume', result.projected.cooledVolumeL)} cooled in the kettle).`
          : 'No kettle losses entered: every cooled litre is counted as reaching the fermenter.'}
        {result.maxBoilVolumeL !== null && ` Additions keep about 10 % of the kettle free to boil: at most ${units.format('volume', result.maxBoilVolumeL)} in it.`}
      </p>
      {recipe && (
        <Suspense fallback={null}>
          <AsIsBalance input={input} outcome={outcome} recipe={recipe} />
        </Suspense>
      )}
      {result.fgAssumed && (
        <p className="mt-2 text-xs text-ink-faint">ABV assumes the usual 75 % apparent attenuation (FG {units.format('gravity', result.fgSg)}); enter the recipe's FG for a closer figure.</p>
      )}
    </section>
  );
});

/** One figure of the summary, the same size throughout. */
function Stat({ label, value, note, testId }: { label: string; value: string; note?: string; testId?: string }) {
  return <Figure className="min-w-0" labelStyle="plain" size="xl" label={label} value={value} hint={note} valueTestId={testId} />;
}

export function NotReady({ missing, problems }: { missing: string[]; problems: { path: string; message: string }[] }): ReactNode {
  return (
    <section aria-label="Your options" className="rounded-xl border-2 border-dashed border-cellar-100 p-4 text-ink-soft">
      {problems.length > 0 ? (
        <>
          <p className="font-semibold text-alert-700">Fix this to see your options:</p>
          <ul className="mt-1 list-disc space-y-1 pl-5 text-sm" data-testid="problems">
            {problems.map((p) => (
              <li key={p.path + p.message}>{p.message}</li>
            ))}
          </ul>
        </>
      ) : (
        <p>
          Your options appear here as you type. Still needed: <span className="font-semibold">{missing.join(', ')}</span>.
        </p>
      )}
    </section>
  );
}
