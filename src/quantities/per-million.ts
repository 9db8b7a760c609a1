/**
 * A share of the air told as molecules: "about 300 CO2 molecules in every million molecules of
 * air", "each million molecules of air held about 250 of CO2", "4 molecules per 10,000" is not read.
 * Such a number is a mole fraction (Lan, Tans & Thoning, NOAA GML: ppm is micromol per mol of dry
 * air), so per million it is ppm, per thousand a thousand times that, per billion a thousandth.
 *
 *   "there are about 300 CO2 molecules in every million molecules of air"
 *              ^^^^^^^^^ ────────────────── per million → about 300 ppm
 */
import type { Quantity } from '../types.js';

const BASES: Record<string, number> = { thousand: 1e3, million: 1, billion: 1e-3 };
const GAS = String.raw`(?:CO2|CO₂|carbon\s+dioxide)`;
const AIR = String.raw`(?:molecules?|parts?|particles?)(?:\s+of\s+(?:the\s+|dry\s+)?air)?|air\s+molecules?`;
/** After the number: "CO2 molecules in every million molecules of air", "molecules of carbon dioxide per million". */
const AFTER = new RegExp(
  String.raw`^\s*(?:${GAS}\s+)?molecules?(?:\s+of\s+${GAS})?\s+(?:in|per|for|out\s+of|among|to)\s+(?:every|each|a|one)?\s*(thousand|million|billion)(?:\s+(?:${AIR}))?(?![\p{L}])`,
  'iu',
);
/** Before the number: "each million molecules of air held about". */
const BEFORE = new RegExp(
  String.raw`(?:every|each|a|one|per|in\s+(?:every|each|a))\s+(thousand|million|billion)\s+(?:${AIR})\s*,?\s*(?:(?:there\s+)?(?:held|hold|holds|holding|contained|contain|contains|had|has|have|included|include|includes|were|are|was|is)\s+)(?:only\s+|just\s+)?$`,
  'iu',
);
/** What may follow a number read by BEFORE: "of CO2", "CO2 molecules", "molecules of carbon dioxide". */
const OF_GAS = new RegExp(String.raw`^\s*(?:(?:of\s+${GAS})|(?:${GAS}\s+molecules?)|(?:molecules?\s+of\s+${GAS}))(?![\p{L}])`, 'iu');

/** `quantities` with plain numbers told as molecules per thousand, million or billion read as ppm. */
export function readPerMillion(text: string, quantities: Quantity[]): Quantity[] {
  if (!/molecule|parts?\s+of\s+(?:the\s+)?air/iu.test(text)) return quantities;
  return quantities.map((q) => {
    if (q.dimension !== 'number' || q.statedUnit === 'CE') return q;
    const after = AFTER.exec(text.slice(q.end));
    const before = after === null ? BEFORE.exec(text.slice(Math.max(0, q.start - 80), q.start)) : null;
    const base = (after ?? before)?.[1]?.toLowerCase();
    const factor = base === undefined ? undefined : BASES[base];
    if (factor === undefined) return q;
    const gas = after === null ? OF_GAS.exec(text.slice(q.end)) : null;
    if (after === null && gas === null) return q;
    const end = q.end + (after ?? gas)![0].length;
    return {
      ...q,
      text: text.slice(q.start, end),
      end,
      value: q.value * factor,
      low: q.low * factor,
      high: q.high * factor,
      dimension: 'concentration',
      unit: 'ppm',
      statedUnit: 'ppm',
    };
  });
}
