/**
 * Building blocks for schemas whose messages a brewer reads (the form and the API share them).
 * Every number field is built here, from one builder: `num` words a missing value and a value that
 * is not a number; `checkedNumber` adds a range check on top of it, `ranged` a min–max range and
 * `boundedNumber` the rule-shaped fields of a recipe. Limits may also chain on `num` (`.min`, `.max`).
 */
import { z } from 'zod';

export { showF, showGal } from './unit-text';

const isBlank = (input: unknown) => input === undefined || input === null || input === '';

/**
 * The number builder. `num('the batch volume', 'Batch volume')` says "Enter the batch volume." when
 * the value is missing and "Batch volume must be a number." when it is not one;
 * `num({ notNumber: 'Brix: enter a number.' })` says one thing for both (the instrument forms).
 */
export function num(what: string, label: string): z.ZodNumber;
export function num(words: { notNumber: string }): z.ZodNumber;
export function num(whatOrWords: string | { notNumber: string }, label?: string): z.ZodNumber {
  if (typeof whatOrWords !== 'string') return z.number({ error: whatOrWords.notNumber });
  return z.number({ error: (issue) => (isBlank(issue.input) ? `Enter ${whatOrWords}.` : `${label} must be a number.`) });
}

/**
 * A brewer's number with a range check: `rangeMessage` (text, or built from the value) when
 * `inRange` refuses it. The range issue stops the field's other checks (`abort`) unless told
 * otherwise: a form that shows every problem at once passes `{ abort: false }`, so the object's
 * cross-field checks still run.
 */
export function checkedNumber(
  what: string,
  label: string,
  inRange: (v: number) => boolean,
  rangeMessage: string | ((v: number) => string),
  { abort = true }: { abort?: boolean } = {},
) {
  return num(what, label)
    .refine((v) => Number.isFinite(v), { error: `${label} must be a number.`, abort: true })
    .refine(inRange, { error: typeof rangeMessage === 'string' ? rangeMessage : (issue) => rangeMessage(issue.input as number), abort });
}

/** A finite number within [min, max], with one message for either side. */
export function ranged(what: string, label: string, min: number, max: number, message: string) {
  return checkedNumber(what, label, (v) => v >= min && v <= max, message);
}

/** A number field described by its limits, with the message for each way out of them. */
export interface NumberRule {
  /** Lower-case noun phrase: "the batch volume". */
  what: string;
  /** Sentence-start label: "Batch volume". */
  label: string;
  min: number;
  /** When true, the minimum itself is refused ("must be more than 0"). */
  exclusiveMin?: boolean;
  max: number;
  /** Said when the value is out of range. */
  rangeMessage: string;
  integer?: boolean;
  /** A temperature, not an amount: below the minimum is out of range, not "negative". */
  rangeOnly?: boolean;
}

function numberProblem(rule: NumberRule, v: number): string | null {
  if (rule.min === 0 && !rule.rangeOnly) {
    if (v < 0) return `${rule.label} cannot be negative.`;
    if (rule.exclusiveMin && v === 0) return `${rule.label} must be more than 0.`;
  } else if (rule.exclusiveMin ? v <= rule.min : v < rule.min) {
    return rule.rangeMessage;
  }
  if (v > rule.max) return rule.rangeMessage;
  if (rule.integer && !Number.isInteger(v)) return `${rule.label} must be a whole number.`;
  return null;
}

/**
 * A number field from its rule: "cannot be negative", "must be more than 0", out of range or not
 * whole. One message per field and no abort, so a form shows every problem at once.
 */
export function boundedNumber(rule: NumberRule) {
  return checkedNumber(rule.what, rule.label, (v) => numberProblem(rule, v) === null, (v) => numberProblem(rule, v) ?? rule.rangeMessage, { abort: false });
}

/** The page size of a list paged by key: `what` names one item, e.g. "brew day". */
export const pageSizeSchema = (what: string, max: number, fallback: number) =>
  z.coerce
    .number({ error: 'Page size must be a number.' })
    .int({ error: 'Page size must be a whole number.' })
    .min(1, { error: `Ask for at least 1 ${what} a page.` })
    .max(max, { error: `Ask for at most ${max} ${what}s a page.` })
    .default(fallback);
