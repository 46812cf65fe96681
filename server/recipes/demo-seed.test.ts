import { describe, expect, it } from 'vitest';
import { recipeInputSchema } from '@shared/schemas/recipes';
import { estimateRecipeOg, OG_AGREEMENT_SG, targetAbv } from '@shared/recipes/estimates';
import { DEMO_SHARED_RECIPE_NAME, jonahRecipes, priyaRecipes } from './demo-seed';

const all = [...priyaRecipes, ...jonahRecipes];

describe('demo recipes', () => {
  it.each(all.map((r) => [r.name, r] as const))('%s is valid, and its fermentables agree with its target OG', (_name, recipe) => {
    const data = recipeInputSchema.parse(recipe);
    const estimate = estimateRecipeOg(data);
    expect(estimate.og).not.toBeNull();
    expect(Math.abs(estimate.og! - data.targetOg)).toBeLessThanOrEqual(OG_AGREEMENT_SG);
  });

  it('covers different strengths: from a session bitter to a barleywine', () => {
    const abvs = all.map((r) => targetAbv(r.targetOg, r.targetFg)!.abvPercent);
    expect(Math.min(...abvs)).toBeLessThan(4);
    expect(Math.max(...abvs)).toBeGreaterThan(9);
    expect(new Set(all.map((r) => r.style)).size).toBe(all.length);
  });

  it('keeps the recipe the brew-day test relies on: 23 L, OG 1.050, FG 1.011', () => {
    expect(priyaRecipes.find((r) => r.name === DEMO_SHARED_RECIPE_NAME)).toMatchObject({ batchVolumeL: 23, targetOg: 1.05, targetFg: 1.011 });
  });
});
