import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkArithmetic } from '../../src/checks/arithmetic.js';
import { checkUnits } from '../../src/checks/units.js';
import { parseQuantities } from '../../src/quantities/index.js';

// Correct arithmetic and correct conversions, written the way drafts write them (hedges on the
// inputs, a rounded result), must never be flagged. Each sentence's result is worked here, outside
// the code under test; conversion factors from NIST SP 811 (°F interval = 5/9 K; 1% = 10^4 ppm).
const check = (s: string) => [...checkArithmetic(s, parseQuantities(s)), ...checkUnits(s, parseQuantities(s))];
const HEDGE = fc.constantFrom('', 'about ', 'roughly ', 'some ');
const comma = (n: number): string => String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ',');

describe('property: the draft\'s own right arithmetic is never flagged', () => {
  it('holds for a change between two CO2 levels', () => {
    fc.assert(fc.property(fc.integer({ min: 150, max: 450 }), fc.integer({ min: 150, max: 450 }), HEDGE, HEDGE, HEDGE, (a, b, ha, hb, hc) => {
      fc.pre(a !== b);
      const s = `The Halden chart has CO2 going from ${ha}${a} to ${hb}${b} ppm, a ${b > a ? 'rise' : 'drop'} of ${hc}${Math.abs(b - a)} ppm.`;
      expect(check(s)).toEqual([]);
    }));
  });

  it('holds for a percentage change rounded to a whole percent', () => {
    fc.assert(fc.property(fc.integer({ min: 150, max: 450 }), fc.integer({ min: 150, max: 450 }), HEDGE, (a, b, h) => {
      fc.pre(b > a);
      const s = `CO2 climbed from ${a} to ${b} ppm, an increase of ${h}${Math.round(((b - a) / a) * 100)} percent.`;
      expect(check(s)).toEqual([]);
    }));
  });

  it('holds for a span between a start and an end date, rounded to the hundred', () => {
    fc.assert(fc.property(fc.integer({ min: 60, max: 250 }), fc.integer({ min: 3, max: 50 }), HEDGE, HEDGE, (start, length, ha, hs) => {
      const [a, b] = [start * 100, (start - length) * 100 > 0 ? (start - length) * 100 : 100];
      fc.pre(a > b);
      const s = `The stadial began ${ha}${comma(a)} years ago and ended ${comma(b)} years ago, a span of ${hs}${comma(a - b)} years.`;
      expect(check(s)).toEqual([]);
    }));
  });
});

describe('property: right conversions are never flagged', () => {
  it('holds for a temperature change restated in °F to one decimal', () => {
    fc.assert(fc.property(fc.integer({ min: 5, max: 150 }), (tenths) => {
      const c = tenths / 10;
      const s = `Antarctica was ${c} °C (${Math.round(c * 18) / 10} °F) colder at the glacial peak.`;
      expect(check(s)).toEqual([]);
    }));
  });

  it('holds for a CO2 level restated as a percentage of the air', () => {
    fc.assert(fc.property(fc.integer({ min: 172, max: 430 }), (ppm) => {
      const s = `The Northmoor station logs ${ppm} ppm of CO2, which is ${ppm / 1e4} percent of the air.`;
      expect(check(s)).toEqual([]);
    }));
  });
});
