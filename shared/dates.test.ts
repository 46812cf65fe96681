import { afterEach, describe, expect, it } from 'vitest';
import { DAY_MS, HOUR_MS, localDateTimeInput, localDay, utcDay } from './dates';

// Node re-reads process.env.TZ when it is assigned, so one process can stand in for a brewer
// anywhere (IANA time zone database: Auckland is UTC+13 in January, Denver UTC-7).
const originalTz = process.env.TZ;
afterEach(() => {
  if (originalTz === undefined) delete process.env.TZ;
  else process.env.TZ = originalTz;
});

describe('which day the brewer sees (decision 0016)', () => {
  it('is the day on their own clock, not the UTC day', () => {
    const instant = new Date('2026-01-01T12:30:00Z');
    process.env.TZ = 'Pacific/Auckland';
    expect(localDay(instant)).toBe('2026-01-02');
    expect(localDateTimeInput(instant)).toBe('2026-01-02T01:30');
    process.env.TZ = 'America/Denver';
    expect(localDay(new Date('2026-01-02T03:00:00Z'))).toBe('2026-01-01');
  });

  it('while the server stamps the UTC day where the client sent none', () => {
    process.env.TZ = 'Pacific/Auckland';
    expect(utcDay(new Date('2026-01-01T12:30:00Z'))).toBe('2026-01-01');
  });

  it('counts spans in exact hours: 24 h a day, 3,600,000 ms an hour (SI second)', () => {
    expect(HOUR_MS).toBe(60 * 60 * 1000);
    expect(DAY_MS).toBe(86_400_000);
  });
});
