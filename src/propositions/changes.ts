/**
 * Signed changes and the relations between them.
 *
 *   "Seawater that warms up takes in more CO2."   water:temperature +1, co2:uptake +1 → relation
 *   "Warmer water holds less CO2."                 water:temperature +1, co2:uptake -1 → relation
 *   "Antarctica cooled during the Younger Dryas."  antarctic:temperature -1 during younger-dryas
 *   "Each extra ppm warms more than the last."     marginal-forcing +1
 */
import type { LexHit } from './lexicon.js';
import { readMarginal } from './marginal.js';
import { echoedNorthernCold } from './seesaw.js';
import { readTransitionChanges } from './transitions.js';
import { kindOf, thingAfter, thingBefore } from './resolve.js';
import { denialsBefore, type ReadSentence, type Thing } from './sentence.js';
import type { Change, Directed, Relation } from './types.js';

const SIZE_DOWN = new Set(['less', 'fewer', 'smaller', 'lower']);
const SIZE_UP = new Set(['more', 'greater', 'larger', 'higher', 'extra']);
/**
 * Words of a quantity phrase between a verb of uptake and the gas ("a smaller share of", "half as much",
 * "more and more of their": "and" joins a repeated comparative).
 */
const QUANTITY_WORDS = new Set(['a', 'an', 'the', 'its', 'their', 'and', 'much', 'many', 'far', 'even', 'still', 'only', 'as', 'of', 'less', 'more', 'fewer', 'smaller', 'larger', 'greater', 'bigger', 'lower', 'higher', 'share', 'amount', 'fraction', 'proportion', 'quantity', 'part', 'portion', 'volume', 'load', 'lot', 'deal', 'bit', 'half', 'twice', 'double', 'times', 'third', 'quarter']);
/** Multiples below one and above one before "as much" ("half as much", "twice as much"). */
const FRACTIONS = new Set(['half', 'third', 'quarter', 'fifth', 'tenth', 'fraction']);
const MULTIPLES = new Set(['twice', 'double', 'triple', 'times']);

/** Every directed thing in the sentence: temperatures, CO2 uptake, amounts. */
export function readDirected(s: ReadSentence, previous?: ReadSentence): Directed[] {
  const out: Directed[] = [];
  const push = (of: string, attribute: Directed['attribute'], dir: 1 | -1, h: LexHit, thing?: Thing) => {
    const first = Math.min(h.first, thing?.first ?? h.first);
    // "absorbed more", "holds less": the size word belongs to the claim.
    const size = attribute === 'uptake' && /^(?:more|less|fewer|extra)$/u.test(s.words[h.last + 1]?.text ?? '') ? 1 : 0;
    const last = Math.max(h.last + size, thing?.last ?? h.last);
    const negated = denialsBefore(s, h.first, 5) % 2 === 1;
    const form = thing !== undefined && thing.first > h.last ? 'state' : 'change';
    out.push({ of, attribute, dir, negated, form, first, last, start: s.words[first]?.start ?? 0, end: s.words[last]?.end ?? 0 });
  };
  for (const h of s.of('changes')) {
    if (h.key === 'warm' || h.key === 'cool') {
      const thing = temperatureHolder(s, h);
      // "Antarctica got hammered by that same cold": with no holder near, the clause's one region holds it.
      const name = thing === undefined ? (clauseRegion(s, h) ?? 'temperature') : nameOf(s, thing, previous);
      // "Antarctica ..., cooling alongside Greenland": the place after a companion word shares the
      // change of the place before it, which holds it.
      const companion = thing !== undefined && thing.first > h.last && COMPANIONS.test(s.words.slice(h.last + 1, thing.first).map((w) => w.text).join(' '));
      // A participle after a comma ("Antarctica shivered, cooling alongside...") is the sentence's.
      const before = companion ? s.things.filter((t) => t.last < h.first).at(-1) : undefined;
      if (before !== undefined && before.kind !== 'pronoun') push(nameOf(s, before, previous), 'temperature', h.key === 'warm' ? 1 : -1, h, before);
      push(name, 'temperature', h.key === 'warm' ? 1 : -1, h, thing);
      // "Antarctica and Greenland cooled", "both poles got colder": a change said of two places is said of each.
      for (const other of coordinatedWith(s, thing)) push(nameOf(s, other, previous), 'temperature', h.key === 'warm' ? 1 : -1, h, other);
      if (name === 'polar' && thing !== undefined && bothPoles(s, thing)) {
        for (const pole of ['antarctic', 'greenland']) push(pole, 'temperature', h.key === 'warm' ? 1 : -1, h, thing);
      }
    } else if (h.key === 'up' || h.key === 'down') {
      // "holds less", "takes in more": a size word on an uptake verb is the uptake's, not a change of its own.
      if (s.of('uptake').some((u) => u.key !== 'nouns' && (u.last === h.first - 1 || (u.last === h.first - 2 && /^(?:a|much|far|even|still|no)$/u.test(s.words[h.first - 1]?.text ?? ''))))) continue;
      const before = thingBefore(s, h.first);
      const thing = before !== undefined && h.first - before.last <= 4 ? before : thingAfter(s, h.last, 2);
      if (thing === undefined) continue;
      const kind = kindOf(s, thing, previous);
      if (kind === 'temperature') push(nameOf(s, thing, previous), 'temperature', h.key === 'up' ? 1 : -1, h, thing);
      else if (kind !== undefined) push(kind, 'amount', h.key === 'up' ? 1 : -1, h, thing);
    }
  }
  for (const h of s.of('uptake')) {
    // "pulled still more gas out of the air": a verb of taking is an uptake only with the air it takes from.
    if (h.key === 'from-air' && !fromAir(s, h.last)) continue;
    const dir = uptakeDirection(s, h);
    if (dir !== undefined) push('co2', 'uptake', dir, h);
  }
  // "drives CO2 out of the ocean": a phrasal verb split by its object.
  for (const h of s.of('causes', 'verbs')) {
    const verb = s.words[h.first]?.text ?? '';
    const out = s.words.slice(h.last + 1, h.last + 5).findIndex((w) => w.text === 'out');
    if (/^(?:drive|drives|drove|driven|driving|force|forces|forced|push|pushes|pushed|kick|kicks|kicked)$/u.test(verb) && out > 0 && s.of('entities', 'co2').some((c) => c.first > h.last && c.first <= h.last + out)) {
      push('co2', 'uptake', -1, h);
    }
  }
  return out;
}

/** Words that set a companion beside a change ("cooling alongside Greenland", "warmed along with the north"). */
const COMPANIONS = /^(?:(?:right |just )?(?:alongside|along with|together with|in step with|in tandem with|with|like|as did))$/u;

/** What a warm/cool word is said of: "warmer water", "the ocean warms", "warming of the sea". */
function temperatureHolder(s: ReadSentence, h: LexHit): Thing | undefined {
  const next = s.words[h.last + 1]?.text;
  if (next === 'of') return thingAfter(s, h.last, 3);
  // "the North Atlantic was locked in cold", "Europe lay in the deep cold": a cold or warmth told as
  // a state the subject is in belongs to the subject of its segment.
  const stateOf = stateSubject(s, h);
  if (stateOf !== undefined) return stateOf;
  // "cold polar oceans": the water, not the region that qualifies it.
  const water = s.things.find((t) => t.kind === 'water' && t.first > h.last && t.first - h.last <= 3);
  if (water !== undefined && s.things.every((t) => t === water || t.first <= h.last || t.first > water.first || t.region !== undefined || t.kind === 'temperature')) return water;
  const before = thingBefore(s, h.first);
  const adjacentBefore = before !== undefined && h.first - before.last <= 4;
  // "plunged back into the cold, Antarctica was warming": a thing past a comma is another clause's.
  const following = thingAfter(s, h.last, 2);
  const ownClause = (t: Thing) =>
    /^(?:was|were|is|are|had|has|did|got|stayed|kept|went|became|remained|warmed|cooled)$/u.test(s.words[t.last + 1]?.text ?? '') || s.of('changes').some((c) => c.first > t.last && c.first - t.last <= 3);
  const after = following !== undefined && (s.words[following.first]?.segment === s.words[h.last]?.segment || !ownClause(following)) ? following : undefined;
  if (after !== undefined && (!adjacentBefore || h.first - (before?.last ?? 0) > 1) && after.kind !== 'pronoun') return after;
  return adjacentBefore ? before : undefined;
}

/** Words that put a subject in a state ("in", "into", "through"), and what may stand before the state's noun. */
const STATE_PREPOSITIONS = new Set(['in', 'into', 'through']);
const STATE_MODIFIERS = new Set(['the', 'a', 'same', 'deep', 'deepest', 'bitter', 'severe', 'harsh', 'renewed', 'that', 'this', 'its', 'their', 'near-glacial', 'glacial', 'intense']);

/** The subject of the segment when warm/cool word `h` is a noun after "in", "into" or "through". */
function stateSubject(s: ReadSentence, h: LexHit): Thing | undefined {
  let k = h.first - 1;
  while (k >= 0 && k >= h.first - 3 && STATE_MODIFIERS.has(s.words[k]?.text ?? '')) k -= 1;
  if (!STATE_PREPOSITIONS.has(s.words[k]?.text ?? '') || s.things.some((t) => t.first <= h.first && h.last <= t.last && t.kind !== 'temperature')) return undefined;
  // The noun ends its phrase: "in cold water" is a water, "in the cold" a state.
  if (s.things.some((t) => t.first === h.last + 1)) return undefined;
  // The nearest place before the preposition in its segment, not a region word of an event's name ("the Antarctic Cold Reversal").
  const segment = s.words[k]?.segment;
  const subject = s.things.filter((t) => t.last < k && s.words[t.first]?.segment === segment && !s.inside(t.first, 'periods')).at(-1);
  return subject !== undefined && subject.region !== undefined ? subject : undefined;
}

/** Words that join two places into one subject: "Antarctica and Greenland", "the Arctic as well as the Antarctic". */
const JOINERS = new Set(['and', 'as well as', 'together with', '&', 'plus']);

/** The regional temperatures joined to `thing` before it ("Antarctica and Greenland cooled": Antarctica). */
function coordinatedWith(s: ReadSentence, thing: Thing | undefined): Thing[] {
  const out: Thing[] = [];
  let at = thing;
  while (at !== undefined && at.region !== undefined) {
    const first = at.first;
    const prior = s.things.filter((t) => t.last < first).at(-1);
    if (prior === undefined || prior.region === undefined || prior.region === 'global') break;
    const between = s.words.slice(prior.last + 1, first).map((w) => w.text).join(' ');
    if (!JOINERS.has(between) || s.words[prior.first]?.clause !== s.words[first]?.clause) break;
    out.push(prior);
    at = prior;
  }
  return out;
}

/** "both poles", "the two poles", "the North and South Poles": the polar word names each pole. */
function bothPoles(s: ReadSentence, thing: Thing): boolean {
  const words = s.words.slice(Math.max(0, thing.first - 1), thing.last + 1).map((w) => w.text);
  return words.includes('both') || words.includes('two') || (words.includes('north') && words.includes('south'));
}

/** The one region (not the globe) named before `h` in its clause, if exactly one is. */
function clauseRegion(s: ReadSentence, h: LexHit): string | undefined {
  const clause = s.words[h.first]?.clause;
  const keys = new Set(s.of('regions').filter((r) => r.key !== 'global' && r.last < h.first && s.words[r.first]?.clause === clause).map((r) => r.key));
  return keys.size === 1 ? [...keys][0] : undefined;
}

/** A thing's name for a fact: a region key for a regional temperature, else its kind. */
function nameOf(s: ReadSentence, thing: Thing, previous?: ReadSentence): string {
  if (thing.region !== undefined) return thing.region;
  const kind = kindOf(s, thing, previous) ?? 'temperature';
  if (kind !== 'temperature') return kind;
  const clause = s.words[thing.first]?.clause;
  return s.of('regions').find((r) => s.words[r.first]?.clause === clause)?.key ?? 'temperature';
}

/** "out of the air", "from the atmosphere", "back in": where a verb of taking (`uptake.from-air`) takes from. */
function fromAir(s: ReadSentence, last: number): boolean {
  const after = s.words.slice(last + 1, last + 8).map((w) => w.text).join(' ');
  return /\b(?:out of|from) the (?:air|atmosphere|sky)\b|\bback in\b/u.test(after);
}

/** +1 for taking CO2 in, -1 for letting it out; "less" turns it round. Undefined without CO2. */
function uptakeDirection(s: ReadSentence, h: LexHit): 1 | -1 | undefined {
  const noun = h.key === 'nouns' || h.key === 'pressure';
  let base: 1 | -1 = h.key === 'out' ? -1 : 1;
  if (noun) {
    // "the partial pressure of CO2 in the seawater fell": a pressure's change is its verb in the segment.
    const segment = s.words[h.first]?.segment;
    const change = s.of('changes').find((c) => (c.key === 'up' || c.key === 'down') && (Math.abs(c.first - h.last) <= 4 || (h.key === 'pressure' && c.first > h.last && s.words[c.first]?.segment === segment)));
    if (change === undefined) return undefined;
    base = change.key === 'up' ? 1 : -1;
    // The gas's pressure in the water pushes it out: a higher pressure is less uptake.
    if (h.key === 'pressure') base = (base * -1) as 1 | -1;
  } else {
    // "the extra CO2 traps more heat": the verb's object is heat, so CO2 takes nothing up.
    const object = s.things.find((t) => t.first > h.last && t.first - h.last <= 3);
    if (object?.kind === 'temperature' && object.region === undefined) return undefined;
    // "less dissolved CO2": a participle before CO2 describes it, and states no uptake.
    const lead = s.words[h.first - 1]?.text ?? '';
    if (/ed$/u.test(s.words[h.last]?.text ?? '') && s.of('entities', 'co2').some((c) => c.first === h.last + 1) && /^(?:less|more|of|the|a|much|little|extra|some|no)$/u.test(lead)) return undefined;
    // "keeps a smaller share of dissolved CO2": a quantity phrase may stand between the verb and the gas.
    const quantityObject = s.of('entities', 'co2').find((c) => c.first > h.last && c.first - h.last <= 9 && s.words.slice(h.last + 1, c.first).every((w) => QUANTITY_WORDS.has(w.text) || /ed$/u.test(w.text)));
    const objectCo2 = quantityObject !== undefined || s.of('entities', 'co2').some((c) => c.first > h.last && c.first - h.last <= 5) || s.words.slice(h.last + 1, h.last + 4).some((w) => /^(?:it|carbon|gas|them)$/u.test(w.text));
    // "the less carbon dioxide it can keep dissolved": CO2 stands before the verb.
    const subjectCo2 = s.of('entities', 'co2').some((c) => c.last < h.first && h.first - c.last <= 5);
    if (!objectCo2 && !subjectCo2) return undefined;
    // "holds less CO2", "releases less of it", "the less CO2 it can keep": a size word on the verb's object.
    const segment = s.words[h.first]?.segment;
    const co2Before = s.of('entities', 'co2').find((c) => c.last < h.first && h.first - c.last <= 5 && s.words[c.first]?.segment === segment);
    const window = [
      ...s.words.slice(h.last + 1, Math.max(h.last + 4, quantityObject?.first ?? 0)).filter((w) => w.segment === segment),
      ...(co2Before === undefined ? [] : s.words.slice(Math.max(0, co2Before.first - 2), co2Before.first)),
    ].map((w) => w.text);
    // "holds half as much CO2", "can't keep as much": an equality comparison with its multiple.
    const equal = window.findIndex((w, k) => w === 'as' && (window[k + 1] === 'much' || window[k + 1] === 'many'));
    if (equal >= 0) {
      const multiple = window.slice(Math.max(0, equal - 2), equal);
      if (multiple.some((w) => FRACTIONS.has(w))) return (base * -1) as 1 | -1;
      if (multiple.some((w) => MULTIPLES.has(w))) return base;
      // "holds as much CO2 as" states no direction; "cannot hold as much" is less (the denial turns it).
      return denialsBefore(s, h.first, 5) % 2 === 1 ? base : undefined;
    }
    if (window.some((w) => SIZE_DOWN.has(w))) base = (base * -1) as 1 | -1;
    else if (!window.some((w) => SIZE_UP.has(w)) && h.key === 'in' && /^(?:hold|holds|held|keep|keeps|kept|retain|retains|store|stores|stored)$/u.test(s.words[h.first]?.text ?? '')) {
      // "warm water holds CO2" states a capacity, not a change: only "more"/"less" makes it one.
      return undefined;
    }
  }
  return base;
}

/** Pairs a water temperature with a CO2 uptake in the same clause (or sentence, when only one). */
export function readRelations(s: ReadSentence, directed: Directed[]): Relation[] {
  const waterNamed = s.of('entities', 'water').length > 0;
  const temps = directed.filter((d) => d.attribute === 'temperature' && (d.of === 'water' || (d.of === 'temperature' && waterNamed) || (d.of === 'pronoun' && waterNamed)));
  const relations: Relation[] = [];
  for (const u of directed.filter((d) => d.attribute === 'uptake')) {
    const clause = s.words[u.first]?.clause;
    // "a colder ocean keeps less CO2, and a warmer one keeps more": a temperature whose own segment has
    // an uptake verb of its own goes with that verb, not with this one.
    const segmentOf = (i: number) => s.words[i]?.segment;
    const ownVerb = (t: Directed) => segmentOf(t.first) !== segmentOf(u.first) && s.of('uptake').some((h) => segmentOf(h.first) === segmentOf(t.first));
    const sameClause = temps.filter((t) => s.words[t.first]?.clause === clause && !isAfterThan(s, t) && !ownVerb(t));
    // "Cold water holds more CO2 than warm water, which is why ... on a hot day".
    // A warmth said of nothing named ("on a hot day") is the water's only in the uptake's own segment.
    const own = sameClause.filter((t) => t.of !== 'temperature' || segmentOf(t.first) === segmentOf(u.first));
    const pool = own.length > 0 ? own : temps.length === 1 ? temps : [];
    // "Cold water releases CO2 when it warms": the change the release goes with, not the starting state.
    const changes = pool.filter((t) => t.form === 'change');
    const t = (changes.length > 0 ? changes : pool).sort((a, b) => Math.abs(a.first - u.first) - Math.abs(b.first - u.first))[0];
    if (t === undefined || isConcessive(s, t)) continue;
    // "It is not true that warmer seas absorb more CO2": one denial turns the whole relation round.
    // "gives up CO2 rather than absorbing more of it": the uptake set aside is denied.
    const setAside = /^(?:rather than|instead of)$/u.test(s.words.slice(Math.max(0, u.first - 2), u.first).map((w) => w.text).join(' '));
    // "X, not the warming of the water, released the CO2": a "not" that sets a cause aside denies no direction.
    const denied = ((t.negated && !setAsideCause(s, t, u)) || u.negated) !== setAside;
    const y = denied ? { ...u, dir: (-u.dir) as 1 | -1 } : u;
    relations.push({ kind: 'relation', x: { ...t, of: 'water' }, y, start: Math.min(t.start, u.start), end: Math.max(t.end, u.end) });
  }
  return relations;
}

/** ", not the warming of surface water alone, released": a segment opened by "not" before the verb's own. */
function setAsideCause(s: ReadSentence, t: Directed, u: Directed): boolean {
  const segment = s.words[t.first]?.segment;
  const start = s.words.findIndex((w) => w.segment === segment);
  return start > 0 && s.words[start]?.text === 'not' && s.words[u.first]?.segment !== segment;
}

/** "Even as the oceans warm, they absorb more CO2": a concession states no relation between the two. */
function isConcessive(s: ReadSentence, d: Directed): boolean {
  const segment = s.words[d.first]?.segment;
  const first = s.words.findIndex((w) => w.segment === segment);
  const lead = s.words.slice(Math.max(0, first - 1), first + 2).map((w) => w.text).join(' ');
  return /\b(?:even as|even though|even if|although|though|despite|in spite of|even when)\b/u.test(lead);
}

/** "than warm water", "as much gas as warm water": the base of a comparison is no claim of its own. */
function isAfterThan(s: ReadSentence, d: Directed): boolean {
  const before = s.words.slice(Math.max(0, d.first - 3), d.first);
  if (before.some((w) => w.text === 'than')) return true;
  // The second "as" of "as much ... as", "as many ... as": its earlier partner stands in the clause.
  const as = before.findLastIndex((w) => w.text === 'as');
  if (as < 0) return false;
  const at = d.first - before.length + as;
  const clause = s.words[at]?.clause;
  for (let k = Math.max(0, at - 8); k < at - 1; k += 1) {
    if (s.words[k]?.text === 'as' && s.words[k]?.clause === clause && ['much', 'many'].includes(s.words[k + 1]?.text ?? '')) return true;
  }
  return false;
}

/** Changes of regions and of marginal forcing, with the period they are set in. */
export function readChanges(s: ReadSentence, directed: Directed[], previous?: ReadSentence, earlier: readonly ReadSentence[] = [], before?: string): Change[] {
  // A period named in the sentence before still sets the scene ("During the Younger Dryas... While
  // Greenland froze, ..."), and so does one named a sentence or two earlier in the paragraph when
  // this sentence names no period of its own.
  const periodIn = (r: ReadSentence | undefined) => r?.of('periods').filter((p) => p.key !== 'deglaciation')[0]?.key;
  const scene = s.of('periods').length === 0 && previous?.of('periods').length === 0 ? earlier.map(periodIn).find((p) => p !== undefined) : undefined;
  // `before`: the period the block before this one named, for a paragraph that names none up to
  // this sentence (a speaker's next turn, the next paragraph of a section).
  const named = [s, previous, ...earlier].some((r) => r !== undefined && r.of('periods').length > 0);
  // "record a local glacial cooling": a sentence set in the glacial cycle leaves the scene's period.
  const ownTime = s.of('periods', 'lgm').length + s.of('entities', 'ice-age').length > 0 || s.words.some((w) => w.text === 'glacial' || w.text === 'interglacial');
  const period = periodIn(s) ?? (ownTime ? undefined : periodIn(previous) ?? scene ?? (named ? undefined : before));
  // With no period named, a southern cooling that echoes the north's is set in a northern cold event.
  const echo = period === undefined ? echoedNorthernCold(s, directed, previous, previous === undefined ? [] : readDirected(previous)) : undefined;
  const during = (d: Directed) => period ?? (d.dir === -1 ? echo : undefined);
  const changes: Change[] = directed
    .filter((d) => d.attribute === 'temperature')
    .map((d) => ({ kind: 'change', of: d.of, attribute: 'temperature', dir: (d.negated ? -d.dir : d.dir) as 1 | -1, start: d.start, end: d.end, ...(during(d) === undefined ? {} : { during: during(d) as string }) }));
  changes.push(...readMarginal(s));
  // "As the ice melted back, CO2 fell": a CO2 change set in the end or the start of an ice age.
  changes.push(...readTransitionChanges(s, previous));
  // "the warming effect of CO2 grows exponentially": the effect per ppm said to speed up.
  const effect = s.of('causes', 'roles').find((r) => /effect|forcing|power/u.test(s.words[r.last]?.text ?? ''));
  const speeding = s.of('changes', 'accelerating')[0];
  if (effect !== undefined && speeding !== undefined && s.of('entities', 'co2').length > 0 && s.of('entities', 'marginal-forcing').length === 0) {
    changes.push({ kind: 'change', of: 'marginal-forcing', attribute: 'amount', dir: 1, start: s.words[effect.first]?.start ?? 0, end: s.words[speeding.last]?.end ?? 0 });
  }
  return changes;
}
