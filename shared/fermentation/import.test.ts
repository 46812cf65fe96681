import { describe, expect, it } from 'vitest';
import { dedupeMaterial, emptyMapping, parseNumber, parseTakenAt, readRow, suggestMapping } from './import';

const ctx = { pitchedAt: new Date('2026-03-01T18:00:00Z'), now: new Date('2026-03-20T12:00:00Z') };
const ours = suggestMapping(['taken_at', 'kind', 'value', 'unit', 'sample_temp_c', 'original_brix', 'instrument', 'note']).mapping;

describe('reading our CSV columns', () => {
  it('reads ISO 8601 times (ISO 8601-1:2019 extended format), with and without an offset', () => {
    expect(parseTakenAt('2026-03-14T18:30:00Z')?.toISOString()).toBe('2026-03-14T18:30:00.000Z');
    expect(parseTakenAt('2026-03-14 18:30+01:00')?.toISOString()).toBe('2026-03-14T17:30:00.000Z');
    expect(parseTakenAt('2026-03-14T18:30:15.250-0500')?.toISOString()).toBe('2026-03-14T23:30:15.250Z');
    expect(parseTakenAt('2026-03-14')?.toISOString()).toBe('2026-03-14T12:00:00.000Z');
    // 2026 is not a leap year (Gregorian rule): 29 February does not exist.
    expect(parseTakenAt('2026-02-29T10:00Z')).toBeNull();
    expect(parseTakenAt('14/03/2026 18:30')).toBeNull();
    expect(parseTakenAt('yesterday')).toBeNull();
  });

  it('reads a decimal point or a lone decimal comma, and nothing else', () => {
    expect(parseNumber('1.012')).toBe(1.012);
    expect(parseNumber('1,012')).toBe(1.012);
    expect(parseNumber(' -2.5 ')).toBe(-2.5);
    expect(parseNumber('1.012 SG')).toBeNull();
    expect(parseNumber('')).toBeNull();
    expect(parseNumber('1,000,5')).toBeNull();
  });

  it('suggests a mapping from familiar header names, and our order for a file without a header', () => {
    const m = suggestMapping(['Date', 'Reading', 'Units', 'Comment']);
    expect(m.hasHeader).toBe(true);
    expect(m.mapping.columns).toMatchObject({ taken_at: 0, value: 1, unit: 2, note: 3, kind: null });
    const bare = suggestMapping(['2026-03-14T18:30:00Z', 'gravity', '1.012', 'sg']);
    expect(bare.hasHeader).toBe(false);
    expect(bare.mapping.columns).toMatchObject({ taken_at: 0, kind: 1, value: 2, unit: 3, sample_temp_c: null });
  });

  it('turns each unit into the instrument it comes from, in SG and °C', () => {
    const row = (cells: string[]) => readRow(2, cells, ours, ctx);
    const sg = row(['2026-03-14T08:00Z', 'gravity', '1.012', 'sg', '20', '', 'Trial jar', '']);
    expect(sg).toMatchObject({ ok: true, reading: { method: 'hydrometer', raw: { sg: 1.012, sampleTempC: 20 }, instrumentName: 'Trial jar' } });
    // 12 °P is SG 1.0484 on the ASBC extract table (recalled from memory); the cubic fit agrees to 1e-4.
    const plato = row(['2026-03-14T08:00Z', '', '12', 'plato', '', '', '', '']);
    expect(plato.ok && plato.reading.raw.method === 'hydrometer' && plato.reading.raw.sg).toBeCloseTo(1.0484, 4);
    // 68 °F = 20 °C (the Fahrenheit scale's definition: °C = (°F − 32) × 5/9).
    const f = row(['2026-03-14T08:00Z', 'temperature', '68', 'F', '', '', '', '']);
    expect(f.ok && f.reading.raw.method === 'thermometer' && f.reading.raw.tempC).toBeCloseTo(20, 9);
    expect(row(['2026-03-14T08:00Z', 'gravity', '6.2', 'brix', '', '12.5', '', ''])).toMatchObject({
      ok: true,
      reading: { method: 'refractometer', raw: { brix: 6.2, originalBrix: 12.5 } },
    });
  });

  it.each([
    [['2026-02-28T08:00Z', 'gravity', '1.050', 'sg'], /before the yeast was pitched/],
    [['2026-03-25T08:00Z', 'gravity', '1.010', 'sg'], /in the future/],
    [['2026-03-14T08:00Z', 'gravity', '19', 'c'], /a gravity reading cannot be in "c"/],
    [['2026-03-14T08:00Z', 'gravity', '1.5', 'sg'], /outside 0.980 to 1.200/],
    [['2026-03-14T08:00Z', 'temperature', '140', 'f'], /outside what a fermenter reads/],
    [['2026-03-14T08:00Z', 'gravity', '1.012', 'oe'], /unknown unit "oe"/],
    [['2026-03-14T08:00Z', 'pressure', '1.012', 'sg'], /unknown kind "pressure"/],
    [['2026-03-14T08:00Z', 'gravity', '', 'sg'], /the value is missing/],
    [['', 'gravity', '1.012', 'sg'], /date and time are missing/],
  ])('refuses %j with the row number and a reason', (cells, message) => {
    const result = readRow(7, cells, ours, ctx);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.error.row).toBe(7);
      expect(result.error.message).toMatch(/^Row 7: /);
      expect(result.error.message).toMatch(message);
    }
  });

  it('uses the default unit and kind when the file has no such column', () => {
    const m = emptyMapping();
    m.columns.taken_at = 0;
    m.columns.value = 1;
    m.defaults.unit = 'sg';
    expect(readRow(2, ['2026-03-14T08:00Z', '1.011'], m, ctx)).toMatchObject({ ok: true, reading: { kind: 'gravity', method: 'hydrometer' } });
  });

  it('names a reading by brew, time, kind and the value rounded as the export writes it', () => {
    const at = new Date('2026-03-14T08:00:00Z');
    expect(dedupeMaterial(3, at, 'hydrometer', 1.012)).toBe(dedupeMaterial(3, at, 'hydrometer', 1.0120000001));
    expect(dedupeMaterial(3, at, 'hydrometer', 1.012)).not.toBe(dedupeMaterial(3, at, 'hydrometer', 1.013));
    expect(dedupeMaterial(3, at, 'hydrometer', 1.012)).not.toBe(dedupeMaterial(4, at, 'hydrometer', 1.012));
    expect(dedupeMaterial(3, at, 'thermometer', 19)).not.toBe(dedupeMaterial(3, new Date(at.getTime() + 1), 'thermometer', 19));
  });
});
