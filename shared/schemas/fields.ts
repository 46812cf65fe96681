/** Building blocks for schemas whose messages a brewer reads (the form and the API share them). */
import { z } from 'zod';

export { showF, showGal } from './unit-text';

/** A number, with "Enter …" when it is missing and "… must be a number" when it is not one. */
export function num(what: string, label: string) {
  return z.number({
    error: (issue) => (issue.input === undefined || issue.input === null || issue.input === '' ? `Enter ${what}.` : `${label} must be a number.`),
  });
}

/**
 * The number builder for a brewer's field: "Enter …" when missing, "… must be a number" when not
 * one, and `rangeMessage` (text, or built from the value) when `inRange` refuses it.
 */
export function checkedNumber(what: string, label: string, inRange: (v: number) => boolean, rangeMessage: string | ((v: number) => string)) {
  return num(what, label)
    .refine((v) => Number.isFinite(v), { error: `${label} must be a number.`, abort: true })
    .refine(inRange, { error: typeof rangeMessage === 'string' ? rangeMessage : (issue) => rangeMessage(issue.input as number), abort: true });
}

/** A finite number within [min, max], with one message for either side. */
export function ranged(what: string, label: string, min: number, max: number, message: string) {
  return checkedNumber(what, label, (v) => v >= min && v <= max, message);
}
