/**
 * The scope checks: a regional record read as the whole planet's, and Antarctic lag figures
 * turned into a global order of events.
 *
 *   `scope.regional-record-as-global`
 *   "The Vostok ice core shows that global temperature swung by about 10 °C."
 *        ^^^^^^ record                 ^^^^^^^^^^^^^^^^^^ flagged
 *   Fires when a sentence names a regional record (an ice core, an Antarctic or Greenland region,
 *   deuterium: lexicon `entities.ice-core`, `regions`), the globe (`regions.global`) and a
 *   temperature, and no contrast (cue words `contrast`: "than", "not", "unlike", "while",
 *   "combined"...) sets them apart; a "than" inside a comparison of two times (`time-comparison`:
 *   "colder than today") is no contrast. A sentence that reads "this/it shows..." takes its record
 *   from the sentence before, and a display of a record ("the blue line", "Graph B": cue words
 *   `display`) stands for the regional record one of the three sentences before showed with a
 *   display of its own (shownRecords). CO2 from Antarctic ice is a global signal: a sentence without a
 *   temperature passes, and so does one where CO2 acts ("the CO2 then warmed the planet"). A record
 *   scaled to the globe passes too: a multiple just before the global words ("1.5-2x the global
 *   mean"), a figure of the globe's own unlike the record's ("swings of ten degrees correspond to a
 *   global change of about six"), or the globe given its own order with CO2 first ("global
 *   temperature trailed CO2").
 *
 *   `scope.antarctic-lag-as-global`
 *   "Globally, temperature rose about 800 years before CO2."
 *                                              ^^^^^^ flagged
 *   Reads the order propositions of the sentence (src/propositions/orders.ts): temperature first,
 *   CO2 after, the temperature's region global, and a lag figure or an Antarctic record named.
 */
import { findPhrases } from '../../claims/frames-match.js';
import { tokenizeSentence } from '../../claims/frames-tokens.js';
import { readsBack } from '../reads-back.js';
import { regionOwnsEntity } from '../../propositions/sentence.js';
import type { ReadSentence } from '../../propositions/index.js';
import type { Cue, DetectInput, DetectorEntry } from './detector.js';
import { isTemperatureFirst, isWarmingSide } from './queries.js';
import { parseQuantities } from '../../quantities/index.js';
import { readNumberWords } from '../../quantities/number-words.js';

const ISOTOPES = /^(?:deuterium|isotope|isotopes|δd|δ18o|d18o)$/u;
const TEMPERATURE_WORDS = /^(?:swing|swings|swung|thermometer|thermometers|degrees?|°c|°f|k|cooler|warmer|colder)$/u;

/** Words that open a segment pointing back at the clause before it ("that's what...", "which is what..."). */
const POINTING_BACK = new Set(['that', 'this', 'which']);

/** Words that open an inference from what comes before ("..., so the whole world..."). */
const INFERENCE = new Set(['so', 'therefore', 'thus', 'hence', 'meaning', 'consequently']);

/** An elliptic clause that repeats the predicate before it for a new subject: "so did", "as did", "did too". */
const ELLIPSIS_OPENERS = new Set(['so', 'as', 'nor', 'neither']);
const ELLIPSIS_AUX = new Set(['did', 'does', 'do', 'was', 'were', 'is', 'are', 'had', 'has', 'have']);
const ELLIPSIS_CLOSERS = new Set(['too', 'also', 'likewise']);

/** Contrast words that, opening a sentence, link it to the one before ("But the core shows..."). */
const CONNECTIVES = new Set(['but', 'yet']);

/** Words that count a multiple without a figure ("many times", "several times the global swing"). */
const MULTIPLE_COUNTS = new Set(['many', 'several', 'few', 'some', 'numerous', 'umpteen']);

/** Words before "local" or "regional" that put the place away from it ("far from local influences"). */
const AWAY_FROM = new Set(['far from', 'free of', 'free from', 'away from', 'immune to', 'shielded from', 'sheltered from']);

function detectRegional(input: DetectInput): Cue[] {
  // The tokens (and with them compromise's roots) are read only once a record, the globe and a
  // temperature are all there: most sentences stop before, and compromise never sees them here.
  const { index, read, words } = input;
  const here = read(index);
  if (here === undefined) return [];
  const s = here.s;
  const recordIn = (r: typeof here | undefined) =>
    r !== undefined && (regionalRecords(r.s).length > 0 || r.s.words.some((w) => /^(?:deuterium|isotope|isotopes)$/u.test(w.text)));
  // "This tells us that the whole Earth was 9 °C colder": the record read may be named one sentence back.
  // "Q13. What does the Vostok record tell us? / It is a direct record of global mean temperature": an
  // answer opening on a pronoun reads the record its question asks about (named in the question, or
  // in the sentence before a question that points back to it: "The GRIP curve swings 20 °C. What does
  // this tell us?").
  const record = recordIn(here) || (readsBack(s.text) && recordIn(read(index - 1))) || (answersOnPronoun(s.text) && askedAbout(index, read, recordIn));
  // A record in one clause and the globe in the next ("At Dome C, ...: for the planet as a whole, ...")
  // set the two side by side; only a record and the globe in one clause equate them.
  const recordClauses = new Set(regionalRecords(s).map((h) => s.words[h.first]?.clause));
  const anaphoric = !recordIn(here) && record;
  const isotopes = s.words.flatMap((w, i) => (ISOTOPES.test(w.text) ? [{ first: i, last: i }] : []));
  // "The blue line is temperature at Dome C. ... The blue line shows how the whole planet's temperature
  // swung": a display that a sentence just before showed a regional record as stands for that record.
  const shown = recordIn(here) ? [] : shownRecords(input, here.s, (j) => recordIn(read(j)));
  const records = [...regionalRecords(s), ...isotopes, ...shown];
  // "…the whole globe warmed by 10 °C, as Greenland's ice records": a closing "as" clause names the
  // record the whole sentence is read from.
  // "Going by Vostok, the planet was 9 °C colder": a record after a read-from phrase (`read-from`) in its
  // segment is where the whole sentence is read from, too. The tokens (and compromise's roots) are
  // read for it only when a record and the globe are both named: most sentences stop before.
  const readFrom = records.length === 0 || s.of('regions', 'global').length === 0 || !input.mayHold('read-from') ? [] : findPhrases(input.sentence, words('read-from')).map((p) => s.words.find((w) => w.start === p.start));
  // A region named outside that segment ("Going by Vostok, Antarctica was 9 °C colder; the globe...")
  // is what the record is read as.
  const readAfter = (r: { first: number }) => readFrom.some((w) => w !== undefined && w.segment === s.words[r.first]?.segment && w.start < (s.words[r.first]?.start ?? 0));
  const readFromOnly = records.some(readAfter) && records.every(readAfter);
  // "..., that's what the Greenland cores show", "which is what Vostok records": a closing segment
  // that points back with a demonstrative and reads the record after naming it does the same.
  // Verbs and nouns that read a record as something ("shows", "tells us", "is a measure of"): the
  // lexicon's `reading` words, every inflection derived (no compromise root needed).
  const reading = new Set(s.of('reading').flatMap((h) => s.words.slice(h.first, h.last + 1)));
  const attributed = readFromOnly || records.some((r) => {
    const segment = s.words.filter((w) => w.segment === s.words[r.first]?.segment);
    const reads = (w: (typeof s.words)[number]) => reading.has(w) && w.text !== 'is' && w.text !== 'was';
    if (segment[0]?.text === 'as' && segment.some(reads)) return true;
    const pointsBack = POINTING_BACK.has(segment[0]?.text ?? '') && (segment[0]?.segment ?? 0) > 0;
    return pointsBack && segment.some((w) => w.text === 'what') && s.words.slice(r.last + 1).some((w) => w.segment === s.words[r.first]?.segment && reads(w));
  });
  // The record must be read as the globe: both in one segment, or a reading verb between them
  // ("the Vostok core shows that global...", "...is a fair measure of how much the whole Earth warmed").
  const readAs = (g: { first: number; last: number }) =>
    records.some((r) => {
      if (s.words[r.first]?.segment === s.words[g.first]?.segment || appositionJoins(s, r, g)) return true;
      const [from, to] = r.first < g.first ? [r.last + 1, g.first] : [g.last + 1, r.first];
      return s.words.slice(from, to).some((w) => reading.has(w));
    });
  // "..., and that's the cooling the whole planet went through", "so the whole world's temperature leapt 10
  // degrees", "the entire globe warmed by those same ten degrees": a segment that names the globe and
  // points back (a demonstrative copula, an inference, "same") to a record's figure before it.
  const before = read(index - 1);
  // The restatement phrases of the sentence, read (with compromise's roots) only where one may stand.
  let restatements: { start: number; end: number }[] | undefined;
  const restates = (segment: number) => {
    if (segment === 0 && s.words[0]?.segment !== 0) return false;
    restatements ??= input.mayHold('restatement') ? findPhrases(input.sentence, words('restatement')) : [];
    // The phrase is the whole segment before the globe's ("In other words, the planet ...") or opens it.
    const opening = s.words.find((w) => w.segment === segment);
    const previous = s.words.filter((w) => w.segment === segment - 1);
    return restatements.some((r) => (opening !== undefined && r.start === opening.start) || (previous.length > 0 && r.start === previous[0]?.start && r.end === previous.at(-1)?.end));
  };
  const carriedOver = (g: { first: number }) => {
    const segment = s.words[g.first]?.segment ?? 0;
    const all = s.words.filter((w) => w.segment === segment);
    const own = /^(?:and|but|yet)$/u.test(all[0]?.text ?? '') ? all.slice(1) : all;
    const opener = own[0]?.text ?? '';
    // "so thats how much the whole planet warmed": the demonstrative copula after an inference word too.
    const body = INFERENCE.has(opener) ? own.slice(1) : own;
    const copula = (body[0]?.text === 'that' || body[0]?.text === 'this') && /^(?:is|was)$/u.test(body[1]?.text ?? '');
    // "...Dome C chart on our website: it's the global temperature record": after a record named earlier
    // in its sentence, "it" stands for that record as "that" does (a sentence of its own may open on the
    // "it" of the weather: "It was 6 °C colder worldwide").
    const pronoun = (body[0]?.text === 'it' && /^(?:is|was)$/u.test(body[1]?.text ?? '')) || /^it['’]s$/u.test(body[0]?.text ?? '');
    const same = own.some((w) => w.text === 'same');
    // "In other words, the whole planet was nine or ten degrees colder": a restatement (cue words
    // `restatement`) just before the globe's segment hands it what was said before, as "so" does.
    const inference = (INFERENCE.has(opener) || restates(segment)) && own.some((w) => /^\d/u.test(w.text) || TEMPERATURE_WORDS.test(w.text));
    // "..., so did the planet", "as did the whole Earth", "and the globe did too": an elliptic clause
    // whose subject is the globe repeats the record's own change for it.
    const elliptic = (ELLIPSIS_OPENERS.has(opener) && ELLIPSIS_AUX.has(own[1]?.text ?? '')) || (ELLIPSIS_AUX.has(own.at(-2)?.text ?? '') && ELLIPSIS_CLOSERS.has(own.at(-1)?.text ?? ''));
    if (records.some((r) => (s.words[r.first]?.segment ?? 0) < segment)) return copula || pronoun || same || inference || elliptic;
    // "Greenland was about 20 degrees colder. So the planet as a whole was roughly 20 degrees
    // colder": an inference that hands the record's own figure, named in the sentence before, to
    // the globe. A figure of the globe's own ("So the globe cooled about 5") scales, and passes.
    const handedOn = inference && before !== undefined && sharesFigure(own, before.s, input.paragraph[index - 1] ?? before.s.text);
    return records.length === 0 && ((copula || same) || handedOn) && recordIn(before);
  };
  // "Earth's changing orbit": a globe that owns an entity is no temperature of the globe.
  // Of the globes read as the record, the one nearest a record is what it is read as ("... was 11 °C lower
  // than now, which is insane the codex calls EPICA Dome C a thermometer for the whole planet").
  const distance = (g: { first: number }) => (records.length === 0 ? 0 : Math.min(...records.map((r) => Math.abs(r.first - g.first))));
  const global = s
    .of('regions', 'global')
    .filter((g) => !regionOwnsEntity(s, g))
    .filter((g) => anaphoric || attributed || carriedOver(g) || ((recordClauses.has(s.words[g.first]?.clause) || shown.some((d) => s.words[d.first]?.clause === s.words[g.first]?.clause)) && readAs(g)) || isotopes.some((w) => s.words[w.first]?.clause === s.words[g.first]?.clause) || (isotopes.length > 0 && readAs(g)))
    .reduce<{ first: number; last: number } | undefined>((best, g) => (best === undefined || distance(g) < distance(best) ? g : best), undefined);
  if (global === undefined) return [];
  // "jumped about 10°C": a figure in a unit of temperature says it, whatever verb goes with it.
  const temperature = s.of('entities', 'temperature').length + s.of('changes', 'warm').length + s.of('changes', 'cool').length > 0 || s.words.some((w) => TEMPERATURE_WORDS.test(w.text)) || parseQuantities(input.sentence.text).some((q) => q.dimension.startsWith('temperature'));
  if (!temperature || !(record || shown.length > 0 || carriedOver(global))) return [];
  // "colder than today" compares two times, not the record with the globe: no contrast.
  const sentence = input.sentence;
  const times = findPhrases(sentence, words('time-comparison'));
  // "than" compares only when a place or a record follows it ("larger than the global mean"); "than it
  // is today", "than before industrialisation" compare two times. "not just Greenland's" widens.
  const places = [...s.of('regions'), ...s.of('entities', 'ice-core'), ...s.of('entities', 'temperature')];
  // Where the record and the globe stand: a contrast sets them apart only in their segments, between
  // them, or in a later segment that names a place of its own ("..., while Antarctica swung twice as
  // far"); "..., so I'd put 9 on the poster, not 6" contrasts two figures, not the record with the globe.
  const segmentOf = (offset: number) => s.words.find((w) => w.start >= offset)?.segment ?? 0;
  const standing = [global, ...records].map((r) => s.words[r.first]?.segment ?? 0);
  const lastStanding = Math.max(...standing);
  const firstWord = Math.min(...[global, ...records].map((r) => r.first));
  const contrast = findPhrases(sentence, words('contrast')).filter((c) => {
    if (times.some((t) => t.first <= c.first && t.last >= c.last)) return false;
    // "isn't": the contraction's "n't" is the phrase "not".
    const written = sentence.text.slice(c.start, c.end).toLowerCase();
    const phrase = /^n['’]t$/u.test(written) ? 'not' : written;
    const at = segmentOf(c.start);
    if (at > lastStanding && !places.some((p) => s.words[p.first]?.segment === at)) return false;
    // "Sorry but the Vostok core shows...": a "but" before anything is named links the sentence to the
    // one before; it sets nothing of this sentence apart.
    const word = s.words.findIndex((w) => w.start >= c.start);
    if (CONNECTIVES.has(phrase) && word < firstWord && !s.things.some((t) => t.first < word)) return false;
    // "global temperature and CO2 moved together", "rose together": two curves moving as one, a
    // co-variation or an order told together, combine no records.
    if (s.of('correlation').some((h) => h.first <= word && word <= h.last)) return false;
    if (here.props.orders.some((o) => o.together && o.start <= c.start && c.end <= o.end)) return false;
    if (s.of('order', 'together').some((t) => t.first === word && s.of('changes').some((m) => m.last === word - 1))) return false;
    const next = s.words.findIndex((w) => w.start >= c.end);
    const previous = s.words.filter((w) => w.end <= c.start).at(-1)?.text;
    // "more than 20 degrees on the Greenland panel": a "than" before a figure bounds the figure; it sets
    // no place against another, whatever place follows the figure.
    if (phrase === 'than') return next >= 0 && figuresIn(s, next, next + 2).length === 0 && places.some((p) => p.first >= next && p.first - next <= 4);
    // "warmer than pre-industrial times", "in glacial times": "times" is a multiple only after a count
    // ("two times", "1.5 times"); after any other word it names an era.
    if (phrase === 'times' && figuresIn(s, word - 1, word).length === 0 && !MULTIPLE_COUNTS.has(previous ?? '')) return false;
    // "so I'd put 9 on the poster not 6": "not" before a figure after the record and the globe
    // corrects a figure; it sets no place apart.
    if (phrase === 'not' && next > Math.max(global.last, ...records.map((r) => r.last)) && figuresIn(s, next, next + 1).length > 0) return false;
    // "Fair enough, but the Greenland cores show the planet...": a "but" before the record and the
    // globe both turns against what came before (another post), not one against the other.
    if (phrase === 'but' && next >= 0 && next <= Math.min(global.first, ...records.map((r) => r.first))) return false;
    // "..., isn't it?": the "not" of a closing tag question before its last word negates nothing.
    if (phrase === 'not' && s.question && next === s.words.length - 1) return false;
    if (phrase === 'not' || phrase === 'only') return !/^(?:just|only|merely|simply)$/u.test(s.words[next]?.text ?? '') && previous !== 'not';
    // "Dome C and WAIS Divide are both Antarctic sites": a "both" joining records of one kind, with no
    // global word in its reach, sets nothing against the globe.
    if (phrase === 'both' && records.some((r) => r.first > word && r.first - word <= 2) && !(global.first > word && global.first - word <= 4)) return false;
    // "doubles as a history of...": serving as, no multiple.
    if (s.words[next]?.text === 'as' && /^doubl/u.test(phrase)) return false;
    // "far from local influences": a place said to be free of the local is no contrast with the globe.
    const lead = s.words.filter((w) => w.end <= c.start).slice(-2).map((w) => w.text).join(' ');
    if (AWAY_FROM.has(lead) || ((phrase === 'local' || phrase === 'regional') && /(?:^| )no$/u.test(lead))) return false;
    // "..., which we will adopt as the benchmark": the future reaches only the segment it stands in.
    if (phrase === 'will' || phrase === 'would') {
      const at = s.words.find((w) => w.start >= c.start)?.segment;
      // "Our site's isotopes will give the global temperature": a record that will be read as the globe
      // (a reading verb just after the future, no CO2 in the segment) is still read as it.
      const readsNext = [...reading].some((w) => w.segment === at && w.start > c.start && s.words.indexOf(w) - word <= 2);
      if (readsNext && records.some((r) => s.words[r.first]?.segment === at) && !s.of('entities', 'co2').some((h) => s.words[h.first]?.segment === at)) return false;
      return at === s.words[global.first]?.segment || records.some((r) => s.words[r.first]?.segment === at);
    }
    return true;
  });
  // "the swing at Vostok understates the global change": the record is compared with the globe, not read as it.
  // A size comparison of the globe with a time ("the Earth was more than 20 °C colder during the ice
  // age", where "more than" bounds the figure) sets no place against the globe.
  if (contrast.length > 0 || here.props.comparisons.some((c) => c.attribute === 'size' && comparesPlaces(c))) return [];
  // "Antarctica swings 1.5-2x the global mean", "Antarctic swings of eight to ten degrees correspond to
  // a global change of five or six": a multiple of the globe's figure, or a figure of the globe's own
  // unlike the record's, scales the record to the globe; it does not read the record as the globe.
  if (scaledToGlobe(s, sentence.text, global)) return [];
  // "the lag is an Antarctic thing and global temperature actually trailed CO2": the globe given the
  // order of its own, CO2 first, sets it against the record; nothing of the record is read as global.
  if (here.props.orders.some((o) => o.region === 'global' && !o.together && o.first === 'co2' && isWarmingSide(o.then))) return [];
  // "Averaged over the whole globe, temperature also rose before CO2, so the lag is not just an
  // Antarctic feature": an order of the globe's own, its record named only to be widened, reads no
  // record as the globe (the direction facts judge the order).
  if (regionalRecords(s).length > 0 && !asSource(s) && isotopes.length === 0 && !anaphoric && shown.length === 0 && here.props.orders.some((o) => o.region === 'global' && !o.together)) return [];
  // "...and the CO2 then warmed the planet": CO2 acting on the globe, not a record read as global.
  if (here.props.causes.some((c) => c.agent === 'co2' && c.polarity === 'asserted')) return [];
  // "global temperature": the temperature word just after the global one is part of the claim.
  const next = s.words.slice(global.last + 1, global.last + 4).findIndex((w) => /^(?:temperatures?|climate|average|mean|warming|cooling)$/u.test(w.text));
  const last = next < 0 ? global.last : global.last + 1 + next;
  return [{ start: s.words[global.first]?.start ?? 0, end: s.words[last]?.end ?? 0 }];
}

/** Words that open an apposition after a comma ("Dome Fuji, a single spot on the plateau, ..."). */
const APPOSITION_OPENERS = new Set(['the', 'a', 'an']);

/**
 * Record `r` and global words `g` are one reading across an apposition: the record ends its segment
 * (within two words: "The Dome Fuji core"), the next segment, in the same clause, opens on an article,
 * and the globe stands in the segment after it, which resumes the record's clause ("Dome Fuji, a single
 * spot on the East Antarctic plateau, effectively hands us the global mean temperature"). A segment
 * opening on a link ("so", "but", "and", "that") is a clause of its own, no resumption. (The globe
 * inside the apposition itself, "Vostok, the closest thing to a global thermometer, ...", is left
 * alone: the validation split's false flags rose with it.)
 */
function appositionJoins(s: ReadSentence, r: { first: number; last: number }, g: { first: number }): boolean {
  const at = s.words[r.first];
  const there = s.words[g.first];
  if (at === undefined || there === undefined || at.clause !== there.clause || there.segment !== at.segment + 2) return false;
  const lastOf = (k: number) => s.words.findLastIndex((w) => w.segment === k);
  const firstOf = (k: number) => s.words.find((w) => w.segment === k);
  if (lastOf(at.segment) - r.last > 2 || !APPOSITION_OPENERS.has(firstOf(at.segment + 1)?.text ?? '')) return false;
  const resumed = firstOf(at.segment + 2);
  return resumed !== undefined && resumed.clause === at.clause && !INFERENCE.has(resumed.text) && !CONNECTIVES.has(resumed.text) && !POINTING_BACK.has(resumed.text) && resumed.text !== 'and';
}

/** An answer's opening: an item label ("A16.", "Answer:", "*A:") and then a pronoun standing for what was asked about. */
const ANSWER_PRONOUN = /^\W*(?:\p{L}{1,8}\d{0,3}[.:)]\W*)?(?:it|this|that|these|those|they)(?![\p{L}])/iu;

/** True when `text` opens, past an answer's label, on a pronoun ("It shows...", "*Answer: It is...*"). */
function answersOnPronoun(text: string): boolean {
  return ANSWER_PRONOUN.test(text);
}

/**
 * True when the sentence before sentence `index` is a question about a record (`recordIn`): one that
 * names it, or that points back to the sentence before it ("What does this tell us?") which does.
 */
function askedAbout(index: number, read: DetectInput['read'], recordIn: (r: ReturnType<DetectInput['read']>) => boolean): boolean {
  const question = questionBefore(index, read);
  if (question === undefined) return false;
  if (recordIn(question.reading)) return true;
  const pointsBack = question.s.words.some((w) => POINTING_BACK.has(w.text) || w.text === 'it');
  return pointsBack && recordIn(read(question.at - 1));
}

/** An item label read as a sentence of its own ("A16.", "Q3)"): one word of letters and digits. */
const ITEM_LABEL = /^\W*\p{L}{0,8}\d{1,3}[.:)]?\W*$/u;

/**
 * The question sentence `index` answers: the sentence before it when that is a question, past an item
 * label of the answer's own ("Q16. How much colder ...? A16. About 20 °C ..."). `at` is its index.
 */
function questionBefore(index: number, read: DetectInput['read']): { s: ReadSentence; reading: ReturnType<DetectInput['read']>; at: number } | undefined {
  let at = index - 1;
  if (ITEM_LABEL.test(read(at)?.s.text ?? '')) at -= 1;
  const reading = read(at);
  return reading !== undefined && reading.s.question ? { s: reading.s, reading, at } : undefined;
}

/**
 * The ice cores and polar regions a sentence names, but not the word of an event's name ("the
 * Antarctic Cold Reversal" is a time, not a record of Antarctica).
 */
function regionalRecords(s: ReadSentence): { first: number; last: number }[] {
  const periods = s.of('periods');
  return [...s.of('entities', 'ice-core'), ...s.of('regions', 'antarctic'), ...s.of('regions', 'greenland')].filter((h) => !periods.some((p) => p.first <= h.first && h.last <= p.last));
}

/** Determiners and possessives that make a display noun a particular one ("the blue line", "that curve", "our graph"). */
const DISPLAY_DETERMINERS = new Set(['the', 'this', 'that', 'these', 'those', 'our', 'its', 'their', 'each']);

/** How many sentences back a display may have been tied to a regional record. */
const DISPLAY_REACH = 3;

/**
 * The displays of a record in sentence `s` (cue words `display`: "the blue line", "that curve", "Graph B",
 * "the temperature column in Table 1") that stand for a regional record: one of the `DISPLAY_REACH`
 * sentences before names a regional record and a display of its own ("The blue line is temperature at
 * Dome C."), so the passage has shown that record as a display. A display noun must be a particular one:
 * a determiner within two words before it, or a label after it ("Graph B", "Figure 2"). `recordAt(j)`
 * tells whether sentence j of the paragraph names a regional record.
 */
function shownRecords(input: DetectInput, s: ReadSentence, recordAt: (j: number) => boolean): { first: number; last: number }[] {
  const { index, paragraph, words } = input;
  if (s.of('regions', 'global').length === 0 || !input.mayHold('display')) return [];
  const displays = words('display');
  const tied = Array.from({ length: DISPLAY_REACH }, (_, k) => index - 1 - k).some(
    (j) => j >= 0 && paragraph[j] !== undefined && recordAt(j) && findPhrases(tokenizeSentence(paragraph[j] as string, [], null), displays).length > 0,
  );
  if (!tied) return [];
  return findPhrases(input.sentence, displays).flatMap((p) => {
    const first = s.words.findIndex((w) => w.start >= p.start);
    const last = s.words.findIndex((w) => w.end >= p.end);
    if (first < 0 || last < first) return [];
    const particular = [s.words[first - 1], s.words[first - 2]].some((w) => w !== undefined && DISPLAY_DETERMINERS.has(w.text)) || /^(?:[a-z]|\d+)$/u.test(s.words[last + 1]?.text ?? '');
    return particular ? [{ first, last }] : [];
  });
}

/** The regions and records a size comparison may set against the globe. */
const PLACES = new Set(['antarctic', 'greenland', 'polar', 'tropics', 'south', 'north', 'ice-core']);

/** A comparison between two places (a record's region and the globe), not of a place with a time. */
function comparesPlaces(c: { a: string; b: string }): boolean {
  return PLACES.has(c.a) || PLACES.has(c.b);
}

/**
 * A figure of `own` (words of the sentence being read) is also one of sentence `before` (whose text is
 * `text`), or lies inside a range of temperatures it states ("swinging by 8 to 10 °C. So the planet
 * ... about 9 °C colder": the middle of the record's own range).
 */
function sharesFigure(own: readonly { text: string }[], before: ReadSentence, text: string): boolean {
  const here = figuresIn({ words: own }, 0, own.length).filter((v) => v !== 1);
  const there = figuresIn(before, 0, before.words.length);
  if (here.some((v) => there.includes(v))) return true;
  const ranges = parseQuantities(text).filter((q) => q.dimension.startsWith('temperature') && q.high > q.low);
  return here.some((v) => ranges.some((q) => q.low <= v && v <= q.high));
}

/** The figures of words `from` to `to` (exclusive) of `s`: digits and numbers in words, each as its value. */
function figuresIn(s: { words: readonly { text: string }[] }, from: number, to: number): number[] {
  return figuresAt(s, from, to).map((f) => f.value);
}

/** figuresIn's figures, each with the index of its first word (detect-scales.ts reads them too). */
export function figuresAt(s: { words: readonly { text: string }[] }, from: number, to: number): { value: number; at: number }[] {
  const out: { value: number; at: number }[] = [];
  for (let i = Math.max(0, from); i < Math.min(to, s.words.length); i++) {
    const text = s.words[i]?.text ?? '';
    const digits = /^\d[\d,]*(?:\.\d+)?/u.exec(text);
    if (digits !== null) {
      out.push({ value: Number(digits[0].replace(/,/gu, '')), at: i });
      continue;
    }
    const read = readNumberWords(s.words.slice(i, to).map((w) => w.text));
    // "from it one may fairly say": a lone "one" is a pronoun as often as a figure, and counts as none.
    if (read !== undefined && read.used > 0 && !(read.used === 1 && text === 'one')) {
      out.push({ value: read.value, at: i });
      i += read.used - 1;
    }
  }
  return out;
}

/**
 * The record is scaled to the globe, not read as it: a multiple stands just before the global words
 * ("1.5-2x the global mean", "about twice as much as the global mean"), or the globe carries a
 * figure of its own in the words after it, none of whose values the record's figures (between the
 * last record named before the globe and the globe) share ("swings of eight to ten degrees
 * correspond to a global change of roughly five or six"). "Vostok swung 9 °C, and so did global
 * temperature, by 9 °C" shares its figure and is still read as the globe.
 */
function scaledToGlobe(s: ReadSentence, text: string, global: { first: number; last: number }): boolean {
  const at = s.words[global.first]?.start ?? 0;
  const multiple = parseQuantities(text).some((q) => q.dimension === 'ratio' && q.end <= at && s.words.filter((w) => w.start >= q.end && w.end <= at).length <= 4);
  if (multiple) return true;
  const records = regionalRecords(s).filter((r) => r.last < global.first);
  if (records.length === 0) return false;
  const fromRecord = Math.max(...records.map((r) => r.last + 1));
  // Only temperatures scale: "the stack funded in 2023", "the graph in episode 2", "its thermometer for
  // 420,000 years" name a year, a label and a span, none of them the record's swing.
  const quantities = parseQuantities(text);
  const own = temperatureFigures(s, quantities, fromRecord, global.first, true);
  const clause = s.words[global.first]?.clause;
  let end = global.last + 1;
  while (end < s.words.length && end <= global.last + 8 && s.words[end]?.clause === clause) end++;
  const theirs = temperatureFigures(s, quantities, global.last + 1, end, false);
  return own.length > 0 && theirs.length > 0 && own.every((v) => !theirs.includes(v));
}

/** Words that give a bare figure before them the unit of a temperature ("eight to ten degrees"). */
const DEGREE_WORDS = /^(?:degrees?|°c|°f|c|f|k|celsius|fahrenheit|kelvin)$/u;

/**
 * The figures of words `from` to `to` of `s` that may be temperatures: none read as a quantity of
 * another dimension (a year, a span, a concentration); a bare one, when `unitNeeded`, only with a
 * degree word within three words after it ("eight to ten degrees"), else as it stands ("a global
 * change of about six").
 */
function temperatureFigures(s: ReadSentence, quantities: readonly { start: number; end: number; dimension: string }[], from: number, to: number, unitNeeded: boolean): number[] {
  return figuresAt(s, from, to).flatMap(({ value, at }) => {
    const start = s.words[at]?.start ?? -1;
    // A bare number ("9 degrees" read without its unit) is judged by the words after it.
    const quantity = quantities.find((q) => q.start <= start && start < q.end && q.dimension !== 'number');
    if (quantity !== undefined) return quantity.dimension.startsWith('temperature') ? [value] : [];
    if (!unitNeeded) return [value];
    return s.words.slice(at + 1, at + 4).some((w) => DEGREE_WORDS.test(w.text)) ? [value] : [];
  });
}

/**
 * An order with temperature first and CO2 after, said of the globe, that carries a lag figure or
 * names an Antarctic record: the Antarctic lag read as a global order. An order whose temperature
 * has its own region ("Antarctic temperature rose centuries before CO2") is regional, and passes.
 */
function detectLag({ index, read }: DetectInput): Cue[] {
  const here = read(index);
  // The lag read as global: a record named, or the lag's own figure ("about 800 years", "600 to 800
  // years": a number of years, as the Antarctic studies give it). A global order with no record and
  // no figure ("several centuries before") is the direction fact global-co2-ahead-of-warming; so is
  // one whose record is named only to be widened ("..., so the lag is not just an Antarctic feature")
  // or that opens on an expletive "it" ("It is quite true that the globe warmed first"), which
  // reads no record of the sentence before.
  const sourced = here !== undefined && (asSource(here.s) || (readsRecordBefore(here.s) && asSource(read(index - 1)?.s)));
  const order = here?.props.orders.find((o) => isTemperatureFirst(o) && o.region === 'global' && ((o.recordNamed && sourced) || (here !== undefined && countedSpan(here.s, o.start))));
  if (here === undefined || order === undefined) return [];
  // "about 800 years before": the lag figure just before the order word is part of the claim.
  const at = here.s.words.findIndex((w) => w.start === order.start);
  const lead = here.s.words.slice(Math.max(0, at - 3), at);
  const figure = lead.findIndex((w) => /^(?:\d[\d,.]*|years?|centur(?:y|ies)|millenni(?:um|a)|decades?|few|several|hundreds?)$/u.test(w.text));
  const start = figure < 0 ? order.start : (lead[figure]?.start ?? order.start);
  return [{ start, end: order.end }];
}

/** Words after "not" that widen what follows ("not just an Antarctic feature", "not only Antarctica"). */
const WIDENERS = new Set(['just', 'only', 'merely', 'simply', 'solely', 'purely']);

/**
 * A record or Antarctic region of `s` that the sentence may be read from: one not named only to be
 * widened ("not just an Antarctic feature", "not only Antarctica": the claim is the globe's own) and
 * not the word of an event's name.
 */
function asSource(s: ReadSentence | undefined): boolean {
  if (s === undefined) return false;
  return regionalRecords(s).some((r) => {
    for (let k = Math.max(0, r.first - 4); k < r.first - 1; k++) {
      if (s.words[k]?.text === 'not' && WIDENERS.has(s.words[k + 1]?.text ?? '')) return false;
    }
    return true;
  });
}

/** Copulas and verbs of seeming after an expletive "it" ("It is true that", "It seems that"). */
const EXPLETIVE_VERBS = new Set(['is', 'was', "it's", 'seems', 'seemed', 'appears', 'appeared', 'turns', 'turned']);

/**
 * The sentence opens on a word that reads the record named before it ("It shows...", "This means..."),
 * as src/propositions/orders.ts reads it, but not on an expletive "it" ("It is also true that ...",
 * "It seems that ...": a copula or a verb of seeming and then "that" within a few words).
 */
function readsRecordBefore(s: ReadSentence): boolean {
  const first = s.words[s.opening];
  if (first === undefined || !['it', 'this', 'that', 'these', 'those', 'they', 'here'].includes(first.text)) return false;
  if (first.text !== 'it' || !EXPLETIVE_VERBS.has(s.words[s.opening + 1]?.text ?? '')) return true;
  return !s.words.slice(s.opening + 2, s.opening + 7).some((w) => w.text === 'that');
}

const SPAN_UNITS = /^(?:years?|centur(?:y|ies)|millenni(?:um|a)|decades?|kyr)$/u;
const COUNTS = /^(?:\d[\d,.]*|one|two|three|four|five|six|seven|eight|nine|ten)$/u;

/** A span counted in numbers ("about 800 years", "600 to 800 years") in the clause of the order at `offset`. */
function countedSpan(s: ReadSentence, offset: number): boolean {
  const clause = s.words.find((w) => w.start >= offset)?.clause;
  return s.words.some((w, j) => w.clause === clause && SPAN_UNITS.test(w.text) && [s.words[j - 1], s.words[j - 2]].some((x) => x !== undefined && COUNTS.test(x.text)));
}

/**
 * A regional order of events carried over to the globe: a global region in a segment that refers
 * back to an order (cue words `carried-order`: "the same sequence", "that is the order"), or says
 * the globe went first itself, beside a temperature-first order read without the globe (earlier in
 * the sentence, or in the sentence before), while an ice core or a polar region is named nearby.
 *
 *   "Because Antarctic ice warms a few centuries ahead of CO2, the same sequence holds for the planet."
 *                                                              ^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^ flagged
 */
function detectCarriedOrder(input: DetectInput): Cue[] {
  // The sentence's tokens (compromise roots) are read only past the cheap guards: this detector has
  // no prefilter keys, so it sees every sentence.
  const { index, read, words } = input;
  const here = read(index);
  if (here === undefined) return [];
  const s = here.s;
  const globals = s.of('regions', 'global');
  if (globals.length === 0) return [];
  const segmentOf = (offset: number) => s.words.find((w) => w.start >= offset)?.segment;
  const globalSegments = new Set(globals.map((g) => s.words[g.first]?.segment));
  // An order is the globe's only when the global word stands in its own segment.
  const ordersOf = (r: typeof here | undefined) => (r?.props.orders ?? []).filter(isTemperatureFirst);
  const localHere = ordersOf(here).filter((o) => !globalSegments.has(segmentOf(o.start)));
  const localBefore = ordersOf(read(index - 1)).filter((o) => o.region !== 'global');
  const recordNear = [here, read(index - 1), read(index - 2)].some(
    (r) => r !== undefined && r.s.of('entities', 'ice-core').length + r.s.of('regions', 'antarctic').length + r.s.of('regions', 'greenland').length > 0,
  );
  if (!recordNear || localHere.length + localBefore.length === 0) return [];
  const first = localHere[0]?.start ?? -1;
  // "..., the study shows that the entire planet warmed first": the globe's own order after a local one.
  const carried = ordersOf(here).find((o) => o.start > first && globalSegments.has(segmentOf(o.start)) && localHere.length > 0);
  if (carried !== undefined) return [{ start: carried.start, end: carried.end }];
  // "that's the order the whole planet went through", "the same sequence holds for the planet".
  // No phrase of `carried-order` possible, no flag: the tokens (compromise's roots) are not read.
  if (!input.mayHold('carried-order')) return [];
  const sentence = input.sentence;
  const refs = findPhrases(sentence, words('carried-order'));
  // "For the planet the order was the reverse": an order set against the one before carries nothing over.
  const turned = findPhrases(sentence, words('reversed'));
  for (const g of globals) {
    const clause = s.words[g.first]?.clause;
    if (turned.some((t) => s.words.find((w) => w.start >= t.start)?.clause === clause)) continue;
    const ref = refs.find((r) => segmentOf(r.start) === s.words[g.first]?.segment && r.start > first);
    if (ref !== undefined) return [{ start: Math.min(ref.start, s.words[g.first]?.start ?? ref.start), end: Math.max(ref.end, s.words[g.last]?.end ?? ref.end) }];
  }
  return [];
}

/**
 * A question about the whole planet's temperature answered from a regional record: the answer names
 * no globe of its own (its subject is the question's) but a record and one temperature figure, with
 * no contrast.
 *
 *   "How much colder was the whole planet at the glacial maximum? About 20 °C, straight from the GISP2 core."
 *                                                                  ^^^^^ flagged
 * A question that names a record itself ("How much colder was Greenland?") is answered for that record.
 */
function detectAnsweredFromRecord(input: DetectInput): Cue[] {
  const { index, read, words } = input;
  const here = read(index);
  const question = questionBefore(index, read);
  if (here === undefined || question === undefined || here.s.question) return [];
  const s = here.s;
  if (s.of('regions', 'global').length > 0 || regionalRecords(s).length === 0) return [];
  const q = question.s;
  if (q.of('regions', 'global').length === 0 || regionalRecords(q).length > 0) return [];
  const asks = q.of('entities', 'temperature').length + q.of('changes', 'warm').length + q.of('changes', 'cool').length > 0 || q.words.some((w) => TEMPERATURE_WORDS.test(w.text));
  const figures = parseQuantities(s.text).filter((f) => f.dimension.startsWith('temperature'));
  if (!asks || figures.length !== 1) return [];
  const sentence = input.sentence;
  const times = findPhrases(sentence, words('time-comparison'));
  const contrast = findPhrases(sentence, words('contrast')).filter((c) => !times.some((t) => t.first <= c.first && t.last >= c.last));
  if (contrast.length > 0) return [];
  const figure = figures[0] as (typeof figures)[number];
  return [{ start: figure.start, end: figure.end }];
}

/** `scope.regional-record-as-global` for the registry. */
export const regionalRecordAsGlobal: DetectorEntry = {
  detect: (input) => {
    const found = detectRegional(input);
    return found.length > 0 ? found : detectAnsweredFromRecord(input);
  },
  keys: [],
};

/** `scope.antarctic-lag-as-global` for the registry. */
export const antarcticLagAsGlobal: DetectorEntry = {
  detect: (input) => {
    const lag = detectLag(input);
    return lag.length > 0 ? lag : detectCarriedOrder(input);
  },
  keys: [],
};
