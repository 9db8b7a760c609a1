import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { checkReferences, relativeDistance } from '../../src/checks/reference.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { Dimension, Quantity } from '../../src/types.js';

const packs = await loadPacks([]);

function q(sentence: string, text: string, dimension: Dimension, low: number, high: number, statedUnit = ''): Quantity {
  const start = sentence.indexOf(text);
  return { text, start, end: start + text.length, value: (low + high) / 2, low, high, dimension, unit: '', statedUnit };
}

function check(sentence: string, quantity: Quantity) {
  const { bindings } = bindQuantities(sentence, [quantity], packs);
  return checkReferences(sentence, [quantity], bindings, packs);
}

describe('checkReferences', () => {
  it('flags a wrong record span with the range, the correction and the sources', () => {
    // Jouzel et al. 2007 (doi 10.1126/science.1141038); Lüthi et al. 2008 (doi 10.1038/nature06949): 790,000-810,000 years.
    const s = 'The EPICA Dome C record spans 400,000 years.';
    const { flags, verdicts } = check(s, q(s, '400,000 years', 'duration', 395e3, 405e3));
    expect(verdicts).toEqual(['conflicts']);
    expect(flags).toEqual([{
      ruleId: 'value.edc-record-span',
      level: 'error',
      start: 30,
      end: 43,
      reason: 'The draft gives 400,000 years for the current time span of the EPICA Dome C climate (deuterium) and CO2 records; the sources give 790,000–810,000 years.',
      claimed: { text: '400,000 years', low: 395e3, high: 405e3, unit: 'yr' },
      reference: { id: 'edc-record-span', measures: packs.reference('edc-record-span')!.measures, text: '790,000–810,000 years', low: 790e3, high: 810e3, unit: 'yr' },
      correction: 'about 800,000 years',
      sources: packs.reference('edc-record-span')!.sources,
    }]);
    expect(flags[0]?.sources.map((s) => s.doi)).toEqual(['10.1126/science.1141038', '10.1038/nature06949']);
  });

  it('shows the range and the correction in the draft’s own unit', () => {
    const s = 'The EPICA Dome C record spans 400 kyr.';
    const [flag] = check(s, q(s, '400 kyr', 'duration', 395e3, 405e3, 'kyr')).flags;
    expect(flag).toMatchObject({ claimed: { low: 395, high: 405, unit: 'kyr' }, reference: { text: '790–810 kyr', low: 790, high: 810, unit: 'kyr' }, correction: 'about 800 kyr' });
  });

  it('converts temperature differences to °F for a draft that writes °F', () => {
    // 1 K difference = 1.8 °F difference (NIST SP 811 B.8). West Antarctica 9-11 K (Buizert et al. 2021).
    const s = 'West Antarctica was 5 °F colder then.';
    const [flag] = check(s, q(s, '5 °F', 'temperature-change', 4.5 / 1.8, 5.5 / 1.8, 'degF')).flags;
    expect(flag?.reference).toMatchObject({ text: '16.2–19.8 °F', unit: 'degF-change' });
    expect(flag?.correction).toBe('about 18 °F');
  });

  it('says "as of" for dated values, and that a claim about today meets a dated value', () => {
    const s = 'Today CO2 stands at 350 ppm.';
    const [flag] = check(s, q(s, '350 ppm', 'concentration', 349.5, 350.5, 'ppm')).flags;
    expect(flag?.reason).toBe('The draft gives 350 ppm for the atmospheric CO2 today (envelope of the 2023 global annual mean through the May 2025 Mauna Loa monthly peak); the sources give 419–430.5 ppm as of 2025-05-31. The draft speaks of today; the reference value is dated 2025-05-31 and changes with time.');
    expect(flag?.reference?.asOf).toBe('2025-05-31');
  });

  it('passes an agreeing claim with no flag', () => {
    const s = 'The EPICA Dome C record spans about 800,000 years.';
    expect(check(s, q(s, 'about 800,000 years', 'duration', 780e3, 820e3))).toEqual({ flags: [], verdicts: ['agrees'] });
  });

  it.each([
    // [claimed low, high] against vostok-record-span 400,000-423,000 (Petit et al. 1999); default levels warning 0, error 0.1
    [424_000, 426_000, 'warning'],
    [480_000, 490_000, 'error'],
  ])('grows the level with the distance: %d-%d is a %s', (low, high, level) => {
    const s = 'The Vostok record spans that many years.';
    expect(check(s, q(s, 'that many years', 'duration', low, high)).flags[0]?.level).toBe(level);
  });

  it('measures distance relative to the size of the range', () => {
    expect(relativeDistance(380, 390, { low: 400, high: 423 })).toBeCloseTo(10 / 423, 12);
    expect(relativeDistance(410, 415, { low: 400, high: 423 })).toBe(0);
  });
});

describe('corrections', () => {
  it('use the pack wording when the draft writes °C for a temperature change (1 °C difference = 1 K, SI Brochure)', () => {
    const s = 'Global temperature at the Last Glacial Maximum was 15 °C lower.';
    const [flag] = check(s, q(s, '15 °C', 'temperature-change', 14.5, 15.5, 'degC')).flags;
    expect(flag?.correction).toBe('about 6 °C (estimates run from about 4 to 7 °C)');
    expect(flag?.reference?.text).toBe('3.6–7 °C');
  });
});
