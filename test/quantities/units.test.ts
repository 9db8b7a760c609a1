import { describe, expect, it } from 'vitest';
import { convert, formatQuantity, parseQuantities, UNIT_TABLE } from '../../src/quantities/index.js';

describe('conversion factors', () => {
  // NIST SP 811 (Thompson & Taylor 2008), Appendix B.8: foot = 0.3048 m exactly;
  // mile (international) = 1609.344 m exactly; degree Fahrenheit (interval) = 5/9 K.
  it.each([
    [1, 'ft', 'm', undefined, 0.3048],
    [1, 'mi', 'm', undefined, 1609.344],
    [1, 'km', 'm', undefined, 1000],
    [1, 'degF', 'K', 'temperature-change', 5 / 9],
    [5, 'degC', 'degF', 'temperature-change', 9],
  ] as const)('%s %s = %s %s (NIST SP 811, B.8)', (value, from, to, dim, want) => {
    expect(convert(value, from, to, dim)).toBeCloseTo(want, 12);
  });

  // NIST SP 811, B.9: t/°C = (t/°F − 32)/1.8 and t/°C = T/K − 273.15.
  it.each([
    [5, 'degC', 'degF', 41],
    [-40, 'degC', 'degF', -40],
    [212, 'degF', 'degC', 100],
    [273.15, 'K', 'degC', 0],
  ] as const)('temperature reading %s %s = %s %s (NIST SP 811, B.9)', (value, from, to, want) => {
    expect(convert(value, from, to, 'temperature')).toBeCloseTo(want, 9);
  });

  it('reads °C ↔ °F without a dimension as a temperature reading, as NIST writes the formula', () => {
    expect(convert(5, 'degC', 'degF')).toBeCloseTo(41, 9);
  });

  // SI: percent = 10^-2 and ppm = 10^-6 (NIST SP 811, 7.10.2 and 7.10.3), so 1% = 10,000 ppm.
  it('converts a percentage of the air to ppm at 1% = 10,000 ppm (NIST SP 811, 7.10)', () => {
    expect(convert(0.04, '%', 'ppm', 'concentration')).toBeCloseTo(400, 9);
    expect(convert(1, 'ppb', 'ppm')).toBeCloseTo(0.001, 12);
  });

  it('throws on units of different dimensions', () => {
    expect(() => convert(1, 'ft', 'ppm')).toThrow(/no dimension has both/);
  });

  it('has every canonical unit in the table', () => {
    for (const id of ['yr', 'yr BP', 'ppm', 'K', 'degC', 'm', 'ppm/yr', 'K/yr', 'count', 'ratio', '%', 'number']) {
      expect(UNIT_TABLE.some((u) => u.id === id && u.factor === 1 && u.offset === 0)).toBe(true);
    }
  });
});

describe('dating conventions', () => {
  // BP: years before AD 1950 (Stuiver & Polach 1977, Radiocarbon 19(3), 355-363).
  it('puts AD 1950 at 0 BP and 2019 at −69 BP', () => {
    expect(convert(1950, 'CE', 'yr BP', 'age')).toBe(0);
    expect(parseQuantities('By 2019 it had passed 410 ppm.')[0]?.value).toBe(-69);
  });
  // b2k: years before AD 2000 (Walker et al. 2009, J. Quaternary Sci. 24, 3-17), so BP = b2k − 50.
  it('puts the Holocene base at 11,700 b2k = 11,650 BP', () => {
    expect(convert(11700, 'yr b2k', 'yr BP', 'age')).toBe(11650);
    expect(convert(11.7, 'ka b2k', 'yr BP', 'age')).toBeCloseTo(11650, 9);
  });
  // No year 0 in the BCE/CE calendar (common practice): 1 BCE is followed by 1 CE.
  it('has no year 0: 1 BCE is 1950 BP and 1 CE is 1949 BP', () => {
    expect(convert(1, 'BCE', 'yr BP', 'age')).toBe(1950);
    expect(convert(1, 'CE', 'yr BP', 'age')).toBe(1949);
    expect(convert(10000, 'BCE', 'yr BP', 'age')).toBe(11949);
  });
});

describe('formatQuantity writes a canonical value in the draft unit', () => {
  it.each([
    [800000, 'yr', 'kyr', '800 kyr'],
    [5, 'K', 'degF', '9 °F'],
    [200, 'yr BP', 'CE', '1750'],
    [11949, 'yr BP', 'BCE', '10,000 BCE'],
    [2000, 'yr BP', 'CE', '51 BCE'],
    [11949, 'yr BP', 'yr ago', '11,900 years ago'],
    [400, 'ppm', 'ppm', '400 ppm'],
    [0.04, '%', '%', '0.04%'],
    [3261.36, 'm', 'ft', '10,700 ft'],
    [0.01, 'K/yr', 'degC/century', '1 °C per century'],
    [2.5, 'ratio', 'ratio', '2.5 times'],
  ] as const)('%s %s as %s → %s', (value, unit, stated, want) => {
    expect(formatQuantity(value, unit, stated)).toBe(want);
  });
});

describe('a "k" after the digits', () => {
  // Informal posts write thousands as "k" (common practice); a capital K after digits is kelvin unless
  // a word for years follows (SI: K is the kelvin, NIST SP 811, 4.2).
  it.each([
    ['about 50k years ago', 50000, 'age'],
    ['about 800k years', 800000, 'duration'],
    ['some 20K years ago', 20000, 'age'],
    ['a 5K rise', 5, 'temperature-change'],
  ] as const)('%s', (text, value, dimension) => {
    const q = parseQuantities(text)[0];
    expect(q?.value).toBe(value);
    expect(q?.dimension).toBe(dimension);
  });
});
