/**
 * Order propositions: which of two things changed first, where, and by how much.
 *
 *   "CO2 rose about 800 years after Antarctic temperature."   first temperature (antarctic), then co2, amount
 *   "Worldwide, temperature led and carbon dioxide followed."  first temperature (global), then co2
 *   "The lag is the sceptics' favourite argument."              implicit: temperature first, co2 then
 */
import type { LexHit } from './lexicon.js';
import { inPhrase, kindOf, PREPOSITIONS, subjectBefore, subjectOf, thingAfter } from './resolve.js';
import { denialsBefore, type ReadSentence, type Thing } from './sentence.js';
import type { Order } from './types.js';

/** Order words that name no second thing: the other one is understood ("CO2 came second"). */
const ABSOLUTE = /^(?:first|came first|went first|start first|rise first|move first|earlier|beforehand|ahead|second|come second|later|late|latecomer|afterwards|only later|delay|delayed|trailing|laggard|head start|catch up|tag along|in its wake)$/u;
const NOUN_BEFORE = new Set(['the', 'a', 'an', 'this', 'that', 'its', 'co2', 'co₂', 'famous', 'observed', 'supposed', 'long', 'short', 'same', 'such', 'any', 'no']);
const DURATIONS = /^(?:years?|centur(?:y|ies)|millenni(?:um|a)|decades?|kyr|hundreds?|thousands?)$/u;
/** Order words that are verbs: with no object they still set their subject against the other thing. */
/** Function words that may follow "late" used as an order ("late in the thaw", "late to the party", "late, so"). */
const AFTER_LATE = new Set(['in', 'to', 'into', 'on', 'at', 'for', 'by', 'and', 'or', 'but', 'so', 'then', 'relative', 'compared', 'with', 'after', 'behind', 'again', 'every', 'each', 'each time', 'every time', 'too', 'anyway', 'as']);
const ORDER_VERB = /^(?:lag|lags|lagged|lagging|follow|follows|followed|following|trail|trails|trailed|trailing|lead|leads|led|leading|precede[sd]?|preceding|lag behind|lagged behind)$/u;
const COUNTERPART: Record<string, string> = { co2: 'temperature', temperature: 'co2' };

/** The orders one sentence states (a denied order states none). */
export function readOrders(s: ReadSentence, previous?: ReadSentence): Order[] {
  const orders: Order[] = [];
  const names = (r: ReadSentence | undefined) => r !== undefined && (r.of('entities', 'ice-core').length > 0 || r.of('regions', 'antarctic').length > 0);
  // "The Vostok core ... It shows the planet warmed first": the record may be named one sentence back.
  // Only a sentence that reads that record ("It shows...", "This means...") takes it from there.
  const readsBack = ['it', 'this', 'that', 'these', 'those', 'they', 'here'].includes(s.words[s.opening]?.text ?? '');
  const recordNamed = names(s) || (readsBack && names(previous));
  // "said Professor X, who led the study": a speaker's part in the work orders no events.
  const speakers = s.of('stance', 'insider');
  for (const h of s.of('order')) {
    if (denialsBefore(s, h.first, 4) % 2 === 1 || speakers.some((p) => p.first <= h.first && h.last <= p.last)) continue;
    const order = orderAt(s, h, previous);
    if (order === undefined) continue;
    const clause = s.words[h.first]?.clause;
    const inClause = s.words.filter((w) => w.clause === clause).map((w) => w.text);
    // "the lag" is by convention the Antarctic lag: a region elsewhere in the sentence is not its own.
    const region = order.implicit ? undefined : (order.region ?? regionOf(s, h));
    // "CO2 merely followed the temperature": the follower cast as nothing more.
    const dismissive = isDismissed(s, h.first);
    orders.push({ ...order, recordNamed, dismissive, amount: inClause.some((w) => DURATIONS.test(w)), ...(region === undefined ? {} : { region }) });
  }
  return orders;
}

function orderAt(s: ReadSentence, h: LexHit, previous?: ReadSentence): Omit<Order, 'recordNamed' | 'amount' | 'dismissive'> | undefined {
  // The lexicon's own form of the phrase: "tags along" is "tag along", "trailed" is "trail".
  const phrase = h.base ?? s.words.slice(h.first, h.last + 1).map((w) => w.text).join(' ');
  const kind = (t: Thing | undefined) => kindOf(s, t, previous, undefined, namesRecord);
  const span = { start: s.words[h.first]?.start ?? 0, end: s.words[h.last]?.end ?? 0 };
  // "the Antarctic head start": a noun of sequence in two words is a noun wherever it stands.
  const isNoun = (h.first === h.last && SEQUENCE_NOUNS.has(s.words[h.first]?.text ?? '') && isNounAt(s, h.first)) || phrase === 'head start';
  const after = s.words[h.last + 1]?.text;
  const ofThing = after === 'of' && s.things.some((t) => t.first === h.last + 2 || t.first === h.last + 3);
  if (isNoun && after !== 'behind' && !ofThing) {
    // "Antarctica had a lead of 300 years": a lead is its subject's when only grammar words stand
    // between; "any lead or lag" names no order until its events are named.
    if (s.words[h.first]?.text.startsWith('lead') === true || phrase === 'head start') {
      const holder = subjectBefore(s, h.first);
      // "the Antarctic head start", "an Antarctic lead": a region that modifies the noun is its holder.
      const modifier = holder !== undefined && holder.region !== undefined && holder.last === h.first - 1;
      const first = holder === undefined || (namesRecord(s, holder) && !modifier) ? undefined : kind(holder);
      const other = first === undefined ? undefined : COUNTERPART[first];
      return first === undefined || other === undefined ? undefined : withRelation('before', first, other, s, holder, span);
    }
    return { kind: 'order', first: 'temperature', then: 'co2', together: false, implicit: true, ...span };
  }
  // "the late Pleistocene", "the late 1990s": "late" before its noun names a time, no order.
  if (phrase === 'late' && s.words[h.last + 1]?.segment === s.words[h.last]?.segment && !AFTER_LATE.has(after ?? '')) return undefined;
  // "the once-popular estimate", "the second-longest record", "Japan's second core", "later work":
  // an order word inside a compound or before its noun ranks or dates a thing; it orders no events.
  if (isModifier(s, h)) return undefined;
  // "the warm spell that followed", "the Holocene, which came after": an order verb whose subject is a
  // relative pronoun after a period orders that period, not CO2 and temperature.
  if (ordersPeriod(s, h.first)) return undefined;
  const event = (t: Thing | undefined) => (t !== undefined && !namesRecord(s, t) && !compoundModifier(s, t) ? t : undefined);
  // "the global warming that followed": an order verb whose subject is a relative pronoun describes
  // the thing before it, and with no object it names nothing that thing came after.
  const relative = RELATIVES.has(s.words[h.first - 1]?.text ?? '');
  if (relative && thingAfter(s, h.last, 6) === undefined) return undefined;
  const antecedent = relative ? s.things.find((t) => t.last === h.first - 2 && t.kind !== 'pronoun') : undefined;
  let a: Thing | undefined = event(antecedent) ?? event(subjectBefore(s, pastMeasure(s, h.first))) ?? event(subjectOf(s, h.first)) ?? event(elidedSubject(s, h.first)) ?? event(nearestBefore(s, h.first));
  let b: Thing | undefined;
  if (ABSOLUTE.test(phrase)) {
    // "coming second in Antarctica": a thing in a phrase after the order word is where, not what, came second.
    const following = thingAfter(s, h.last, 4);
    a ??= following === undefined || inPhrase(s, following) ? undefined : event(following);
    const first = kind(a);
    const other = first === undefined ? undefined : COUNTERPART[first];
    if (first === undefined || other === undefined) return undefined;
    b = undefined;
    return withRelation(h.key, first, other, s, a, span);
  }
  b = event(thingAfter(s, h.last, 6));
  // "CO2 lagged, so...": an order verb with no object sets its subject against the other one (a
  // preposition with no object, "colder than before industrialisation", names a time, not an order).
  if (a !== undefined && b === undefined && h.key !== 'together' && ORDER_VERB.test(phrase)) {
    const first = kind(a);
    const other = first === undefined ? undefined : COUNTERPART[first];
    return first === undefined || other === undefined ? undefined : withRelation(h.key, first, other, s, a, span);
  }
  if (a === undefined && b !== undefined && (opensSegment(s, h.first) || !DETERMINERS.has(s.words[h.first - 1]?.text ?? ''))) {
    // "After the warming began, CO2 rose": the main clause follows the comma. An order word between
    // an article and its noun is no verb: "A trailing CO2 curve ..., and a feedback adds warming"
    // orders nothing after the comma.
    a = event(s.things.find((t) => t.first > b!.last && s.words[t.first]?.segment !== s.words[b!.first]?.segment));
  }
  let key = h.key;
  if (after === 'by' && key !== 'together') key = key === 'before' ? 'after' : 'before';
  const first = kind(a);
  const second = kind(b);
  if (first === undefined || second === undefined || first === second) return undefined;
  return withRelation(key, first, second, s, a?.region !== undefined ? a : b, span);
}

/**
 * A thing joined by a hyphen to a word that names no thing is a modifier of a compound ("the gas-age
 * issue", "a CO2-free world"): it names no event of an order.
 */
function compoundModifier(s: ReadSentence, t: Thing): boolean {
  const last = s.words[t.last];
  const next = s.words[t.last + 1];
  return last !== undefined && next !== undefined && s.text[last.end] === '-' && next.start === last.end + 1 && !s.things.some((o) => o.first === t.last + 1);
}

/** Relative pronouns that stand as the subject of the clause they open. */
const RELATIVES = new Set(['that', 'which']);

/**
 * The order word at `i` is the verb of a relative clause ("that followed", "which came after") whose
 * antecedent is a period (lexicon `periods` or a period noun of `kinds.period`: "the warm spell", "the
 * Holocene"), a comma between them or none.
 */
function ordersPeriod(s: ReadSentence, i: number): boolean {
  if (!RELATIVES.has(s.words[i - 1]?.text ?? '')) return false;
  return [...s.of('periods'), ...s.of('kinds', 'period')].some((p) => p.last === i - 2);
}

/** Words of a span of time told before an order word ("a few centuries later", "some 800 years after"). */
const MEASURE_WORDS = new Set(['a', 'few', 'several', 'some', 'many', 'about', 'around', 'roughly', 'nearly', 'almost', 'only', 'just', 'good', 'couple', 'of', 'hundred', 'thousand']);

/**
 * Where the subject search for the order word at `i` starts: before a span of time told just before
 * it and before another order phrase it completes ("the temperature only caught up centuries later"
 * is the temperature's order).
 */
function pastMeasure(s: ReadSentence, i: number): number {
  let k = i;
  while (s.words[k - 1]?.segment === s.words[i]?.segment) {
    const w = s.words[k - 1]?.text ?? '';
    if (!(DURATIONS.test(w) || MEASURE_WORDS.has(w) || /^\d[\d,.]*$/u.test(w))) break;
    k -= 1;
  }
  const order = s.of('order').find((o) => o.last === k - 1 && s.words[o.first]?.segment === s.words[i]?.segment);
  return order?.first ?? k;
}

/** Nouns of sequence: "the lag", "a delay", "any lead". */
const SEQUENCE_NOUNS = new Set(['lag', 'lags', 'delay', 'delays', 'lead', 'leads']);
/** Possessives and determiners that make the word after them a noun ("CO2's lag", "Japan's second core"). */
const POSSESSIVE = /^\p{L}[\p{L}\d]*(?:'s|s')$/u;
const CO2_WORDS = new Set(['co2', 'co₂']);
/** Words that join two nouns of sequence ("lead or lag", "leads and lags"). */
const NOUN_JOINS = new Set(['or', 'and', 'nor']);

/**
 * True when the sequence word at `i` is a noun: a determiner or a possessive stands before it, past
 * the modifiers of its noun phrase ("the Antarctic lag", "the once-popular 800-year delay", "that
 * Antarctic lag"), or it is joined to another noun of sequence ("any lead or lag").
 */
function isNounAt(s: ReadSentence, i: number): boolean {
  const segment = s.words[i]?.segment;
  const lead = (s.words[i]?.text ?? '').startsWith('lead');
  for (let k = i - 1; k >= Math.max(0, i - 5) && s.words[k]?.segment === segment; k -= 1) {
    const w = s.words[k]?.text ?? '';
    // "the CO2 lag" is a noun; "CO2 leads" is a verb.
    if ((NOUN_BEFORE.has(w) && !(lead && CO2_WORDS.has(w))) || POSSESSIVE.test(w)) return true;
    if (NOUN_JOINS.has(w) && SEQUENCE_NOUNS.has(s.words[k - 1]?.text ?? '')) return true;
    if (!isNounModifier(s, k)) return false;
  }
  return false;
}

/** A word that may stand inside a noun phrase before its head: a region, a figure, a compound's part. */
function isNounModifier(s: ReadSentence, k: number): boolean {
  const w = s.words[k];
  if (w === undefined) return false;
  const hyphenated = s.text[w.end] === '-' || s.text[w.start - 1] === '-';
  return hyphenated || /\d/u.test(w.text) || s.inside(k, 'regions') || ['famous', 'observed', 'supposed', 'apparent', 'reported', 'estimated', 'popular', 'notorious', 'long', 'short', 'brief', 'small', 'big', 'large'].includes(w.text);
}

/** Articles, demonstratives and possessive pronouns: the word after one is a noun or its modifier. */
const DETERMINERS = new Set(['the', 'a', 'an', 'its', 'their', 'his', 'her', 'our', 'my', 'your', 'this', 'that']);
/** Words that make "first", "second" or "later" a rank when they stand after it: "second to Dome C", "second only to". */
const RANK_AFTER = new Set(['to', 'only', 'among', 'longest', 'largest', 'deepest', 'oldest', 'biggest', 'best', 'most', 'highest', 'lowest']);
/** Order words that an article or a possessive can make an adjective of. */
const ATTRIBUTIVE = new Set(['first', 'second', 'later', 'earlier', 'late']);

/**
 * An order word used as a modifier: joined by a hyphen to the next word ("once-popular", "second-
 * longest"), an ordinal or "later" between a determiner or possessive and a word of its own segment
 * ("the second core", "Japan's second Dome Fuji core", "later work"), or a rank ("second to Dome C",
 * "second among Antarctic cores"). "The first to warm was Antarctica" keeps its order.
 */
function isModifier(s: ReadSentence, h: LexHit): boolean {
  const last = s.words[h.last];
  const next = s.words[h.last + 1];
  if (last === undefined) return false;
  if (s.text[last.end] === '-' && next !== undefined && next.start === last.end + 1) return true;
  const word = s.words.slice(h.first, h.last + 1).map((w) => w.text).join(' ');
  if (!ATTRIBUTIVE.has(word)) return false;
  const nextInSegment = next !== undefined && next.segment === last.segment;
  if (word === 'second' && nextInSegment && RANK_AFTER.has(next.text) && !s.things.some((t) => t.first === h.last + 2 && !namesRecord(s, t))) return true;
  const before = s.words[h.first - 1]?.text ?? '';
  const determined = DETERMINERS.has(before) || POSSESSIVE.test(before);
  return determined && nextInSegment && next.text !== 'to' && !PREPOSITIONS.has(next.text);
}

/**
 * A region named as a place of record, not a temperature that moved: a core's or a site's name
 * ("Dome Fuji", "the Vostok core"), or a region that modifies a record, a core or an order noun
 * ("Antarctic records", "the Antarctic cores", "the Antarctic lag"). A site said to warm or cool
 * ("Vostok warmed first") is its temperature.
 */
function namesRecord(s: ReadSentence, t: Thing): boolean {
  if (t.kind !== 'temperature' || !s.hits.some((h) => h.cls === 'regions' && h.first === t.first && h.last === t.last)) return false;
  const segment = s.words[t.first]?.segment;
  const changed = s.hits.some((h) => h.cls === 'changes' && (h.key === 'warm' || h.key === 'cool') && h.first > t.last && h.first <= t.last + 3 && s.words[h.first]?.segment === segment);
  if (changed) return false;
  const core = s.hits.some((h) => h.cls === 'entities' && h.key === 'ice-core' && h.first <= t.last && h.last >= t.first);
  const modifies = s.hits.some((h) => h.first === t.last + 1 && ((h.cls === 'kinds' && (h.key === 'core' || h.key === 'record')) || (h.cls === 'entities' && h.key === 'ice-core') || h.cls === 'order'));
  return core || modifies;
}

/**
 * ", or a few centuries before it": a clause joined by "or", "and" or "but" that leaves its subject
 * out, or a participle's (", rising centuries after it"), shares the subject of the clause it joins
 * (the first thing of that clause outside a phrase).
 */
function elidedSubject(s: ReadSentence, i: number): Thing | undefined {
  const at = s.words[i];
  if (at === undefined) return undefined;
  const opener = s.words.findIndex((w) => w.segment === at.segment);
  const word = s.words[opener]?.text ?? '';
  // ", rising several centuries after it": a participle opening the segment shares the subject too.
  const participle = word.endsWith('ing') && s.inside(opener, 'changes');
  if (!(['or', 'and', 'but', 'nor'].includes(word) || participle) || s.things.some((t) => t.first > opener && t.last < i)) return undefined;
  return s.things.find((t) => t.last < opener && s.words[t.first]?.clause === at.clause && t.kind !== 'pronoun' && !inPhrase(s, t));
}

/** Words that open a segment setting its thing against the clause's subject ("world temperature, unlike Antarctic temperature, rose..."). */
const SET_AGAINST = new Set(['unlike', 'like', 'not', 'versus', 'vs']);

/** Word `k` stands in a segment of its own, other than word `i`'s, opened by a word that sets its thing against the subject. */
function setAgainst(s: ReadSentence, k: number, i: number): boolean {
  const segment = s.words[k]?.segment;
  const opener = s.words.findIndex((w) => w.segment === segment);
  const lead = s.words.slice(opener, opener + 3).map((w) => w.text);
  return segment !== s.words[i]?.segment && (SET_AGAINST.has(lead[0] ?? '') || SET_AGAINST_PHRASES.has(lead.slice(0, 2).join(' ')) || SET_AGAINST_PHRASES.has(lead.join(' ')));
}

/** Phrases that open a segment setting its thing against the subject ("..., as opposed to Antarctica's, ..."). */
const SET_AGAINST_PHRASES = new Set(['as opposed to', 'in contrast to', 'in contrast with', 'compared with', 'compared to', 'rather than', 'instead of', 'contrary to']);

/** The nearest thing before word `i` in its clause, passing over one set against the subject in a segment of its own. */
function nearestBefore(s: ReadSentence, i: number): Thing | undefined {
  const clause = s.words[i]?.clause;
  return s.things.filter((t) => t.last < i && s.words[t.first]?.clause === clause && !setAgainst(s, t.first, i)).at(-1);
}

/** True when word `i` opens its segment, past at most a degree word ("After", "Long before", "Only once"). */
function opensSegment(s: ReadSentence, i: number): boolean {
  const segment = s.words[i]?.segment;
  const opener = s.words.findIndex((w) => w.segment === segment);
  return opener === i || (opener === i - 1 && ['long', 'shortly', 'soon', 'just', 'only', 'well', 'even', 'right', 'not', 'and', 'but', 'so'].includes(s.words[opener]?.text ?? ''));
}

/**
 * The region an order is set in when neither of its things names one: the nearest region before the
 * order word in its clause ("In Antarctica ..., and for the globe as a whole, temperature followed
 * CO2" is global), else one after it that moves in its own segment ("... and then Antarctica
 * warmed"), else the nearest one before it in the sentence ("For the global average it was the
 * other way round: most of the warming came after CO2"). A region that only stands beside the order
 * ("..., and Antarctica was the exception") sets none.
 */
function regionOf(s: ReadSentence, h: LexHit): string | undefined {
  const clause = s.words[h.first]?.clause;
  // "the global stack, unlike Antarctica, lagged CO2, with the warming coming after CO2": a region
  // set against the subject in an aside of its own is not where the order happened.
  const regions = s.of('regions').filter((r) => !setAgainst(s, r.first, h.first));
  const before = regions.filter((r) => r.last < h.first);
  const inClause = before.filter((r) => s.words[r.first]?.clause === clause).at(-1);
  if (inClause !== undefined) return inClause.key;
  // A region after the order sets it when it moves, names the record read, or stands in the order's own segment.
  const sets = (r: LexHit) => {
    const segment = s.words[r.first]?.segment;
    if (segment === s.words[h.first]?.segment) return true;
    const record = s.hits.some((o) => o.first === r.last + 1 && ((o.cls === 'kinds' && (o.key === 'core' || o.key === 'record')) || (o.cls === 'entities' && o.key === 'ice-core')));
    return record || s.hits.some((o) => (o.cls === 'changes' || o.cls === 'order') && o.first > r.last && s.words[o.first]?.segment === segment);
  };
  const after = regions.filter((r) => r.first > h.last && sets(r));
  return (after.find((r) => s.words[r.first]?.clause === clause) ?? before.at(-1) ?? after[0])?.key;
}

function withRelation(key: string, a: string, b: string, s: ReadSentence, regionThing: Thing | undefined, span: { start: number; end: number }) {
  const [first, then] = key === 'after' ? [b, a] : [a, b];
  const region = regionThing?.region;
  return { kind: 'order' as const, first, then, together: key === 'together', implicit: false, ...span, ...(region === undefined ? {} : { region }) };
}

/**
 * "CO2 merely followed", "the CO2 only ever follows": a restricting word just before the order
 * word casts the later thing as nothing more. "only" restricts the verb only when it stands right
 * after the subject or before "ever"; "CO2 rose only after the warming" restricts a time.
 */
function isDismissed(s: ReadSentence, i: number): boolean {
  const before = s.words.slice(Math.max(0, i - 2), i);
  if (before.some((w) => /^(?:merely|simply|just)$/u.test(w.text))) return s.words[i - 3]?.text !== 'not' && before[0]?.text !== 'not';
  const only = before.findIndex((w) => w.text === 'only');
  if (only < 0) return false;
  const at = i - before.length + only;
  return s.words[at + 1]?.text === 'ever' || s.things.some((t) => t.last === at - 1 && t.kind !== 'pronoun');
}
