/** Limits as the other unit system reads them, for messages that name both (no zod here: the public check's bundle uses it). */
import { cToF, LITRES_PER_US_GALLON } from '../brewmath';

/** A °C limit as US brewers read it, for messages that name both units. */
export const showF = (tempC: number) => `${Number(cToF(tempC).toFixed(1))} °F`;
/** A litre limit as US brewers read it. */
export const showGal = (litres: number) => `${Number((litres / LITRES_PER_US_GALLON).toFixed(2))} gal`;
