/**
 * Rank and comparison claims (src/checks/rank) read against the pack's values of one measure.
 * Record spans: EPICA Dome C about 800,000 years (Jouzel et al. 2007, Science 317, 793-796; Lüthi et
 * al. 2008, Nature 453, 379-382), Dome Fuji about 720,000 years (Kawamura et al. 2017, Science
 * Advances 3, e1600446), Vostok about 420,000 years (Petit et al. 1999, Nature 399, 429-436).
 * Drilled depths: Vostok 3,623 m (Petit et al. 1999), EPICA Dome C about 3,260-3,270 m (Lüthi et al. 2008).
 * The other drilled depths are the pack's own values (rules/paleoclimate.yaml, each with its source).
 * Sentences are our own.
 */
import { describe, expect, it } from 'vitest';
import { checkRanks, findRankWords, measureFamilies } from '../../src/checks/rank/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

function flagged(sentence: string): [string, string, string | undefined][] {
  return checkRanks(sentence, packs).map((f) => [f.ruleId, sentence.slice(f.start, f.end), f.correction]);
}

describe('measure families', () => {
  it('groups the values of one measure by the entity they name, from the binding terms alone', () => {
    const families = new Map(measureFamilies(packs).map((f) => [f.name, f.members.map((m) => m.entity).sort()]));
    expect(families.get('record-span')).toEqual(['dome-fuji', 'edc', 'grip', 'vostok']);
    expect(families.get('drilled-depth')).toEqual(['beyond-epica', 'dome-fuji', 'edc', 'edml', 'grip', 'vostok']);
    // EPICA community members 2004 (Nature 429, 623-628): eight cycles at Dome C; Petit et al. 1999: four at Vostok.
    expect(families.get('glacial-cycles')).toEqual(['edc', 'vostok']);
  });
});

describe('rank words', () => {
  it('reads superlatives with an ordinal, comparatives and multiples', () => {
    const words = findRankWords('the second-longest record, older than Vostok and three times as deep as GRIP');
    expect(words.map((w) => [w.kind, w.stem, w.rank, w.ratio])).toEqual([
      ['superlative', 'long', 2, undefined],
      ['comparative', 'old', undefined, undefined],
      ['comparative', 'deep', undefined, 3],
    ]);
    // A compound adjective is no superlative of its own: "longest-running".
    expect(findRankWords('the longest-running drilling programme')).toEqual([]);
  });
});

const WRONG: [sentence: string, ruleId: string, span: string, correctionHas: string[]][] = [
  ["The longest ice-core record is Vostok's.", 'value.rank.record-span', 'Vostok', ['EPICA Dome C', '800,000', '420,000']],
  ['The Hallerby exhibit says Vostok holds the longest ice-core record.', 'value.rank.record-span', 'Vostok', ['EPICA Dome C', '800,000']],
  ["Vostok's record is the second longest.", 'value.rank.record-span', 'Vostok', ['Dome Fuji', '720,000']],
  ["Vostok's record is twice as long as EPICA Dome C's.", 'value.rank.record-span', 'twice as long as', ['about half as long as', '420,000', '800,000']],
  ['Vostok reaches further back than EPICA Dome C.', 'value.rank.record-span', 'further back than', ['420,000', '800,000']],
  ['EPICA Dome C is deeper than Vostok.', 'value.rank.drilled-depth', 'deeper than', ['shallower than', '3,623']],
  ['The deepest of these cores is EPICA Dome C.', 'value.rank.drilled-depth', 'EPICA Dome C', ['Vostok', '3,623']],
  // A tie past a description of the place ("the Russian station at"), and an equals sign in notes.
  ['The longest continuous ice-core record yet published comes from the Russian base at Vostok.', 'value.rank.record-span', 'Vostok', ['EPICA Dome C', '800,000']],
  ['quiz answer: longest ice core record = Vostok', 'value.rank.record-span', 'Vostok', ['EPICA Dome C', '800,000']],
  // An adverb after the tie, a record noun after the entity, an apposition, "ice record" as one noun.
  ['Vostok is still the longest ice-core record we have.', 'value.rank.record-span', 'Vostok', ['EPICA Dome C', '800,000', '420,000']],
  ['The longest continuous ice record is still Vostok.', 'value.rank.record-span', 'Vostok', ['EPICA Dome C', '800,000']],
  ["Vostok's record remains the longest anyone has drilled.", 'value.rank.record-span', 'Vostok', ['EPICA Dome C', '800,000']],
  ['Vostok, the longest ice-core record of all, covers four glacial cycles.', 'value.rank.record-span', 'Vostok', ['EPICA Dome C', '800,000']],
  ['Our poster shows Dome Fuji, still the oldest record of them all.', 'value.rank.record-span', 'Dome Fuji', ['EPICA Dome C', '800,000', '720,000']],
  // "second only to B" puts B above A in any group that holds both, so "among" does not hedge it.
  ["Dome Fuji's record is second only to Vostok's.", 'value.rank.record-span', 'second only to', ['720,000', '420,000']],
  ["EPICA Dome C's record is second only to Dome Fuji's among the Antarctic cores.", 'value.rank.record-span', 'second only to', ['800,000', '720,000']],
  // A comparison against "no …" ranks B first; a comparative may carry its noun.
  ["No ice core anywhere has produced a longer climate record than Vostok's.", 'value.rank.record-span', 'Vostok', ['EPICA Dome C', '800,000', '420,000']],
  ["Nothing drilled so far holds an older record than Dome Fuji's.", 'value.rank.record-span', 'Dome Fuji', ['EPICA Dome C', '800,000']],
  ['Vostok has a longer record than EPICA Dome C.', 'value.rank.record-span', 'longer record than', ['shorter than', '420,000', '800,000']],
];

const RIGHT: string[] = [
  'The longest continuous, peer-reviewed record comes from EPICA Dome C and covers about 800,000 years.',
  'EPICA Dome C, drilled to about 3,270 metres, still holds the longest continuous record.',
  "Dome Fuji's record is the second longest, after EPICA Dome C.",
  "EPICA Dome C's record is about twice as long as Vostok's.",
  'Vostok is deeper than EPICA Dome C.',
  'The deepest core is Vostok.',
  // The past, a hedge, a negation, a narrower group: the values cannot settle these.
  'When it was published in 1999, Vostok was the longest ice-core record.',
  'Vostok was at the time the longest ice-core record.',
  'Vostok is one of the longest ice-core records.',
  'Vostok is not the longest ice-core record.',
  'Vostok holds the longest record from a Russian station.',
  'The deepest of the Antarctic cores is EPICA Dome C.',
  'The longest ice-core record comes from the European project at Dome C.',
  'The longest Greenland ice-core record comes from the Danish site at NGRIP.',
  // "Longer" with no measure word could be the core's length or its record: no reading is clear.
  'Vostok is longer than Dome Fuji.',
  // Correct look-alikes of the wordings above (EPICA community members 2004, Nature 429, 623-628; Lüthi et al. 2008).
  "Dome C's record is the longest continuous one.",
  'Vostok reaches 420,000 years, Dome C 800,000.',
  "EPICA Dome C's record is still the longest of any ice core.",
  'Dome C, the longest ice-core record so far, covers eight glacial cycles.',
  "Dome Fuji's record is second only to EPICA Dome C's.",
  "Vostok's record is second only to EPICA Dome C's among the long Antarctic records.",
  'Next to Vostok, the longest record comes from Dome C.',
  "No ice core has produced a longer record than EPICA Dome C's.",
  "No Greenland core has a longer record than GRIP's.",
  'No core is deeper than Vostok.',
  'EPICA Dome C has a longer record than Vostok.',
  'Dome Fuji holds an older climate record than Vostok.',
  'Vostok, drilled to 3,623 metres, is the deepest core.',
];

describe('checkRanks', () => {
  it.each(WRONG)('flags: %s', (sentence, ruleId, span, has) => {
    const flags = flagged(sentence);
    expect(flags.map(([id, at]) => [id, at])).toEqual([[ruleId, span]]);
    for (const token of has) expect(flags[0]?.[2]).toContain(token);
  });

  it.each(RIGHT)('leaves alone: %s', (sentence) => expect(flagged(sentence)).toEqual([]));

  it('cites the sources of the values it compared', () => {
    const [flag] = checkRanks("Vostok's record is twice as long as EPICA Dome C's.", packs);
    const ids = (flag?.sources ?? []).map((s) => s.id);
    expect(ids).toEqual(expect.arrayContaining(['petit-1999', 'jouzel-2007', 'luthi-2008']));
  });
});
