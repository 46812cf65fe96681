import { describe, expect, it } from 'vitest';
import { diffRecipes } from './recipe-history';

describe('diffRecipes: what changed between two saved versions', () => {
  const before = {
    name: 'Pale',
    targetIbu: 30,
    yeast: { name: 'Ale yeast', amount: '1 sachet' },
    hops: [
      { name: 'A', amountG: 20, minutes: 60, alphaAcidPercent: 8 },
      { name: 'B', amountG: 30, minutes: 5, alphaAcidPercent: 5 },
    ],
    fermentables: [],
    mashSteps: [],
  };

  it('lists changed fields, changed cells of a row, and rows added or removed', () => {
    const after = { ...before, targetIbu: 35, yeast: { name: 'Ale yeast', amount: '2 sachets' }, hops: [{ ...before.hops[0], amountG: 25 }], mashSteps: [{ tempC: 66, minutes: 60 }] };
    expect(diffRecipes(before, after)).toEqual([
      { path: 'targetIbu', kind: 'changed', before: 30, after: 35 },
      { path: 'yeast.amount', kind: 'changed', before: '1 sachet', after: '2 sachets' },
      { path: 'hops.0.amountG', kind: 'changed', before: 20, after: 25 },
      { path: 'hops.1', kind: 'removed', before: before.hops[1], after: null },
      { path: 'mashSteps.0', kind: 'added', before: null, after: { tempC: 66, minutes: 60 } },
    ]);
  });

  it('finds nothing between a version and itself, and treats a field missing in an older version as empty', () => {
    expect(diffRecipes(before, structuredClone(before))).toEqual([]);
    const { targetIbu: _dropped, ...older } = before;
    expect(diffRecipes(older, { ...before, targetIbu: null as unknown as number })).toEqual([]);
  });
});
