import type { ReactNode } from 'react';
import {
  COLOUR_AGREEMENT_SRM,
  estimateRecipeColour,
  estimateRecipeIbu,
  estimateRecipeOg,
  IBU_AGREEMENT,
  OG_AGREEMENT_SG,
  recipeBuGu,
  targetAbv,
} from '@shared/recipes/estimates';
import { Figure } from '@/components/ui/figure';
import { Notice } from '@/components/ui/notice';
import { formatColour, useColourScale } from '@/lib/colour';
import type { Units } from '@/lib/units';

function formatGap(units: Units, estimate: number, target: number) {
  if (units.gravityUnit === 'plato') {
    const gap = Math.abs(units.toDisplay('gravity', estimate) - units.toDisplay('gravity', target));
    return `${gap.toFixed(1)}\u00a0°P`;
  }
  const points = Math.round(Math.abs(estimate - target) * 1000);
  return points === 1 ? '1 point' : `${points} points`;
}

/** What the targets panel reads: the form's values or a saved recipe. */
interface PanelValues {
  fermentables: readonly { amountKg?: unknown; kind?: unknown; potentialPointsLPerKg?: unknown; colourLovibond?: unknown }[];
  hops?: readonly { amountG?: unknown; minutes?: unknown; alphaAcidPercent?: unknown }[];
  efficiency: unknown;
  batchVolumeL: unknown;
  preBoilVolumeL?: unknown;
  postBoilVolumeL?: unknown;
  targetOg: unknown;
  targetFg: unknown;
  targetIbu?: unknown;
  targetColourSrm?: unknown;
}

/** Estimated OG from the fermentables beside the target, and what the target pair means. */
export function TargetsPanel({
  values,
  units,
  estimateOnly = false,
}: {
  values: PanelValues;
  units: Units;
  /** Where the targets are already shown large (the read view): only what the fermentables give. */
  estimateOnly?: boolean;
}) {
  const estimate = estimateRecipeOg(values);
  const abv = targetAbv(values.targetOg, values.targetFg);
  const target = typeof values.targetOg === 'number' ? values.targetOg : null;
  let agreement: ReactNode = null;
  if (estimate.og !== null && target !== null && target > 1) {
    const gap = estimate.og - target;
    agreement =
      Math.abs(gap) <= OG_AGREEMENT_SG + 1e-9 ? (
        <Notice tone="success">Agrees with the target OG, within {formatGap(units, target + OG_AGREEMENT_SG, target)}.</Notice>
      ) : gap < 0 ? (
        <Notice tone="caution">
          The fermentables give {formatGap(units, estimate.og, target)} less than the target. Add fermentables, raise the efficiency or lower the target.
        </Notice>
      ) : (
        <Notice tone="caution">
          The fermentables give {formatGap(units, estimate.og, target)} more than the target. Use less, or raise the target.
        </Notice>
      );
  }
  return (
    <div className="space-y-3" aria-live="polite">
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <Tile label="Estimated OG" value={estimate.og === null ? '—' : units.format('gravity', estimate.og)} />
        {!estimateOnly && <Tile label="Target OG" value={target === null ? '—' : units.format('gravity', target)} />}
        {!estimateOnly && <Tile label="ABV (simple)" value={abv ? `${abv.abvPercent.toFixed(1)}\u00a0%` : '—'} />}
        <Tile label="Apparent attenuation" value={abv ? `${Math.round(abv.apparentAttenuation * 100)}\u00a0%` : '—'} />
      </dl>
      {estimate.og === null && <p className="text-sm text-ink-faint">{estimate.reason}</p>}
      {agreement}
      <BitternessColourFigures values={values} estimateOnly={estimateOnly} />
    </div>
  );
}

/** Estimated bitterness (Tinseth) and colour (Morey) beside their targets, and BU:GU. */
function BitternessColourFigures({ values, estimateOnly }: { values: PanelValues; estimateOnly: boolean }) {
  const scale = useColourScale();
  const ibu = estimateRecipeIbu(values);
  const colour = estimateRecipeColour(values);
  const targetIbu = typeof values.targetIbu === 'number' ? values.targetIbu : null;
  const targetSrm = typeof values.targetColourSrm === 'number' ? values.targetColourSrm : null;
  const targetOg = typeof values.targetOg === 'number' ? values.targetOg : null;
  const buGu = recipeBuGu(targetIbu ?? ibu.ibu, targetOg);
  const notes: ReactNode[] = [];
  if (ibu.ibu !== null && targetIbu !== null && Math.abs(ibu.ibu - targetIbu) > IBU_AGREEMENT) {
    notes.push(`The hops give ${Math.round(ibu.ibu)} IBU, ${ibu.ibu < targetIbu ? 'below' : 'above'} the ${Math.round(targetIbu)} IBU target.`);
  }
  if (colour.srm !== null && targetSrm !== null && Math.abs(colour.srm - targetSrm) > COLOUR_AGREEMENT_SRM) {
    notes.push(`The grist gives ${formatColour(colour.srm, scale)}, ${colour.srm < targetSrm ? 'paler' : 'darker'} than the ${formatColour(targetSrm, scale)} target.`);
  }
  return (
    <>
      <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <Tile label="Estimated bitterness" value={ibu.ibu === null ? '—' : `${Math.round(ibu.ibu)}\u00a0IBU`} />
        {!estimateOnly && <Tile label="Target bitterness" value={targetIbu === null ? '—' : `${Math.round(targetIbu)}\u00a0IBU`} />}
        <Tile label="BU:GU" value={buGu === null ? '—' : buGu.toFixed(2)} />
        <Tile label="Estimated colour" value={formatColour(colour.srm, scale)} />
        {!estimateOnly && <Tile label="Target colour" value={formatColour(targetSrm, scale)} />}
      </dl>
      <p className="text-sm text-ink-faint">
        Bitterness by Tinseth&apos;s formula, colour by Morey&apos;s equation; BU:GU is bitterness over the OG&apos;s gravity points (about 0.5 is balanced, common practice).
        {ibu.reason ? ` ${ibu.reason}` : ''}
        {colour.reason ? ` ${colour.reason}` : ''}
        {ibu.assumptions.length > 0 ? ` ${ibu.assumptions.join(' ')}` : ''}
        {colour.beyondFit ? ' Beyond about 50 SRM Morey\'s equation is a rough figure only.' : ''}
      </p>
      {notes.length > 0 && <Notice tone="caution">{notes.map((n, i) => <p key={i}>{n}</p>)}</Notice>}
    </>
  );
}

/** A tinted tile: the panel's figures, readable at a glance. */
function Tile({ label, value }: { label: string; value: string }) {
  return <Figure className="rounded-lg bg-cellar-50 p-3" size="2xl" tone="strong" label={label} value={value} />;
}
