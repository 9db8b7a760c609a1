/**
 * The effect of one more unit of CO2 (marginal forcing), read as a signed change: +1 when the
 * sentence says the effect per unit grows as the concentration climbs, -1 when it shrinks.
 *
 *   "Each added ppm warms a little less than the one before."          -1
 *   "Every extra puff of CO2 packs a bigger punch than the last."      +1  (increment + "of" + CO2)
 *   "Forcing per ppm grows as concentration climbs."                   +1  (a rate per unit)
 *   "The 400th ppm warms more than the 200th did."                     +1  (ordinals: 400 > 200, more)
 *   "The step from 400 to 500 ppm does more than the step from 200 to 300."  +1  (increments)
 *
 * Words come from the lexicon: `entities.marginal-forcing` (one more unit), `changes.increment`
 * (extra, additional...), `entities.co2-unit` (ppm...), effect words (`causes.roles`, `nouns`,
 * `verbs`, `effects`, `changes.warm`/`cool`). Numbers and ordinals are read from the words.
 */
import type { LexHit } from './lexicon.js';
import { denialsBefore, type ReadSentence } from './sentence.js';
import type { Change } from './types.js';

const COORDINATORS = new Set(['and', 'but', 'so', 'or', 'yet', 'while']);
const DETERMINERS = new Set(['the', 'its', 'their', 'this', 'that', 'a', 'an', 'our', 'total', 'overall']);
const ORDINAL = /^(\d[\d,]*)(?:st|nd|rd|th)$/u;
const NUMBER = /^\d[\d,]*(?:\.\d+)?$/u;

/** The marginal-forcing changes of one sentence. */
export function readMarginal(s: ReadSentence): Change[] {
  const changes: Change[] = [];
  for (const m of incrementsOf(s)) {
    const clause = s.words[m.first]?.clause;
    // "each extra ppm costs more to remove" is no claim about warming.
    if (!s.hits.some((h) => s.words[h.first]?.clause === clause && isEffect(h))) continue;
    const dir = directionAfter(s, m);
    if (dir === undefined) continue;
    const flip = denialsBefore(s, m.first, 6) % 2 === 1 ? -1 : 1;
    const last = s.words.reduce((end, w, i) => (w.clause === clause ? i : end), m.last);
    changes.push(change(s, (dir * flip) as 1 | -1, m.first, last));
  }
  const ranked = rankedIncrements(s);
  if (ranked !== undefined) changes.push(ranked);
  const correlated = correlative(s);
  if (correlated !== undefined && changes.length === 0) changes.push(correlated);
  return changes;
}

/**
 * A correlative comparison ("the more X, the Y-er Z"): two halves, each opened by "the" and a
 * comparative, the second at the start of a later segment. When the first half is about the amount
 * of CO2 and the second holds one more unit, the effect per unit moves as the two signs multiply:
 *
 *   "The more CO2 there is, the bigger the kick from each extra ppm."          +1
 *   "The higher the CO2 level, the less each added ppm warms."                 -1
 */
function correlative(s: ReadSentence): Change | undefined {
  const opens = (i: number) => s.words[i]?.text === 'the' && (i === s.opening || s.words[i - 1]?.segment !== s.words[i]?.segment);
  const signAt = (i: number) => s.hits.filter((h) => h.first === i).map(SIGN_OF).find((x) => x !== 0);
  const halves = s.words.flatMap((_, i) => (opens(i) && signAt(i + 1) !== undefined ? [{ at: i, sign: signAt(i + 1) as 1 | -1 }] : []));
  const [first, second] = halves;
  if (first === undefined || second === undefined) return undefined;
  const segment = (i: number) => s.words[i]?.segment ?? -1;
  const inFirst = (i: number) => i > first.at && segment(i) === segment(first.at);
  if (!s.of('entities', 'co2').some((h) => inFirst(h.first)) && !s.of('entities', 'co2-unit').some((h) => inFirst(h.first))) return undefined;
  const unit = incrementsOf(s).find((m) => m.first > second.at && s.words[m.first]?.clause === s.words[second.at]?.clause);
  if (unit === undefined) return undefined;
  const last = s.words.reduce((end, w, i) => (w.clause === s.words[second.at]?.clause ? i : end), unit.last);
  return change(s, (first.sign * second.sign) as 1 | -1, first.at, last);
}

/** Effect words: warming, a cause, a role or a strength ("punch"), an effect noun. */
function isEffect(h: LexHit): boolean {
  return (h.cls === 'changes' && (h.key === 'warm' || h.key === 'cool')) || (h.cls === 'causes' && ['roles', 'verbs', 'nouns', 'effects'].includes(h.key));
}

/** The lexicon's "one more unit" phrases, and an increment word before "of" CO2 ("every extra puff of CO2"). */
function incrementsOf(s: ReadSentence): { first: number; last: number }[] {
  const found: { first: number; last: number }[] = s.of('entities', 'marginal-forcing').map((h) => ({ first: h.first, last: h.last }));
  for (const inc of s.of('changes', 'increment')) {
    if (found.some((f) => f.first <= inc.first && inc.first <= f.last)) continue;
    // "extra puff of carbon dioxide": one or two words naming one unit (no number, no plural: "an
    // extra 100 ppm of CO2", "additional emissions of CO2" are amounts), then "of", then the gas,
    // set against another unit ("than the one before").
    const of = s.words.findIndex((w, i) => i > inc.last && i <= inc.last + 3 && w.text === 'of');
    const unit = s.words.slice(inc.last + 1, of < 0 ? inc.last + 1 : of);
    if (unit.some((w) => /^\d|[^s]s$/u.test(w.text))) continue;
    const gas = of < 0 ? undefined : s.of('entities', 'co2').find((c) => c.first === of + 1 || (c.first === of + 2 && s.words[of + 1]?.text === 'the'));
    const clause = s.words[inc.first]?.clause;
    const against = s.words.some((w, i) => i > inc.last && w.clause === clause && w.text === 'than');
    if (gas !== undefined && against) found.push({ first: inc.first, last: gas.last });
  }
  return found;
}

const SIGN_OF = (h: LexHit): 1 | -1 | 0 => {
  if ((h.cls === 'changes' && (h.key === 'up' || h.key === 'accelerating')) || (h.cls === 'comparatives' && h.key === 'size-up')) return 1;
  if ((h.cls === 'changes' && h.key === 'down') || (h.cls === 'comparatives' && h.key === 'size-down')) return -1;
  return 0;
};

/**
 * Which way the effect of `m` moves: the direction words after it in its own segment when they
 * agree, else in its clause when only one direction stands there ("each extra ppm, as
 * concentrations rise, warms less" names both and states none).
 */
function directionAfter(s: ReadSentence, m: { first: number; last: number }): 1 | -1 | undefined {
  const at = s.words[m.first];
  // "..., and the total keeps rising": a coordinated clause with a subject of its own ends the reach.
  const stop = s.words.findIndex((w, i) => i > m.last && w.segment !== s.words[i - 1]?.segment && COORDINATORS.has(w.text) && DETERMINERS.has(s.words[i + 1]?.text ?? ''));
  const signs = (scope: 'segment' | 'clause') =>
    new Set(s.hits.filter((h) => h.first > m.last && (stop < 0 || h.first < stop) && s.words[h.first]?.[scope] === at?.[scope]).map(SIGN_OF).filter((x) => x !== 0));
  for (const scope of ['segment', 'clause'] as const) {
    const found = signs(scope);
    if (found.size === 1) return [...found][0] as 1 | -1;
    if (found.size > 1) return undefined;
  }
  return undefined;
}

/** One amount of CO2 named by its rank or its starting level: "the 400th ppm", "the step from 400 to 500 ppm". */
interface Ranked {
  level: number;
  first: number;
  last: number;
}

/**
 * "the 400th ppm warms more than the 200th did", "the step from 400 to 500 ppm does more than the
 * step from 200 to 300": two increments of CO2 set against each other by a comparative before
 * "than". The one at the higher level doing more is the effect per unit growing with concentration.
 */
function rankedIncrements(s: ReadSentence): Change | undefined {
  const units = s.of('entities', 'co2-unit');
  if (units.length === 0 && s.of('entities', 'co2').length === 0) return undefined;
  if (!s.hits.some(isEffect) && !s.words.some((w) => w.text === 'does' || w.text === 'do' || w.text === 'did')) return undefined;
  const ranked: Ranked[] = [];
  s.words.forEach((w, i) => {
    const ordinal = ORDINAL.exec(w.text);
    if (ordinal?.[1] !== undefined) ranked.push({ level: Number(ordinal[1].replace(/,/gu, '')), first: i, last: i });
    // "from 400 to 500": the level the increment starts from.
    if (w.text === 'from' && NUMBER.test(s.words[i + 1]?.text ?? '') && s.words[i + 2]?.text === 'to' && NUMBER.test(s.words[i + 3]?.text ?? '')) {
      const from = Number((s.words[i + 1]?.text ?? '').replace(/,/gu, ''));
      const to = Number((s.words[i + 3]?.text ?? '').replace(/,/gu, ''));
      if (to > from) ranked.push({ level: from, first: i, last: i + 3 });
    }
  });
  for (let k = 0; k + 1 < ranked.length; k += 1) {
    const a = ranked[k] as Ranked;
    const b = ranked[k + 1] as Ranked;
    const than = s.words.findIndex((w, i) => i > a.last && i < b.first && w.text === 'than');
    if (than < 0 || a.level === b.level || s.words[a.first]?.clause !== s.words[b.first]?.clause) continue;
    const comparative = s.hits.filter((h) => h.first > a.last && h.last < than).map(SIGN_OF).find((x) => x !== 0);
    if (comparative === undefined) continue;
    const flip = denialsBefore(s, than, 6) % 2 === 1 ? -1 : 1;
    const dir = (comparative * Math.sign(a.level - b.level) * flip) as 1 | -1;
    return change(s, dir, a.first, b.last);
  }
  return undefined;
}

function change(s: ReadSentence, dir: 1 | -1, first: number, last: number): Change {
  return { kind: 'change', of: 'marginal-forcing', attribute: 'amount', dir, start: s.words[first]?.start ?? 0, end: s.words[last]?.end ?? 0 };
}
