/**
 * "From A–B to C–D": a dashed pair after "from" is the first end of a change when "to" and another
 * figure follow it, so it is one range, not A rising to B. The ranges are IPCC's assessed likely
 * ranges of the equilibrium climate sensitivity: 1.5–4.5 °C in AR5 and 2.5–4 °C in AR6 (IPCC AR6
 * WGI Technical Summary, TS.3.2.1, which calls the new range "narrower than the AR5 likely range").
 * How English writes a range with a dash is common practice.
 */
import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';

const read = (text: string) => parseQuantities(text).map((q) => [q.text, q.low, q.high]);

describe('from a dashed range to another', () => {
  it('reads the first pair as one range when "to" and a figure follow it', () => {
    expect(read('AR6 narrowed the likely range from 1.5–4.5 °C to 2.5–4 °C.')).toEqual([
      ['1.5–4.5 °C', 1.5, 4.5],
      ['2.5–4 °C', 2.5, 4],
    ]);
  });

  it('allows a bracketed note between the range and "to"', () => {
    expect(read('The likely range was revised from 1.5-4.5 °C (AR5) to 2.5-4 °C.').map(([t]) => t)).toEqual(['1.5-4.5 °C', '2.5-4 °C']);
  });

  it('keeps "from A–B" a change from A to B when no "to" follows', () => {
    expect(read('CO2 rose from 180–280 ppm over the termination.').map(([t]) => t)).toEqual(['180', '280 ppm']);
  });

  it('keeps "from A to B to C" as it was: the word "to" is no dash', () => {
    expect(read('CO2 went from 190 to 280 to 420 ppm.').map(([t]) => t)).toEqual(['190', '280', '420 ppm']);
  });
});
