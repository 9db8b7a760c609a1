import { describe, expect, it } from 'vitest';
import { parseQuantities, writtenInterval } from '../../src/quantities/index.js';

// [sentence, quantity as written, low, high]: the interval of the stated row alone, worked by hand
// from the interval table (docs/quantities.md): "about" widens by 10% of the value, which is taken
// back off; a bound ("more than", "nearly", "under") is dropped and the number read to its precision.
const CASES: [string, string, number, number][] = [
  ['The Halden panel gives about 190 ppm for the glacial air.', 'about 190 ppm', 185, 195],
  ['The Northmoor core holds some 2,350 years of ash layers.', 'some 2,350 years', 2345, 2355],
  ['The Firn & Flux chart tops out at more than 420 ppm.', 'more than 420 ppm', 415, 425],
  // 3,270 ends in a zero, so it is read to ±5 (the precision row).
  ['The team drilled nearly 3,270 m of ice.', 'nearly 3,270 m', 3265, 3275],
  ['The record covers under 12.5 kyr at this site.', 'under 12.5 kyr', 12450, 12550],
  // °F to K: (44.5 − 32) / 1.8 = 6.944 and (45.5 − 32) / 1.8 = 7.5 °C as readings.
  ['The gallery was kept at about 45 °F.', 'about 45 °F', 6.944, 7.5],
  // No hedge: the parsed interval itself.
  ['Vostok air held 182 ppm at the coldest.', '182 ppm', 181.5, 182.5],
];

describe('writtenInterval', () => {
  it.each(CASES)('reads %s without its hedge', (sentence, text, low, high) => {
    const q = parseQuantities(sentence).find((x) => x.text === text);
    expect(q).toBeDefined();
    if (q === undefined) return;
    const w = writtenInterval(q);
    expect(w.value).toBe(q.value);
    expect(w.low).toBeCloseTo(low, 3);
    expect(w.high).toBeCloseTo(high, 3);
  });

  it('only narrows an approximation: "about" adds slack and nothing else', () => {
    for (const sentence of ['CO2 sat at about 280 ppm.', 'It lasted roughly 1,800 years.', 'The air was around -30 °C.']) {
      const [q] = parseQuantities(sentence);
      if (q === undefined) throw new Error(`no quantity in ${sentence}`);
      const w = writtenInterval(q);
      expect(w.low).toBeGreaterThan(q.low);
      expect(w.high).toBeLessThan(q.high);
    }
  });

  it('leaves a vague magnitude as parsed: "several thousand years" has no written precision', () => {
    const [q] = parseQuantities('The thaw took several thousand years.');
    expect(q && writtenInterval(q)).toEqual({ value: q?.value, low: q?.low, high: q?.high });
  });
});
