import { describe, expect, it } from 'vitest';
import { formatAbv, formatFraction, formatGrams, formatGravity, formatKg, formatMinutes, formatTemperature, formatVolume } from './format';

const nb = '\u00a0';

describe('display formatting', () => {
  it('gravity as SG or °Plato', () => {
    expect(formatGravity(1.05)).toBe('1.050');
    expect(formatGravity(1.0484, 'plato')).toBe(`12.0${nb}°P`);
  });

  it('metric and US volumes, masses and temperatures', () => {
    expect(formatVolume(23)).toBe(`23.0${nb}L`);
    expect(formatVolume(18.927, 'us')).toBe(`5.00${nb}gal`);
    expect(formatKg(0.5)).toBe(`0.50${nb}kg`);
    expect(formatKg(0.45359237, 'us')).toBe(`1.00${nb}lb`);
    expect(formatGrams(113.4, 'us')).toBe(`4.00${nb}oz`);
    expect(formatGrams(113.4)).toBe(`113${nb}g`);
    expect(formatTemperature(20, 'us')).toBe(`68.0${nb}°F`);
    expect(formatTemperature(-0.01)).toBe(`0.0${nb}°C`);
  });

  it('ABV, fractions and minutes', () => {
    expect(formatAbv(5.25)).toBe(`5.3${nb}%`);
    expect(formatFraction(0.754)).toBe(`75${nb}%`);
    expect(formatMinutes(34.6)).toBe(`35${nb}min`);
  });
});
