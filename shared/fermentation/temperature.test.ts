import { describe, expect, it } from 'vitest';
import { temperatureSummary } from './temperature';

const start = Date.parse('2026-03-01T00:00:00Z');
const at = (hours: number) => new Date(start + hours * 3_600_000);

// Plain arithmetic on invented readings: ranges are the smallest and largest corrected reading.
describe('fermenter temperature summary', () => {
  const readings = [
    { id: 1, takenAt: at(0), tempC: 18 },
    { id: 2, takenAt: at(12), tempC: 19.5 },
    { id: 3, takenAt: at(30), tempC: 23 },
    { id: 4, takenAt: at(40), tempC: 19 },
    { id: 5, takenAt: at(47), tempC: 16.5 },
  ];

  it('gives the range over the last 24 hours and over the whole fermentation', () => {
    const s = temperatureSummary(readings, { minC: 17, maxC: 21 }, at(48));
    expect(s.last24h).toMatchObject({ minC: 16.5, maxC: 23, count: 3 });
    expect(s.overall).toMatchObject({ minC: 16.5, maxC: 23, count: 5 });
    expect(s.latest).toEqual({ takenAt: at(47).toISOString(), tempC: 16.5 });
  });

  it("flags each reading outside the recipe's range, and by how much", () => {
    const s = temperatureSummary(readings, { minC: 17, maxC: 21 }, at(48));
    expect(s.excursions.map((e) => [e.readingId, e.direction, e.byC])).toEqual([
      [3, 'warm', 2],
      [5, 'cold', 0.5],
    ]);
  });

  it('finds the largest swing inside any 24 hours and flags it above 3 °C (common practice, no source)', () => {
    const s = temperatureSummary(readings, null, at(48));
    // Readings 3 to 5 lie within 17 hours: 23 − 16.5 = 6.5 °C.
    expect(s.largestSwing24hC).toBeCloseTo(6.5, 9);
    expect(s.swingFlagged).toBe(true);
    const calm = temperatureSummary(readings.slice(0, 2), null, at(48));
    expect(calm.largestSwing24hC).toBeCloseTo(1.5, 9);
    expect(calm.swingFlagged).toBe(false);
  });

  it('says nothing about the last 24 hours when no reading fell in them', () => {
    const s = temperatureSummary(readings, null, at(200));
    expect(s.last24h).toBeNull();
    expect(s.overall?.count).toBe(5);
    expect(temperatureSummary([], null, at(0))).toMatchObject({ overall: null, latest: null, largestSwing24hC: null });
  });
});
