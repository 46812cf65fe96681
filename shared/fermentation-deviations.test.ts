import { describe, expect, it } from 'vitest';
import { describeFermentationDeviation, findFermentationDeviations, type FermentationDeviationReading } from './fermentation-deviations';
import { temperatureSummary } from './fermentation/temperature';
import type { InstrumentSnapshot } from './schemas/instruments';
import type { BrewDeviation } from './schemas/brews';

// An invented ale fermented at 18–20 °C, pitched at midnight UTC on 1 March.
const range = { minC: 18, maxC: 20 };
const pitchedAt = '2025-03-01T00:00:00.000Z';
const at = (days: number) => new Date(Date.parse(pitchedAt) + days * 86_400_000).toISOString();

const checkedThermometer: InstrumentSnapshot = { instrumentId: 7, name: 'Probe thermometer', calibrationId: 3, kind: 'thermometer', offsetC: 0.4, checkedOn: '2025-02-20' };
const stripThermometer: InstrumentSnapshot = { instrumentId: 8, name: 'Stick-on strip', calibrationId: null, kind: 'thermometer', offsetC: 0, checkedOn: null };
const hydrometer: InstrumentSnapshot = { instrumentId: 9, name: 'Trial-jar hydrometer', calibrationId: null, kind: 'hydrometer', calibrationTempC: 20 };

/** Temperatures twice a day from day 0.25, as the fermentation log stores them. */
function temps(values: number[], instrument: InstrumentSnapshot = checkedThermometer) {
  return values.map((tempC, i) => ({ id: 100 + i, kind: 'temperature' as const, instrument, takenAt: at(0.25 + i * 0.5), tempC }));
}

/** The same path the review takes: the fermentation log's temperature summary feeds the deviations. */
function deviationsOf(readings: ReturnType<typeof temps>, extra: Partial<Parameters<typeof findFermentationDeviations>[0]> = {}) {
  const summary = temperatureSummary(
    readings.map((r) => ({ id: r.id, takenAt: r.takenAt, tempC: r.tempC })),
    range,
    at(30),
  );
  return findFermentationDeviations({ range, readings, excursions: summary.excursions, packaging: null, pitchedAt, ...extra });
}

describe('findFermentationDeviations: temperature outside the recipe range (range edges: the recipe’s own numbers)', () => {
  it('finds nothing when every reading is inside the range, edges included', () => {
    expect(deviationsOf(temps([18, 19.2, 20, 19.5]))).toEqual([]);
  });

  it('calls a run of warm readings one spell, reported at its warmest reading', () => {
    // 20.4, 21.3 and 20.6 are consecutive and above 20 °C; 19.8 ends the spell.
    const readings = temps([19.2, 19.6, 20.4, 21.3, 20.6, 19.8, 19.4]);
    const [spell, ...rest] = deviationsOf(readings);
    expect(rest).toEqual([]);
    expect(spell).toMatchObject({
      code: 'ferment-temp-high',
      stage: 'fermentation',
      fermentationReadingId: 103,
      expected: 20,
      actual: 21.3,
      quantity: 'temperature',
      span: { count: 3, from: at(1.25), to: at(2.25) },
    });
    expect(spell.message).toBe("Fermenter up to 21.3 °C, above the recipe's 18–20 °C range (3 readings, day 1.3 to day 2.3).");
  });

  it('keeps separate spells apart, warm and cold, in time order', () => {
    const codes = deviationsOf(temps([21, 19, 17.5, 17.9, 19, 20.5])).map((d) => [d.code, d.actual, d.span?.count]);
    expect(codes).toEqual([
      ['ferment-temp-high', 21, 1],
      ['ferment-temp-low', 17.5, 2],
      ['ferment-temp-high', 20.5, 1],
    ]);
  });

  it('says nothing about temperature when the recipe has no range', () => {
    const readings = temps([25]);
    expect(findFermentationDeviations({ range: null, readings, excursions: [], packaging: null, pitchedAt })).toEqual([]);
  });
});

describe('findFermentationDeviations: packaging', () => {
  it('calls out packaging before the final gravity was proven stable, with the brewer’s reason (rule: PRODUCT.md, common practice, no source)', () => {
    const [d] = findFermentationDeviations({
      range,
      readings: [],
      excursions: [],
      pitchedAt,
      packaging: { packagedAt: at(9), verdictState: 'moving', verdictReason: 'Dropped 0.002 in 2 days.', overrideReason: 'Leaving on holiday tomorrow.' },
    });
    expect(d).toMatchObject({ code: 'packaged-before-stable', fermentationReadingId: null });
    expect(d.message).toBe('Packaged day 9.0 while the final gravity was still moving, before two equal readings proved it stable. Reason given: Leaving on holiday tomorrow.');
  });

  it('says nothing when it was packaged after a stable verdict', () => {
    const packaging = { packagedAt: at(16), verdictState: 'stable' as const, verdictReason: 'Two equal readings.', overrideReason: '' };
    expect(findFermentationDeviations({ range, readings: [], excursions: [], pitchedAt, packaging })).toEqual([]);
  });
});

describe('findFermentationDeviations: instruments', () => {
  it('names an unchecked thermometer once, and not a checked one', () => {
    const readings: FermentationDeviationReading[] = [...temps([19, 19.1], stripThermometer), ...temps([19], checkedThermometer).map((r) => ({ ...r, id: 200 }))];
    const found = findFermentationDeviations({ range, readings, excursions: [], packaging: null, pitchedAt });
    expect(found.map((d) => [d.code, d.instrumentName, d.fermentationReadingId])).toEqual([['instrument-uncalibrated', 'Stick-on strip', 100]]);
  });

  it('does not repeat an instrument the brew day already called out', () => {
    const brewDay: BrewDeviation[] = [
      {
        code: 'instrument-uncalibrated',
        stage: 'mash',
        readingId: 1,
        decisionId: null,
        expected: null,
        actual: null,
        quantity: null,
        instrumentName: 'Stick-on strip',
        message: 'Stick-on strip has never been checked in an ice bath or boiling water.',
      },
    ];
    const readings = temps([19], stripThermometer);
    expect(findFermentationDeviations({ range, readings, excursions: [], packaging: null, pitchedAt, brewDay })).toEqual([]);
  });

  it('does not flag a hydrometer, which keeps no calibration to go stale', () => {
    const readings: FermentationDeviationReading[] = [{ id: 1, kind: 'gravity', instrument: hydrometer, takenAt: at(12) }];
    expect(findFermentationDeviations({ range, readings, excursions: [], packaging: null, pitchedAt })).toEqual([]);
  });
});

describe('describeFermentationDeviation', () => {
  it('words a warm spell in °F for a US reader: 21.3 °C = 70.3 °F and 20 °C = 68.0 °F (F = C × 1.8 + 32, NIST SP 811 appendix B)', () => {
    const [d] = deviationsOf(temps([19.2, 19.6, 20.4, 21.3, 20.6, 19.8]));
    expect(describeFermentationDeviation(d, { unitSystem: 'us' }, pitchedAt)).toBe(
      "Fermenter up to 70.3\u00a0°F, 2.3\u00a0°F above the top of the recipe's range, 68.0\u00a0°F (3 readings, day 1.3 to day 2.3).",
    );
    expect(describeFermentationDeviation(d, { unitSystem: 'metric' }, pitchedAt)).toBe(
      "Fermenter up to 21.3\u00a0°C, 1.3\u00a0°C above the top of the recipe's range, 20.0\u00a0°C (3 readings, day 1.3 to day 2.3).",
    );
  });
});
