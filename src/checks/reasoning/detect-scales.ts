/**
 * `scope.figure-across-scales`: a figure true at one scale handed unchanged to another.
 *
 *   "The world was about 6 °C colder then, so our valley was 6 °C colder too."
 *                                              ^^^^^^^^^^^^^^^^^^^^^^^^^^ flagged
 *   "Central Greenland cooled by some 20 °C. So the northern hemisphere was 20 °C colder as well."
 *                                               ^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^ flagged
 *
 * Scales, widest first: the globe (lexicon `regions.global`), a hemisphere (a region hit holding the
 * word "hemisphere"), a polar region or ice core (`regions.antarctic`, `greenland`, `polar`,
 * `entities.ice-core`) and one place (cue words `places`, a place noun, after a near determiner, cue
 * words `near`, or a proper name: "our valley", "this stretch of coast", "the Ardle valley"; or cue words
 * `here`: "round here"). A figure of the globe or a hemisphere is no figure of one place, and the
 * globe's mean is no polar figure either; a polar figure is no figure of a hemisphere, the globe or
 * another place (the polar swings are two to four times the global mean, and local change varied
 * widely); nor is one place's figure a hemisphere's or the globe's. The target is a scale whose
 * clause carries a temperature or height figure after it (or "that much", or "which is how much"
 * opening its segment); the source is another scale that:
 *   - states the same figure (or a range holding it) in an earlier segment of the sentence or in one
 *     of the two sentences before ("Global sea level was about 134 m lower, so the shoreline here was
 *     134 m lower as well"); "that much" takes the source's figure as it stands;
 *   - is a polar record or region read as the target by a reading verb between them (lexicon
 *     `reading`, no copula: "The Greenland cores tell us this glen was 20 degrees colder");
 *   - or follows the target's figure after a sameness phrase (cue words `same`: "about 6 °C colder,
 *     the same as the global average").
 * A contrast between them or in the target's segment (cue words `contrast`: "unlike", "twice",
 * "not", "than" before a scale) scales the figure, and passes. Where `scope.regional-record-as-global`
 * flags the same words (a polar figure handed to the globe), its flag stands first in the pack and wins.
 */
import { findPhrases, type PhraseHit } from '../../claims/frames-match.js';
import { termsOf } from '../../nlp/sentence-terms.js';
import { parseQuantities } from '../../quantities/index.js';
import type { ReadSentence } from '../../propositions/index.js';
import type { Cue, DetectInput, DetectorEntry } from './detector.js';
import { figuresAt } from './detect-scope.js';

/** A scale a figure can be true at, widest first. */
type Scale = 'global' | 'hemisphere' | 'polar' | 'place';

/** Which target scales a source scale's figure does not carry to. */
const WRONG_MOVES: Readonly<Record<Scale, readonly Scale[]>> = {
  global: ['polar', 'place'],
  hemisphere: ['place'],
  polar: ['global', 'hemisphere', 'place'],
  // "Temperatures here swung by 9 °C, which is how much the whole Earth cooled": one place's figure is no wider one.
  place: ['global', 'hemisphere'],
};

/** Words after a bare figure that say it is a temperature or a height ("6 C", "twenty degrees", "134 m"). */
const FIGURE_UNITS = new Set(['degrees', 'degree', '°c', '°f', 'c', 'f', 'k', 'celsius', 'fahrenheit', 'kelvin', 'm', 'metres', 'meters', 'metre', 'meter', 'feet', 'ft', 'foot']);
/** Dimensions of the figures this check compares. */
const DIMENSIONS = new Set(['temperature-change', 'temperature', 'length']);
/** Copulas, which the lexicon's `reading` words hold but which read nothing as anything. */
const COPULAS = new Set(['is', 'are', 'was', 'were', 'be', 'been']);

/** A figure of a sentence: its value and the index of its first word. */
interface Figure {
  value: number;
  at: number;
}

/** The temperature and height figures of `s` (a unit word within two words, or a parsed quantity of those dimensions). */
function scaleFigures(s: ReadSentence): Figure[] {
  const quantities = parseQuantities(s.text);
  return figuresAt(s, 0, s.words.length).filter(({ at }) => {
    const start = s.words[at]?.start ?? -1;
    const quantity = quantities.find((q) => q.start <= start && start < q.end && q.dimension !== 'number');
    if (quantity !== undefined) return DIMENSIONS.has(quantity.dimension);
    const after = s.words.slice(at + 1, at + 3).map((w) => w.text.replace(/^-/u, ''));
    // "a six-degree chill": the unit joined to its figure by a hyphen.
    const joined = /-(?:degrees?|metres?|meters?|feet|foot)$/u.test(s.words[at]?.text ?? '');
    return joined || after.some((w) => FIGURE_UNITS.has(w));
  });
}

/** The scale hits of a sentence read by the lexicon (the globe, a hemisphere, a polar region or core). */
function lexiconScales(s: ReadSentence): { scale: Scale; first: number; last: number }[] {
  const out: { scale: Scale; first: number; last: number }[] = [];
  for (const h of s.of('regions')) {
    const words = s.words.slice(h.first, h.last + 1).map((w) => w.text);
    if (h.key === 'global') out.push({ scale: 'global', first: h.first, last: h.last });
    else if (words.some((w) => w.startsWith('hemisphere'))) out.push({ scale: 'hemisphere', first: h.first, last: h.last });
    else if (h.key === 'antarctic' || h.key === 'greenland' || h.key === 'polar') out.push({ scale: 'polar', first: h.first, last: h.last });
  }
  for (const h of s.of('entities', 'ice-core')) out.push({ scale: 'polar', first: h.first, last: h.last });
  return out.sort((a, b) => a.first - b.first);
}

/**
 * True when the word at `at` compares: a word of the lexicon's `changes` or `comparatives` ("lower",
 * "colder", "more", "sharper"), else one compromise tags Comparative ("deeper", "chillier").
 */
function comparativeAt(s: ReadSentence, at: number): boolean {
  const word = s.words[at];
  if (word === undefined) return false;
  if (s.inside(at, 'changes') || s.inside(at, 'comparatives')) return true;
  return termsOf(s.text).some((t) => t.start === word.start && t.tags.includes('Comparative'));
}

/** True when `t` equals one of `values` (within 2 %) or lies between two of them named as a range. */
function sameFigure(t: number, source: readonly Figure[]): boolean {
  if (source.some((f) => Math.abs(f.value - t) <= 0.02 * Math.max(Math.abs(f.value), Math.abs(t)))) return true;
  return source.some((f, k) => {
    const next = source[k + 1];
    return next !== undefined && next.at - f.at <= 3 && Math.min(f.value, next.value) <= t && t <= Math.max(f.value, next.value);
  });
}

function detect(input: DetectInput): Cue[] {
  const { index, read } = input;
  const here = read(index);
  if (here === undefined) return [];
  const s = here.s;
  const figures = scaleFigures(s);
  // "that much", "as much", and "which is how much" pointing back: the source's figure as it stands.
  // "that much" measures a change only beside one: a comparative after it ("that much colder") or a
  // change word before it ("jumped that much"); "I remember that much" measures nothing.
  const measures = (k: number) => comparativeAt(s, k + 2) || s.inside(k - 1, 'changes');
  const muchAt = s.words.findIndex((w, k) => ((w.text === 'that' || w.text === 'as') && s.words[k + 1]?.text === 'much' && measures(k)) || (w.text === 'how' && s.words[k + 1]?.text === 'much' && COPULAS.has(s.words[k - 1]?.text ?? '')));
  if (figures.length === 0 && muchAt < 0) return [];
  const scales = lexiconScales(s);
  const before = [read(index - 1), read(index - 2)].flatMap((r) => (r === undefined ? [] : [r.s]));
  const earlierScale = before.some((b) => lexiconScales(b).length > 0);
  const sameOnes = input.mayHold('same') ? findPhrases(input.sentence, input.words('same')) : [];
  if (scales.length === 0 && !earlierScale && sameOnes.length === 0) return [];
  // The places of the sentence (its tokens and compromise's roots are read only now).
  const wordAt = (offset: number) => s.words.findIndex((w) => w.start >= offset);
  const places = placesOf(input, s).map((p) => ({ scale: 'place' as Scale, first: wordAt(p.start), last: Math.max(wordAt(p.start), s.words.findIndex((w) => w.end >= p.end)) }));
  const targets = [...scales, ...places].sort((a, b) => a.first - b.first);
  const contrasts = input.mayHold('contrast') ? findPhrases(input.sentence, input.words('contrast')).map((c) => wordAt(c.start)) : [];
  const thanScale = s.words.flatMap((w, k) => (w.text === 'than' && targets.some((t) => t.first > k && t.first - k <= 3) ? [k] : []));
  const setApart = [...contrasts, ...thanScale];
  // "so", "too", "exactly", "it follows": words that hand a figure on unchanged.
  const carried = input.mayHold('carried') ? findPhrases(input.sentence, input.words('carried')).map((c) => wordAt(c.start)) : [];
  const reading = s.of('reading').filter((h) => !COPULAS.has(s.words[h.first]?.text ?? '') && s.words[h.first]?.text !== 'thermometer' && s.words[h.first]?.text !== 'history');

  for (const target of targets) {
    const segment = s.words[target.first]?.segment;
    // The target's figures follow it in its clause ("The summit would therefore have been about 6 °C colder").
    const clause = s.words[target.first]?.clause;
    const own = figures.filter((f) => s.words[f.at]?.clause === clause && f.at > target.last);
    // "that much" after the target, or "which is how much" opening its segment before it.
    const much = muchAt >= 0 && s.words[muchAt]?.clause === clause && (muchAt > target.last || s.words[muchAt]?.segment === segment);
    if (own.length === 0 && !much) continue;
    // A scale of the target's kind in the same segment is the target itself ("here at Dome C").
    const kind = scales.find((o) => o.scale !== 'place' && ((o.first > target.last && o.first - target.last <= 3) || (o.last < target.first && target.first - o.last <= 2)))?.scale;
    const scale = target.scale === 'place' && kind !== undefined ? kind : target.scale;
    // A contrast between the source and the target, or anywhere after the source ("..., around twice the global change").
    const apart = (from: number) => setApart.some((k) => k >= from);
    const segmentEnd = s.words.findIndex((w, k) => k > target.last && w.clause !== clause);
    const handsOn = (from: number) => carried.some((k) => k >= from && (segmentEnd < 0 || k < segmentEnd));
    const figureEnd = (own[0]?.at ?? muchAt) + 1;
    const opener = ['our', 'my', 'your', 'this', 'these'].includes(s.words[target.first - 1]?.text ?? '') ? target.first - 1 : target.first;
    const cue = { start: s.words[opener]?.start ?? 0, end: s.words[Math.max(figureEnd, target.last)]?.end ?? s.text.length };
    // The source in an earlier segment of this sentence.
    for (const source of targets) {
      if (source === target || source.last >= target.first || !WRONG_MOVES[source.scale].includes(scale)) continue;
      if (apart(source.first)) continue;
      // The source's own figures stand between it and the target ("Globally it was 6 °C colder, so our valley ...").
      const theirs = figures.filter((f) => f.at > source.last && f.at < target.first);
      if (handsOn(source.last + 1) && (own.some((f) => sameFigure(f.value, theirs)) || (much && theirs.length > 0))) return [cue];
      // "The Greenland cores tell us this glen was 20 degrees colder": a record read as the place.
      if (source.scale === 'polar' && scale !== 'global' && reading.some((r) => r.first > source.last && r.last < target.first)) return [cue];
    }
    // "..., the same as the global average": a wider scale after the figure and a sameness phrase.
    for (const same of sameOnes) {
      const k = wordAt(same.start);
      const wider = scales.find((o) => o.first > k && o.first - k <= 5);
      if (k > (own[0]?.at ?? s.words.length) && wider !== undefined && WRONG_MOVES[wider.scale].includes(scale) && !setApart.some((c) => c > target.first && c < k)) {
        return [{ start: cue.start, end: s.words[wider.last]?.end ?? cue.end }];
      }
    }
    // The source in one of the two sentences before.
    if (scales.some((o) => o.first < target.first && o !== target && o.scale !== 'place' && s.words[o.first]?.segment !== segment)) continue;
    if (apart(0) || !handsOn(0)) continue;
    for (const b of before) {
      const theirs = scaleFigures(b);
      const found = lexiconScales(b).some((source) => {
        if (!WRONG_MOVES[source.scale].includes(scale)) return false;
        const segmentFigures = theirs.filter((f) => b.words[f.at]?.segment === b.words[source.first]?.segment || b.words[f.at]?.clause === b.words[source.first]?.clause);
        return own.some((f) => sameFigure(f.value, segmentFigures)) || (much && segmentFigures.length > 0);
      });
      if (found) return [cue];
    }
  }
  return [];
}

/**
 * The places of one sentence: a place noun (cue words `places`) after a near determiner within three
 * words (cue words `near`: "our valley", "this stretch of coast") or right after a capitalised word
 * that does not open the sentence ("the Ardle valley"), and the cue words `here` ("round here").
 */
function placesOf(input: DetectInput, s: ReadSentence): PhraseHit[] {
  if (!input.mayHold('places') && !input.mayHold('here')) return [];
  const sentence = input.sentence;
  const near = findPhrases(sentence, input.words('near'));
  const nouns = findPhrases(sentence, input.words('places')).filter((p) => {
    if (near.some((n) => n.last < p.first && p.first - n.last <= 3)) return true;
    const word = s.words.findIndex((w) => w.start >= p.start);
    const previous = s.words[word - 1];
    const written = previous === undefined ? '' : s.text.slice(previous.start, previous.end);
    return word - 1 > s.opening && /^\p{Lu}\p{Ll}/u.test(written);
  });
  return [...nouns, ...findPhrases(sentence, input.words('here'))];
}

/** `scope.figure-across-scales` for the registry. */
export const figureAcrossScales: DetectorEntry = {
  detect,
  // Every flag falls on a scale the sentence names: a region or an ice core of the lexicon, or a place.
  keys: [['lexicon.regions', 'lexicon.entities.ice-core', 'places', 'here']],
};
