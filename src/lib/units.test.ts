import convert from 'convert-units';
import { describe, expect, it } from 'vitest';
import { formatQuantity, fromDisplay, toDisplay, type UnitPrefs } from './units';

const us: UnitPrefs = { unitSystem: 'us', gravityUnit: 'sg' };
const plato: UnitPrefs = { unitSystem: 'metric', gravityUnit: 'plato' };

describe('the unit edge', () => {
  it('shows litres as US gallons, checked against the convert-units package', () => {
    expect(toDisplay('volume', us, 23)).toBeCloseTo(convert(23).from('l').to('gal'), 6);
    expect(fromDisplay('volume', us, 5)).toBeCloseTo(convert(5).from('gal').to('l'), 6);
  });

  // The imperial gallon is 4.54609 L exactly (UK Weights and Measures Act 1985); convert-units has
  // no imperial gallon, so the check is worked by hand: 23 / 4.54609 = 5.0593.
  it('shows litres as imperial gallons when the brewer chooses them, and only volumes', () => {
    const imperial: UnitPrefs = { unitSystem: 'us', gravityUnit: 'sg', gallonUnit: 'imperial' };
    expect(toDisplay('volume', imperial, 23)).toBeCloseTo(5.0593, 4);
    expect(fromDisplay('volume', imperial, 5)).toBeCloseTo(22.73045, 6);
    expect(formatQuantity('volume', imperial, 23)).toBe('5.06\u00a0imp gal');
    expect(formatQuantity('rate', imperial, 4.54609)).toBe('1.00\u00a0imp gal/h');
    expect(toDisplay('mass', imperial, 4.5)).toBeCloseTo(toDisplay('mass', us, 4.5), 12);
    // Metric users are unaffected by the gallon choice.
    expect(formatQuantity('volume', { unitSystem: 'metric', gravityUnit: 'sg', gallonUnit: 'imperial' }, 23)).toBe('23.0\u00a0L');
  });

  // convert-units rounds its pound factor (2.20462), so agreement is to about 1e-5.
  it('shows kilograms as pounds and grams as ounces, against convert-units', () => {
    expect(toDisplay('mass', us, 4.5)).toBeCloseTo(convert(4.5).from('kg').to('lb'), 4);
    expect(toDisplay('smallMass', us, 28)).toBeCloseTo(convert(28).from('g').to('oz'), 4);
  });

  it('shows °C as °F, and a temperature difference without the 32° shift, against convert-units', () => {
    expect(toDisplay('temperature', us, 66)).toBeCloseTo(convert(66).from('C').to('F'), 9);
    expect(toDisplay('temperatureDelta', us, 1)).toBeCloseTo(1.8, 9);
  });

  it('round-trips every kind', () => {
    for (const kind of ['volume', 'mass', 'smallMass', 'temperature', 'temperatureDelta', 'rate'] as const) {
      expect(fromDisplay(kind, us, toDisplay(kind, us, 12.34))).toBeCloseTo(12.34, 9);
    }
    expect(fromDisplay('gravity', plato, toDisplay('gravity', plato, 1.05))).toBeCloseTo(1.05, 6);
  });

  it('formats for reading with the unit', () => {
    expect(formatQuantity('volume', us, 18.92706)).toBe('5.00\u00a0gal');
    expect(formatQuantity('gravity', { unitSystem: 'metric', gravityUnit: 'sg' }, 1.0484)).toBe('1.048');
    // 12 °P ≈ SG 1.0484 (ASBC extract table, recalled from memory).
    expect(formatQuantity('gravity', plato, 1.0484)).toBe('12.0\u00a0°P');
    expect(formatQuantity('volume', us, null)).toBe('—');
  });
});
