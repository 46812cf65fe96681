import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EXTRACT_KINDS } from '../brewmath';
import { boilCheckInputSchema } from './boil-check';
import { validateBoilCheck } from './boil-check-rules';

/**
 * The browser validates the public check without zod; the API validates with the zod schema built
 * from the same rules. Whatever a form can send, both must give the same verdict: the same
 * messages under the same fields, or the same parsed input. (A consistency check between two
 * readers of one rule table; the limits themselves are checked against their sources in
 * shared/brewmath.)
 */
const number = fc.oneof(
  fc.constantFrom('', Number.NaN, Number.POSITIVE_INFINITY, 0, -1, 1, 1.05, 1.2, 1.3, 0.97, 4, 10, 11.4, 23, 26, 40, 41, 100, 101, 367, 2001),
  fc.double({ min: -10, max: 3000, noNaN: true }),
);
const optionalNumber = fc.oneof(fc.constant(undefined), number);

const raw = fc.record({
  reading: fc.oneof(
    fc.record({ kind: fc.constant('refractometer'), brix: number, wcf: optionalNumber }),
    fc.record({ kind: fc.constant('hydrometer'), sg: number, sampleTempC: number, calibrationTempC: optionalNumber }),
  ),
  volumeL: number,
  minutesLeft: number,
  boilOffLPerHour: number,
  targetSg: number,
  targetVolumeL: optionalNumber,
  targetFg: optionalNumber,
  extractsOnHand: fc.subarray([...EXTRACT_KINDS]),
  potentials: fc.oneof(
    fc.constant(undefined),
    fc.record({ dme: optionalNumber, lme: optionalNumber, sucrose: optionalNumber, dextrose: optionalNumber }, { requiredKeys: [] }),
  ),
  kettleCapacityL: optionalNumber,
  coolingShrinkage: optionalNumber,
  kettleLossL: optionalNumber,
});

/** A plausible brew, so the generator also reaches the check itself (valid fields, possibly an impossible combination). */
const plausible = fc.record({
  reading: fc.record({ kind: fc.constant('refractometer'), brix: fc.double({ min: 2, max: 30, noNaN: true }), wcf: fc.constant(1.04) }),
  volumeL: fc.double({ min: 1, max: 60, noNaN: true }),
  minutesLeft: fc.integer({ min: 0, max: 90 }),
  boilOffLPerHour: fc.double({ min: 0, max: 30, noNaN: true }),
  targetSg: fc.double({ min: 1.001, max: 1.12, noNaN: true }),
  targetVolumeL: fc.oneof(fc.constant(undefined), fc.double({ min: 1, max: 60, noNaN: true })),
  targetFg: fc.oneof(fc.constant(undefined), fc.double({ min: 0.99, max: 1.1, noNaN: true })),
  extractsOnHand: fc.subarray([...EXTRACT_KINDS]),
  kettleCapacityL: fc.oneof(fc.constant(undefined), fc.double({ min: 1, max: 80, noNaN: true })),
});

function bothVerdicts(input: Record<string, unknown>) {
  const zod = boilCheckInputSchema.safeParse(input);
  const plain = validateBoilCheck(input);
  return {
    zod: zod.success ? { ok: true, input: JSON.stringify(zod.data) } : { ok: false, issues: zod.error.issues.map((i) => ({ path: i.path.map(String), message: i.message })) },
    plain: plain.ok ? { ok: true, input: JSON.stringify(plain.input) } : { ok: false, issues: plain.issues },
  };
}

describe('validateBoilCheck agrees with boilCheckInputSchema', () => {
  it('on any form-shaped input, including empty, non-numeric and out-of-range fields', () => {
    fc.assert(
      fc.property(raw, (input) => {
        const { zod, plain } = bothVerdicts(input);
        expect(plain).toEqual(zod);
      }),
      { numRuns: 1000 },
    );
  });

  it('on plausible brews, where the check itself runs and may refuse a combination', () => {
    let refused = 0;
    let accepted = 0;
    fc.assert(
      fc.property(plausible, (input) => {
        const { zod, plain } = bothVerdicts(input);
        expect(plain).toEqual(zod);
        if (zod.ok) accepted++;
        else refused++;
      }),
      { numRuns: 1000 },
    );
    // Both branches were exercised, or the comparison above proves little.
    expect(accepted).toBeGreaterThan(0);
    expect(refused).toBeGreaterThan(0);
  });

  it('names an empty required field the way the form lists it', () => {
    const plain = validateBoilCheck({ reading: { kind: 'refractometer', brix: '' }, volumeL: 26, minutesLeft: 10, boilOffLPerHour: 4, targetSg: 1.05 });
    expect(plain).toEqual({ ok: false, issues: [{ path: ['reading', 'brix'], message: 'Enter the Brix reading.' }] });
  });
});
