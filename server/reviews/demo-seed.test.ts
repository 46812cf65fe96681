import { beforeAll, describe, expect, it } from 'vitest';
import { cToF } from '@shared/brewmath';
import { demoPassword, demoPeople, seedDemo } from '../db/seed';
import '../demo-seeds';
import { createHarness, type TestHarness } from '../../tests/support/api';
import { DEMO_BREW_NAME } from '../brews/demo-seed';
import { DEMO_WAITING_BREW_NAME } from './demo-seed';

let h: TestHarness;
beforeAll(async () => {
  h = await createHarness();
  // Another test file of this run may have seeded already; either way the demo data is there.
  await seedDemo(h.ctx.db);
});

describe('the demo review', () => {
  it('has Ivo’s comments on Priya’s shared brew day: one on the late-boil decision, one on the day', async () => {
    const ivo = await h.signIn(demoPeople.mentor.email, demoPassword);
    const shared = (await ivo.get('/api/brews?scope=shared').expect(200)).body.items;
    const priyas = shared.find((b: { name: string }) => b.name === DEMO_BREW_NAME);
    const review = (await ivo.get(`/api/brews/${priyas.id}/review`).expect(200)).body;
    const [decision] = review.brew.decisions;
    expect(review.comments.map((c: { author: { name: string }; target: { kind: string; id: number | null } }) => [c.author.name, c.target.kind, c.target.id])).toEqual([
      ['Ivo Brannock', 'decision', decision.id],
      ['Ivo Brannock', 'brew', null],
    ]);
    // The warm spell of the demo fermentation (21.3 °C as read on day 2, less the probe's 0.4 °C
    // ice-bath error, against the recipe's 18–20 °C) is what the day comment talks about.
    const warm = review.deviations.filter((d: { code: string }) => d.code === 'ferment-temp-high');
    expect(warm).toHaveLength(1);
    const peak = review.fermentation.readings.find((r: { raw: { tempC?: number } }) => r.raw.tempC === 21.3);
    expect(peak.corrected).toBeCloseTo(21.3 - 0.4, 9);
    expect(warm[0]).toMatchObject({ expected: 20, actual: peak.corrected, fermentationReadingId: peak.id });
    expect(review.comments[1].body).toMatch(/above 20 °C on day 2/);

    // Priya reads the same comments on her own log.
    const priya = await h.signIn(demoPeople.brewer.email, demoPassword);
    const hers = (await priya.get(`/api/brews/${priyas.id}/comments`).expect(200)).body;
    expect(hers.map((c: { id: number }) => c.id)).toEqual(review.comments.map((c: { id: number }) => c.id));
  });

  it('leaves Jonah’s shared porter waiting in Ivo’s queue, with its deviations counted', async () => {
    const ivo = await h.signIn(demoPeople.mentor.email, demoPassword);
    const queue = (await ivo.get('/api/reviews/queue').expect(200)).body.items;
    const names = queue.map((q: { brewName: string }) => q.brewName);
    expect(names).toContain(DEMO_WAITING_BREW_NAME);
    expect(names).not.toContain(DEMO_BREW_NAME);
    const porter = queue.find((q: { brewName: string }) => q.brewName === DEMO_WAITING_BREW_NAME);
    expect(porter).toMatchObject({ brewerName: 'Jonah Weatherby', recipeName: 'Back Porch Robust Porter', clubs: [{ name: 'Hollow Oak Homebrew Circle' }] });

    const review = (await ivo.get(`/api/brews/${porter.brewId}/review`).expect(200)).body;
    const codes = review.deviations.map((d: { code: string }) => d.code);
    // 149 °F mash against a 154 °F step (recipe), 72 °F pitch against a 68 °F top (recipe),
    // 1.056 read at 68 °F on a 60 °F hydrometer: the OG lands about 5 points short of 1.062.
    expect(codes).toEqual(expect.arrayContaining(['mash-temp', 'og-low', 'pitch-too-warm', 'instrument-uncalibrated']));
    const pitch = review.deviations.find((d: { code: string }) => d.code === 'pitch-too-warm');
    expect(cToF(pitch.actual)).toBeCloseTo(72, 9);
    expect(cToF(pitch.expected)).toBeCloseTo(68, 9);
    expect(porter.deviationCount).toBe(review.deviations.length);
    expect(review.comments).toEqual([]);
  });
});
