/**
 * Beer and malt colour in the signed-in brewer's scale (SRM or EBC). Stored as SRM (beer) and °L
 * (malt); EBC = 1.97 × SRM, the factor in shared/brewmath. A number only: no colour swatches.
 */
import { SRM_TO_EBC, type ColourScale } from '@shared/brewmath';
import { useMe } from './auth';

export function useColourScale(): ColourScale {
  const { data: me } = useMe();
  return me?.colourScale ?? 'srm';
}

/** "4.5 SRM" or "9 EBC"; '—' when there is no number. */
export function formatColour(srm: number | null | undefined, scale: ColourScale): string {
  if (srm === null || srm === undefined || !Number.isFinite(srm)) return '—';
  return scale === 'ebc' ? `${Math.round(srm * SRM_TO_EBC)}\u00a0EBC` : `${srm.toFixed(1)}\u00a0SRM`;
}

/** Props for a NumberField holding SRM (or °L), shown in the brewer's scale. */
export function colourFieldProps(scale: ColourScale, malt = false) {
  return scale === 'ebc'
    ? { unit: 'EBC', toShown: (v: number) => v * SRM_TO_EBC, shownToStored: (v: number) => v / SRM_TO_EBC, decimals: 0 }
    : { unit: malt ? '°L' : 'SRM', decimals: 1 };
}
