import { Flame, Thermometer, Wheat } from 'lucide-react';
import type { ReactNode } from 'react';
import { SRM_TO_EBC } from '@shared/brewmath';
import { fermentableKindLabels, type Recipe } from '@shared/schemas/recipes';
import { Figure } from '@/components/ui/figure';
import { Notice } from '@/components/ui/notice';
import { Card } from '@/components/ui/page';
import { formatColour, useColourScale } from '@/lib/colour';
import { useUnits } from '@/lib/units';
import { TargetsPanel } from './recipe-form';

/** The targets, large: what the brew day is judged against. */
const bigFigure = { className: 'rounded-xl bg-white p-4 shadow-sm ring-1 ring-cellar-100', size: '3xl', tone: 'strong' } as const;

/**
 * A recipe laid out for brew day: the targets first and large, then mash, boil (with the hop
 * schedule in the order the additions happen) and fermentation, each with its numbers in the
 * brewer's units. Prints cleanly on one or two pages.
 */
export function RecipeView({ recipe }: { recipe: Recipe }) {
  const units = useUnits();
  const scale = useColourScale();
  const hopsInOrder = [...recipe.hops].sort((a, b) => b.minutes - a.minutes);
  const totalKg = recipe.fermentables.reduce((n, f) => n + f.amountKg, 0);
  return (
    <div className="space-y-4">
      <section aria-label="Targets">
        <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
          <Figure {...bigFigure} label="Target OG" value={units.format('gravity', recipe.targetOg)} />
          <Figure {...bigFigure} label="Target FG" value={units.format('gravity', recipe.targetFg)} />
          <Figure {...bigFigure} label="ABV (simple)" value={`${recipe.abvPercent.toFixed(1)}\u00a0%`} />
          <Figure {...bigFigure} label="Into the fermenter" value={units.format('volume', recipe.batchVolumeL)} />
          {recipe.targetIbu !== null && <Figure {...bigFigure} label="Target bitterness" value={`${Math.round(recipe.targetIbu)}\u00a0IBU`} />}
          {recipe.targetColourSrm !== null && <Figure {...bigFigure} label="Target colour" value={formatColour(recipe.targetColourSrm, scale)} />}
          {recipe.souringTargetPh !== null && <Figure {...bigFigure} label="Sour to pH" value={recipe.souringTargetPh.toFixed(2)} />}
        </dl>
      </section>

      <Card>
        <h2 className="text-lg font-semibold text-cellar-900">Estimate from the fermentables</h2>
        <div className="mt-3">
          <TargetsPanel values={recipe} units={units} estimateOnly />
        </div>
      </Card>

      <div className="grid gap-4 lg:grid-cols-2">
        <Card>
          <StageTitle icon={<Wheat aria-hidden className="size-5" />}>Fermentables</StageTitle>
          <ul className="mt-3 divide-y divide-cellar-100">
            {recipe.fermentables.map((f, i) => (
              <li key={i} className="flex items-baseline justify-between gap-3 py-2">
                <span className="min-w-0">
                  <span className="font-semibold">{f.name}</span> <span className="text-sm text-ink-faint">{fermentableKindLabels[f.kind]}</span>
                  {f.colourLovibond !== null && (
                    <span className="ml-2 text-sm text-ink-faint">{scale === 'ebc' ? `${Math.round(f.colourLovibond * SRM_TO_EBC)}\u00a0EBC` : `${f.colourLovibond}\u00a0°L`}</span>
                  )}
                </span>
                <span className="shrink-0 text-right tabular-nums">
                  <span className="font-semibold">{units.format('mass', f.amountKg)}</span>
                  <span className="ml-2 text-sm text-ink-faint" title="Share of all fermentables by weight">
                    {Math.round((f.amountKg / totalKg) * 100)}&nbsp;%<span className="sr-only"> of the fermentables by weight</span>
                  </span>
                </span>
              </li>
            ))}
          </ul>
          <p className="mt-2 text-sm text-ink-soft">Brewhouse efficiency {Math.round(recipe.efficiency * 1000) / 10}&nbsp;%</p>
        </Card>

        <Card>
          <StageTitle icon={<Thermometer aria-hidden className="size-5" />}>Mash</StageTitle>
          {recipe.mashSteps.length === 0 ? (
            <p className="mt-3 text-ink-soft">No mash steps.</p>
          ) : (
            <ol className="mt-3 space-y-2">
              {recipe.mashSteps.map((m, i) => (
                <li key={i} className="flex items-baseline justify-between gap-3 rounded-lg bg-cellar-50 px-3 py-2">
                  <span className="text-sm text-ink-soft">Step {i + 1}</span>
                  <span className="text-xl font-bold tabular-nums text-cellar-900">{units.format('temperature', m.tempC)}</span>
                  <span className="tabular-nums">{m.minutes}&nbsp;min</span>
                </li>
              ))}
            </ol>
          )}
          <p className="mt-3">
            Target mash pH <strong className="text-xl tabular-nums">{recipe.mashPhTarget.toFixed(2)}</strong>
            <span className="ml-2 text-sm text-ink-faint">read on a cooled sample</span>
          </p>
        </Card>

        <Card>
          <StageTitle icon={<Flame aria-hidden className="size-5" />}>Boil</StageTitle>
          <dl className="mt-3 grid grid-cols-2 gap-3">
            <Figure label="Pre-boil (hot)" value={units.format('volume', recipe.preBoilVolumeL)} />
            <Figure label="Post-boil (hot)" value={units.format('volume', recipe.postBoilVolumeL)} />
            <Figure label="Boil length" value={`${recipe.boilMinutes}\u00a0min`} />
            <Figure label="Boil-off" value={units.format('rate', recipe.boilOffLPerHour)} />
          </dl>
          <h3 className="mt-4 text-sm font-semibold uppercase tracking-wide text-ink-faint">Hop schedule</h3>
          {hopsInOrder.length === 0 ? (
            <p className="mt-1 text-ink-soft">No hops.</p>
          ) : (
            <ol className="mt-1 divide-y divide-cellar-100">
              {hopsInOrder.map((h, i) => (
                <li key={i} className="flex items-baseline justify-between gap-3 py-2">
                  <span className="w-24 shrink-0 font-bold tabular-nums text-cellar-900">{h.minutes === 0 ? 'Flame-out' : `${h.minutes}\u00a0min left`}</span>
                  <span className="min-w-0 flex-1">
                    {h.name} <span className="text-sm text-ink-faint">{h.alphaAcidPercent}&nbsp;% AA</span>
                  </span>
                  <span className="shrink-0 font-semibold tabular-nums">{units.format('smallMass', h.amountG)}</span>
                </li>
              ))}
            </ol>
          )}
          <Notice tone="caution" className="mt-3">
            Hot wort and steam burn: keep the kettle stable, lids and hoses clear, and children and pets away.
          </Notice>
        </Card>

        <Card>
          <StageTitle icon={<Thermometer aria-hidden className="size-5" />}>Fermentation</StageTitle>
          <p className="mt-3 text-2xl font-bold tabular-nums text-cellar-900">
            {units.format('temperature', recipe.fermentationTempMinC)} to {units.format('temperature', recipe.fermentationTempMaxC)}
          </p>
          <p className="mt-2">
            {recipe.yeast.name || 'No yeast named.'}
            {recipe.yeast.amount && <span className="text-ink-soft"> · {recipe.yeast.amount}</span>}
          </p>
          <p className="mt-2 text-sm text-ink-soft">Package only when two gravity readings a few days apart agree: bottles filled early can burst.</p>
        </Card>
      </div>

      {recipe.notes && (
        <Card>
          <h2 className="text-lg font-semibold text-cellar-900">Notes</h2>
          <p className="mt-2 whitespace-pre-line">{recipe.notes}</p>
        </Card>
      )}
    </div>
  );
}

function StageTitle({ icon, children }: { icon: ReactNode; children: ReactNode }) {
  return (
    <h2 className="flex items-center gap-2 text-lg font-semibold text-cellar-900">
      <span className="text-malt-600">{icon}</span>
      {children}
    </h2>
  );
}
