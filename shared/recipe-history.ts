/**
 * What changed between two saved versions of a recipe, in words a recipe author reads: one entry
 * per changed target or ingredient row. Shared so the history page and the API say the same.
 * Values are SI as stored; the page shows them in the reader's units.
 */
import type { RecipeData } from './schemas/recipes';

export interface RecipeChange {
  /** Dotted path as in the recipe, e.g. "targetOg", "hops.1.amountG", "fermentables.2" (a row added or removed). */
  path: string;
  kind: 'changed' | 'added' | 'removed';
  before: unknown;
  after: unknown;
}

function same(a: unknown, b: unknown): boolean {
  return JSON.stringify(a ?? null) === JSON.stringify(b ?? null);
}

function diffRow(prefix: string, a: Record<string, unknown>, b: Record<string, unknown>, out: RecipeChange[]) {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  for (const key of keys) {
    if (!same(a[key], b[key])) out.push({ path: `${prefix}.${key}`, kind: 'changed', before: a[key] ?? null, after: b[key] ?? null });
  }
}

/** Changes from `before` to `after`, scalar fields first, then each list row by position. */
export function diffRecipes(before: Partial<RecipeData>, after: Partial<RecipeData>): RecipeChange[] {
  const out: RecipeChange[] = [];
  const lists = ['fermentables', 'hops', 'mashSteps'] as const;
  const keys = new Set([...Object.keys(before), ...Object.keys(after)]);
  for (const key of keys) {
    if ((lists as readonly string[]).includes(key)) continue;
    const a = (before as Record<string, unknown>)[key];
    const b = (after as Record<string, unknown>)[key];
    if (key === 'yeast') {
      diffRow('yeast', (a ?? {}) as Record<string, unknown>, (b ?? {}) as Record<string, unknown>, out);
    } else if (!same(a, b)) {
      out.push({ path: key, kind: 'changed', before: a ?? null, after: b ?? null });
    }
  }
  for (const list of lists) {
    const a = (before[list] ?? []) as unknown as Record<string, unknown>[];
    const b = (after[list] ?? []) as unknown as Record<string, unknown>[];
    for (let i = 0; i < Math.max(a.length, b.length); i++) {
      if (i >= a.length) out.push({ path: `${list}.${i}`, kind: 'added', before: null, after: b[i] });
      else if (i >= b.length) out.push({ path: `${list}.${i}`, kind: 'removed', before: a[i], after: null });
      else diffRow(`${list}.${i}`, a[i], b[i], out);
    }
  }
  return out;
}
