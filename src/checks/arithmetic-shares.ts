/**
 * A change stated as a share of where it started, in two builds the percentage rule does not read:
 *  - a fraction after a change noun: "from 280 to 420 ppm, a rise of roughly [one quarter]" (a half);
 *    "CO2 stood at 190 ppm, some 90 ppm below the 280 ppm of 1750: a drop of almost [half]" (a third);
 *  - a percentage restating a change just given: "an increase of 100 ppm, or about [36 percent]"
 *    after "from 180 ppm to 280 ppm" (56 percent).
 * The base of a rise is the lower level, of a drop the higher one: the level the change started from.
 * Precision first: the two levels must be a from-to pair, or the only two levels of their dimension.
 */
import { writtenInterval as w } from '../quantities/index.js';
import type { Dimension, Quantity } from '../types.js';
import { divide, minus, size, type Derived } from './arithmetic-derive.js';
import { isStatedChange, type Pair } from './arithmetic-frames.js';

/** A finding on a stated share. */
export interface ShareFinding {
  stated: Quantity;
  computed: Derived;
  measures: string;
}

const S = String.raw`[\s\u00A0]`;
/** Words of a change downward; any other change is read as a rise. */
const DOWNWARD = /(?:^|[^\p{L}])(?:drop|dropped|fall|fell|fallen|decline|declined|decrease|decreased|loss|lost|reduction|reduced|cut|plunge|plunged|slide|sank|lower|below|less|down|cooling|cooled|shrank|shrunk)(?![\p{L}])/iu;
/** Between a stated change and a percentage that restates it: ", or", ", i.e.", ", which is", "(". */
const RESTATES = new RegExp(String.raw`^${S}*(?:\(|,?${S}*(?:or|i\.e\.,?|that is,?|which is|that's|that’s)${S}+)$`, 'iu');
const LEVELED: Dimension[] = ['concentration', 'temperature', 'length'];
const only = <T>(xs: T[]): T | undefined => (xs.length === 1 ? xs[0] : undefined);

/** The two levels a change runs between: a from-to pair, else the only two levels of one dimension. */
function levelsOf(text: string, qs: Quantity[], pairs: Pair[], except: Quantity): [Quantity, Quantity] | undefined {
  const pair = only(pairs.filter((p) => LEVELED.includes(qs[p.from]?.dimension ?? 'number')));
  if (pair !== undefined) return [qs[pair.from] as Quantity, qs[pair.to] as Quantity];
  for (const dimension of LEVELED) {
    const levels = qs.filter((q) => q !== except && q.dimension === dimension && !isStatedChange(text, q) && !/^[^\p{L}\d]*(?:below|above|lower|higher|less|more)(?![\p{L}])/iu.test(text.slice(q.end, q.end + 16)));
    if (levels.length === 2) return levels as [Quantity, Quantity];
  }
  return undefined;
}

/** The change between two levels as a share of the one it started from (the lower for a rise). */
function shareOf(a: Quantity, b: Quantity, downward: boolean): Derived | undefined {
  const [x, y] = [w(a), w(b)];
  const base = (x.value < y.value) !== downward ? x : y;
  return divide(size(minus(y, x)), base);
}

/** Every fraction or percentage that misstates a change as a share of its start. */
export function changeShares(text: string, qs: Quantity[], pairs: Pair[]): ShareFinding[] {
  return qs.flatMap((stated, i) => {
    const fraction = stated.dimension === 'ratio' && stated.value < 1 && isStatedChange(text, stated);
    const previous = qs[i - 1];
    const restating = stated.dimension === 'percent' && previous !== undefined && isStatedChange(text, previous) && RESTATES.test(text.slice(previous.end, stated.start));
    if (!fraction && !restating) return [];
    const levels = levelsOf(text, qs, pairs, restating ? (previous as Quantity) : stated);
    if (levels === undefined || levels.some((q) => q.start > stated.start)) return [];
    const words = text.slice(Math.max(0, (restating ? (previous as Quantity) : stated).start - 24), stated.start);
    const share = shareOf(levels[0], levels[1], DOWNWARD.test(words));
    if (share === undefined) return [];
    const k = fraction ? 1 : 100;
    const computed = { value: share.value * k, low: share.low * k, high: share.high * k };
    return [{ stated, computed, measures: `the change from ${levels[0].text} to ${levels[1].text} as a share of where it started` }];
  });
}
