/**
 * Comparisons: "the trapped air is older than the ice around it", "polar temperatures swung less
 * than the global mean", "the air is the same age as the ice".
 */
import { inPhrase, kindOf, subjectOf, thingAfter, thingBefore } from './resolve.js';
import type { LexHit } from './lexicon.js';
import { denialsBefore, type ReadSentence, type Thing } from './sentence.js';
import type { Comparison } from './types.js';

const SIGN: Record<string, 1 | -1 | 0> = { 'age-up': 1, 'age-down': -1, 'age-same': 0, 'size-up': 1, 'size-down': -1, 'age-up-verb': 1, 'age-down-verb': -1, 'size-up-verb': 1, 'size-down-verb': -1, 'rate-up': 1, 'rate-down': -1 };
const SWING = /^(?:swing|swings|swung|change|changes|changed|vary|varies|varied|range|amplitude|shift|shifts|shifted|moved|move|moves|fluctuat\w*|respond|responds|responded|react|reacts|reacted|temperature|temperatures)$/u;

/** The comparisons one sentence states (a denied comparison states none). */
export function readComparisons(s: ReadSentence, previous?: ReadSentence): Comparison[] {
  const out: Comparison[] = [];
  const hits = s.of('comparatives');
  // "more sluggishly" is one comparative, not "more" and another.
  const longest = hits.filter((h) => !hits.some((o) => o !== h && o.first <= h.first && o.last >= h.last && o.last - o.first > h.last - h.first));
  for (const h of longest) {
    const sign = SIGN[h.key];
    if (sign === undefined || denialsBefore(s, h.first, 4) % 2 === 1) continue;
    // A comparing verb takes its object directly ("the gas predates the ice that traps it").
    const verb = h.key.endsWith('-verb');
    const link = verb ? h.last : s.words.findIndex((w, i) => i > h.last - (sign === 0 ? 2 : 0) && i <= h.last + 4 && (w.text === 'than' || w.text === 'as'));
    if (link < 0) continue;
    const b = pastThoseOf(s, thingAfter(s, link, 6));
    // The subject, not a thing in a phrase before it ("Over the ice ages the poles swung…").
    const segment = s.words[h.first]?.segment;
    const plain = s.things.find((t) => t.last < h.first && s.words[t.first]?.segment === segment && t.kind !== 'pronoun' && !inPhrase(s, t));
    // "Polar regions, buffered by their ice, change less...": past an interrupting phrase, the
    // subject is the clause's first plain thing, not the nearest one.
    const clauseSubject = s.things.find((t) => t.last < h.first && s.words[t.first]?.clause === s.words[h.first]?.clause && t.kind !== 'pronoun' && !inPhrase(s, t));
    const a = plain ?? subjectOf(s, h.first) ?? clauseSubject ?? thingBefore(s, h.first, 'clause');
    if (a === undefined || b === undefined) continue;
    const attribute = h.key.startsWith('age') ? 'age' : h.key.startsWith('rate') ? 'rate' : 'size';
    if (attribute === 'size') {
      const clause = s.words[h.first]?.clause;
      const words = s.words.filter((w) => w.clause === clause);
      const aboutTemperature = words.some((w) => SWING.test(w.text)) || s.of('changes').some((c) => (c.key === 'warm' || c.key === 'cool') && s.words[c.first]?.clause === clause);
      if (!aboutTemperature) continue;
    }
    // "the temperature swing recorded at Vostok understates...": a place named after the subject, before the comparison, is its own.
    const placed = (t: Thing) => (t === a && t.kind === 'temperature' ? s.of('regions').find((r) => r.key !== 'global' && r.first > t.last && r.last < h.first && s.words[r.first]?.segment === segment)?.key : undefined);
    const name = (t: Thing) => t.region ?? placed(t) ?? kindOf(s, t, previous) ?? t.kind;
    out.push({ kind: 'comparison', a: name(a), b: name(b), attribute, sign, start: s.words[a.first]?.start ?? 0, end: s.words[b.last]?.end ?? 0 });
  }
  return [...out, ...datedAges(s, previous), ...answeredComparison(s, longest, previous)];
}

/** Words an answer of one comparative may carry besides it ("Definitely older.", "Older, actually."). */
const ANSWER_WORDS = 4;

/**
 * "Is the air in a bubble younger or older than the ice around it? Older.": an answer made of one
 * comparative, naming nothing else, under a question whose comparisons offer it takes the question's
 * comparison with the sign it picks, at the answer's own word. The question itself states no
 * comparison (its stance is asked); the answer asserts one.
 */
function answeredComparison(s: ReadSentence, hits: readonly LexHit[], previous?: ReadSentence): Comparison[] {
  if (previous === undefined || !previous.text.trimEnd().endsWith('?') || hits.length !== 1 || s.things.length > 0 || s.words.length > ANSWER_WORDS) return [];
  const h = hits[0] as LexHit;
  const sign = SIGN[h.key];
  if (sign === undefined || denialsBefore(s, h.first, 4) % 2 === 1) return [];
  const attribute = h.key.startsWith('age') ? 'age' : h.key.startsWith('rate') ? 'rate' : 'size';
  const offered = readComparisons(previous).filter((c) => c.attribute === attribute);
  // The question offers the comparison the answer's word picks ("younger or older", or "is it older?").
  const chosen = offered.find((c) => c.sign === sign);
  if (chosen === undefined) return [];
  return [{ ...chosen, start: s.words[h.first]?.start ?? 0, end: s.words[h.last]?.end ?? 0 }];
}

/** Verbs that place a thing in time ("the air dates from before the snow"). */
const DATING = new Set(['date', 'dates', 'dated', 'dating']);
/** Words that may stand between "dates from" and its "before"/"after": a degree or a span. */
const DEGREE = new Set(['well', 'long', 'far', 'much', 'just', 'shortly', 'slightly', 'somewhat', 'centuries', 'millennia', 'decades', 'years', 'way']);

/**
 * "The air dates from well before the snow that entombs it": a dating verb, "from" (or "to", "back
 * to"), a degree word or two, then an order word, compares the ages of its subject and the thing
 * after: before is older, after younger. The lexicon's own "date from before" covers the bare form.
 */
function datedAges(s: ReadSentence, previous?: ReadSentence): Comparison[] {
  const out: Comparison[] = [];
  s.words.forEach((w, i) => {
    if (!DATING.has(w.text)) return;
    let k = i + 1;
    if (s.words[k]?.text === 'back') k += 1;
    if (!['from', 'to'].includes(s.words[k]?.text ?? '')) return;
    k += 1;
    const start = k;
    while (k < start + 2 && DEGREE.has(s.words[k]?.text ?? '')) k += 1;
    if (k === start) return;
    const order = s.of('order').find((h) => h.first === k && (h.key === 'before' || h.key === 'after'));
    if (order === undefined || denialsBefore(s, i, 4) % 2 === 1) return;
    const a = subjectOf(s, i) ?? thingBefore(s, i, 'clause');
    const b = thingAfter(s, order.last, 6);
    if (a === undefined || b === undefined) return;
    const name = (t: Thing) => kindOf(s, t, previous) ?? t.kind;
    out.push({ kind: 'comparison', a: name(a), b: name(b), attribute: 'age', sign: order.key === 'before' ? 1 : -1, start: s.words[a.first]?.start ?? 0, end: s.words[b.last]?.end ?? 0 });
  });
  return out;
}

/** "than those of the global mean", "than that of Greenland": the thing after "of" is the one compared. */
function pastThoseOf(s: ReadSentence, b: Thing | undefined): Thing | undefined {
  if (b === undefined || b.kind !== 'pronoun' || !['that', 'those'].includes(s.words[b.first]?.text ?? '') || s.words[b.last + 1]?.text !== 'of') return b;
  return thingAfter(s, b.last + 1, 4) ?? b;
}
