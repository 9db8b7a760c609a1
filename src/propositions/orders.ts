/**
 * Order propositions: which of two things changed first, where, and by how much.
 *
 *   "CO2 rose about 800 years after Antarctic temperature."   first temperature (antarctic), then co2, amount
 *   "Worldwide, temperature led and carbon dioxide followed."  first temperature (global), then co2
 *   "The lag is the sceptics' favourite argument."              implicit: temperature first, co2 then
 */
import type { LexHit } from './lexicon.js';
import { kindOf, subjectBefore, subjectOf, thingAfter, thingBefore } from './resolve.js';
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
    const keys = new Set(s.of('regions').map((r) => r.key));
    const sentenceRegion = keys.size === 1 ? [...keys][0] : undefined;
    // "the lag" is by convention the Antarctic lag: a region elsewhere in the sentence is not its own.
    const region = order.implicit ? undefined : (order.region ?? s.of('regions').find((r) => s.words[r.first]?.clause === clause)?.key ?? sentenceRegion);
    // "CO2 merely followed the temperature": the follower cast as nothing more.
    const dismissive = isDismissed(s, h.first);
    orders.push({ ...order, recordNamed, dismissive, amount: inClause.some((w) => DURATIONS.test(w)), ...(region === undefined ? {} : { region }) });
  }
  return orders;
}

function orderAt(s: ReadSentence, h: LexHit, previous?: ReadSentence): Omit<Order, 'recordNamed' | 'amount' | 'dismissive'> | undefined {
  // The lexicon's own form of the phrase: "tags along" is "tag along", "trailed" is "trail".
  const phrase = h.base ?? s.words.slice(h.first, h.last + 1).map((w) => w.text).join(' ');
  const kind = (t: Thing | undefined) => kindOf(s, t, previous);
  const span = { start: s.words[h.first]?.start ?? 0, end: s.words[h.last]?.end ?? 0 };
  const isNoun = /^(?:lag|lags|delay|delays)$/u.test(phrase) && NOUN_BEFORE.has(s.words[h.first - 1]?.text ?? '');
  const after = s.words[h.last + 1]?.text;
  const ofThing = after === 'of' && s.things.some((t) => t.first === h.last + 2 || t.first === h.last + 3);
  if (isNoun && after !== 'behind' && !ofThing) {
    return { kind: 'order', first: 'temperature', then: 'co2', together: false, implicit: true, ...span };
  }
  // "the late Pleistocene", "the late 1990s": "late" before its noun names a time, no order.
  if (phrase === 'late' && s.words[h.last + 1]?.segment === s.words[h.last]?.segment && !AFTER_LATE.has(after ?? '')) return undefined;
  let a: Thing | undefined = subjectBefore(s, h.first) ?? subjectOf(s, h.first) ?? thingBefore(s, h.first, 'clause');
  let b: Thing | undefined;
  if (ABSOLUTE.test(phrase)) {
    a ??= thingAfter(s, h.last, 4);
    const first = kind(a);
    const other = first === undefined ? undefined : COUNTERPART[first];
    if (first === undefined || other === undefined) return undefined;
    b = undefined;
    return withRelation(h.key, first, other, s, a, span);
  }
  b = thingAfter(s, h.last, 6);
  // "CO2 lagged, so...": an order verb with no object sets its subject against the other one (a
  // preposition with no object, "colder than before industrialisation", names a time, not an order).
  if (a !== undefined && b === undefined && h.key !== 'together' && ORDER_VERB.test(phrase)) {
    const first = kind(a);
    const other = first === undefined ? undefined : COUNTERPART[first];
    return first === undefined || other === undefined ? undefined : withRelation(h.key, first, other, s, a, span);
  }
  if (a === undefined && b !== undefined) {
    // "After the warming began, CO2 rose": the main clause follows the comma.
    a = s.things.find((t) => t.first > b!.last && s.words[t.first]?.segment !== s.words[b!.first]?.segment);
  }
  let key = h.key;
  if (after === 'by' && key !== 'together') key = key === 'before' ? 'after' : 'before';
  const first = kind(a);
  const second = kind(b);
  if (first === undefined || second === undefined || first === second) return undefined;
  return withRelation(key, first, second, s, a?.region !== undefined ? a : b, span);
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
