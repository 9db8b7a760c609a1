/**
 * Rank and comparison claims read against the reference values of one measure (measure-families.ts):
 *
 *   "The longest ice-core record is Vostok's."              superlative → Vostok must rank first
 *   "Vostok's record is twice as long as EPICA Dome C's."   multiple → 420 kyr / 800 kyr ≈ 0.5, not 2
 *   "Dome Fuji's record is second only to Vostok's."        runner-up → Vostok must rank above Dome Fuji
 *   "No ice core has a longer record than Vostok's."        none ahead → Vostok must rank first
 *
 * The entity a superlative speaks of is tied to it by the sentence: "<entity> is/has/holds … the
 * longest …" or "the longest … is/comes from/belongs to <entity>"; a comparison joins the entity
 * named last before its word with the one named first after it. A claim is flagged only when the
 * values' intervals settle it; a claim hedged ("one of the longest"), negated, placed in the past
 * ("at the time", a calendar year) or narrowed to a region or kind ("the longest Greenland record")
 * is not read. Rule id: `value.rank.<family>`.
 */
import { findTerms } from '../../claims/bind.js';
import type { LoadedPacks, ReferenceValue } from '../../rulepack/types.js';
import type { FlagDraft, Source } from '../../types.js';
import { measureFamilies, type FamilyMember, type MeasureFamily } from './measure-families.js';
import { comparativeOf, findRankWords, OPPOSITE, type FoundRankWord } from './rank-words.js';

/** The sentence places the claim in the past, hedges or denies it: a rank then is not a rank now. */
const NOT_NOW = /(?<![\p{L}])(?:not|no\s+longer|never|until|once|formerly|previously|used\s+to|at\s+the\s+time|back\s+then|then|one\s+of|among|(?:1[89]|20)\d\d)(?![\p{L}])/iu;
/** What ties an entity before a superlative to it: a verb, then "the" (and at most two words). */
const TIES_BEFORE = /(?<![\p{L}])(?:is|was|has|had|holds?|held|gives?|gave|provides?|provided|yields?|yielded|offers?|contains?|boasts?|remains?|remained|keeps?|produced)(?![\p{L}])[^;:.!?]*\bthe(?:\s+[\p{L}'’-]+){0,2}\s*$/iu;
/** What ties a superlative to an entity after it. */
const TIES_AFTER = /^[^;:.!?]*?(?:(?<![\p{L}])(?:is|was|comes\s+from|came\s+from|belongs\s+to|belonged\s+to|from|at)|,|=)\s+(?:(?:still|now|today|easily|clearly)\s+)?(?:the\s+)?$/iu;
/** An apposition before a superlative: "Dome Fuji, the longest record", "Vostok, still the oldest". */
const APPOSITION = /^\s*,\s*(?:(?:still|now|today|easily|clearly|by\s+far)\s+)?the(?:\s+[\p{L}'’-]+){0,2}\s*$/iu;
/** A verb after a superlative's noun phrase: the phrase is a subject, not an apposition ("Beside Vostok, the longest record is …"). */
const VERB_AFTER = /(?<![\p{L}])(?:is|was|are|were|comes|came|belongs|belonged|remains|remained|holds|held|goes|went)(?![\p{L}])/iu;
/** The first tie word after a superlative: the superlative's own noun phrase ends there. */
const FIRST_TIE = /(?<![\p{L}])(?:is|was|comes|came|belongs|belonged|from|at)(?![\p{L}])|[,=]/iu;
const CLAUSE_END = /[;:.!?]|(?<![\p{L}])(?:but|while|whereas|although)(?![\p{L}])/iu;

interface Named {
  entity: string;
  start: number;
  end: number;
}

/** Flags the rank and comparison claims of `sentence` that the reference values contradict. */
export function checkRanks(sentence: string, packs: LoadedPacks): FlagDraft[] {
  const words = findRankWords(sentence);
  const runnersUp = [...sentence.matchAll(SECOND_ONLY)];
  if (words.length + runnersUp.length === 0) return [];
  // "second only to" orders two entities, so a group ("among the Antarctic cores") does not change it.
  const hedged = NOT_NOW.test(sentence);
  if (hedged && NOT_NOW.test(sentence.replace(/(?<![\p{L}])among(?![\p{L}])/giu, ' '))) return [];
  const families = measureFamilies(packs);
  const entities = new Set(families.flatMap((f) => f.members.map((m) => m.entity)));
  const hits = findTerms(sentence, packs);
  const named: Named[] = [...hits]
    .filter(([id]) => entities.has(id))
    .flatMap(([entity, spans]) => spans.map(([start, end]) => ({ entity, start, end })))
    .sort((a, b) => a.start - b.start);
  const flags: FlagDraft[] = [];
  for (const m of runnersUp) {
    const flag = secondOnlyFlag(sentence, { dimensions: ['duration', 'age', 'length'], sign: 1, stem: 'long', kind: 'comparative', start: m.index, end: m.index + m[0].length }, named, hits, families, packs);
    if (flag !== undefined) flags.push(flag);
  }
  if (hedged) return flags;
  for (const word of words) {
    const flag = word.kind === 'superlative' ? superlativeFlag(sentence, word, named, hits, families, packs) : comparisonFlag(sentence, word, named, hits, families, packs);
    if (flag !== undefined) flags.push(flag);
  }
  return flags;
}

/** "A is second only to B", "A comes second only to B": B ranks above A, in any group that holds both. */
const SECOND_ONLY = /(?<![\p{L}])second\s+only\s+to(?![\p{L}])/giu;

/** "Dome Fuji's record is second only to Vostok's": flagged when the values put A surely above B. */
function secondOnlyFlag(sentence: string, word: FoundRankWord, named: Named[], hits: Map<string, [number, number][]>, families: MeasureFamily[], packs: LoadedPacks): FlagDraft | undefined {
  const clauseStart = lastClauseEnd(sentence.slice(0, word.start));
  const a = named.filter((n) => n.end <= word.start && n.start >= clauseStart).at(-1);
  const b = named.find((n) => n.start >= word.end && !CLAUSE_END.test(sentence.slice(word.end, n.start)) && n.start - word.end <= 20);
  if (a === undefined || b === undefined || a.entity === b.entity) return undefined;
  const family = chooseFamily(sentence, word, [a.entity, b.entity], hits, families, sentence.slice(a.end, word.start));
  if (family === undefined) return undefined;
  const [ra, rb] = [memberOf(family, a), memberOf(family, b)];
  if (!(ra.low > rb.high)) return undefined;
  const [an, bn] = [nameOf(a.entity, packs), nameOf(b.entity, packs)];
  return pairFlag(word, family, ra, rb, `The draft ranks ${bn} above ${an} by ${measureOf(family)}`, `ahead of (${an}: ${ra.wording}; ${bn}: ${rb.wording})`, [an, bn]);
}

/** The reference value a measure family holds for a named subject. */
function memberOf(family: MeasureFamily, subject: Named): FamilyMember['reference'] {
  return (family.members.find((m) => m.entity === subject.entity) as FamilyMember).reference;
}

/** The flag on a rank or comparison word that two subjects' reference values contradict. */
function pairFlag(word: FoundRankWord, family: MeasureFamily, ra: FamilyMember['reference'], rb: FamilyMember['reference'], claim: string, correction: string, [an, bn]: [string, string]): FlagDraft {
  return {
    ruleId: `value.rank.${family.name}`,
    level: 'error',
    start: word.start,
    end: word.end,
    reason: `${claim}; the reference values give ${an} ${ra.wording} and ${bn} ${rb.wording}.`,
    reference: shown(ra),
    correction,
    sources: sourcesOf([ra, rb]),
  };
}

/** A superlative that picks out a part of one thing: "the deepest ice at Dome C", "its oldest layers". */
const PART_OF_ONE = /^\s+(?:ice(?![\s-]+(?:cores?|records?)(?![\p{L}]))|layers?|sections?|parts?|samples?|metres|meters|stretch|bits?|portion)(?![\p{L}])/iu;

function superlativeFlag(sentence: string, word: FoundRankWord, named: Named[], hits: Map<string, [number, number][]>, families: MeasureFamily[], packs: LoadedPacks): FlagDraft | undefined {
  const clauseStart = lastClauseEnd(sentence.slice(0, word.start));
  const before = named.filter((n) => n.end <= word.start && n.start >= clauseStart).at(-1);
  const after = named.find((n) => n.start >= word.end);
  let subject: Named | undefined;
  let phraseEnd: number;
  if (before !== undefined && TIES_BEFORE.test(sentence.slice(before.end, word.start))) {
    subject = before;
    phraseEnd = word.end + clauseRest(sentence, word.end).length;
  } else if (after !== undefined && TIES_AFTER.test(sentence.slice(word.end, after.start))) {
    subject = after;
    // "the longest record ... comes from the Russian station at Vostok": only the words before the tie
    // name the group the superlative ranks in.
    const tie = FIRST_TIE.exec(sentence.slice(word.end, after.start));
    phraseEnd = tie === null ? after.start : word.end + tie.index;
  } else if (before !== undefined && APPOSITION.test(sentence.slice(before.end, word.start)) && !VERB_AFTER.test(clauseRest(sentence, word.end))) {
    subject = before;
    phraseEnd = word.end + clauseRest(sentence, word.end).length;
  } else return undefined;
  // "the deepest ice at Dome C", "the deepest layers": a place within one core, not a rank among cores.
  if (PART_OF_ONE.test(sentence.slice(word.end))) return undefined;
  // "the longest Greenland record", "the deepest core in Japan": a rank within a group the values do not mark.
  const phrase = sentence.slice(word.end, phraseEnd);
  if (/(?<![\p{L}])\p{Lu}/u.test(phrase.replace(/[\p{L}\p{N}-]+/gu, (w, at: number) => (named.some((n) => n.start <= word.end + at && word.end + at < n.end) ? 'x' : w)))) return undefined;
  const family = chooseFamily(sentence, word, [subject.entity], hits, families, sentence.slice(subject.end, word.start));
  if (family === undefined) return undefined;
  const own = family.members.find((m) => m.entity === subject.entity) as FamilyMember;
  const others = family.members.filter((m) => m !== own);
  const up = (a: ReferenceValue, b: ReferenceValue): boolean => (word.sign === 1 ? a.low > b.high : a.high < b.low);
  const surelyAhead = others.filter((m) => up(m.reference, own.reference)).length;
  const maybeAhead = others.filter((m) => !up(own.reference, m.reference)).length;
  const rank = word.rank ?? 1;
  if (rank >= surelyAhead + 1 && rank <= maybeAhead + 1) return undefined;
  const ordered = [...family.members].sort((a, b) => word.sign * (middle(b.reference) - middle(a.reference)));
  const right = ordered[rank - 1] ?? ordered[0] as FamilyMember;
  const list = ordered.map((m) => `${nameOf(m.entity, packs)} ${m.reference.wording}`).join(', ');
  return {
    ruleId: `value.rank.${family.name}`,
    level: 'error',
    start: subject.start,
    end: subject.end,
    reason: `The draft ranks ${nameOf(subject.entity, packs)} ${ordinal(rank)} by ${measureOf(family)}; by the reference values ${nameOf(right.entity, packs)} is: ${list}.`,
    claimed: { text: sentence.slice(subject.start, subject.end), low: own.reference.low, high: own.reference.high, unit: own.reference.unit },
    reference: shown(right.reference),
    correction: `${nameOf(right.entity, packs)} (${right.reference.wording}; ${nameOf(own.entity, packs)}: ${own.reference.wording})`,
    sources: sourcesOf(family.members.map((m) => m.reference)),
  };
}

function comparisonFlag(sentence: string, word: FoundRankWord, named: Named[], hits: Map<string, [number, number][]>, families: MeasureFamily[], packs: LoadedPacks): FlagDraft | undefined {
  const clauseStart = lastClauseEnd(sentence.slice(0, word.start));
  const a = named.filter((n) => n.end <= word.start && n.start >= clauseStart).at(-1);
  const b = named.find((n) => n.start >= word.end && !CLAUSE_END.test(sentence.slice(word.end, n.start)) && n.start - word.end <= 40);
  if (a === undefined && b !== undefined && word.ratio === undefined) return noneAheadFlag(sentence, word, b, clauseStart, hits, families, packs);
  if (a === undefined || b === undefined || a.entity === b.entity) return undefined;
  const family = chooseFamily(sentence, word, [a.entity, b.entity], hits, families);
  if (family === undefined) return undefined;
  const [ra, rb] = [memberOf(family, a), memberOf(family, b)];
  let wrong: boolean;
  let phrase: string;
  if (word.ratio !== undefined) {
    // "twice as long as" says a / b ≈ 2; "twice as short as" says b / a ≈ 2.
    const [low, high] = [ra.low / rb.high, ra.high / rb.low];
    const claimed = word.sign === 1 ? word.ratio : 1 / word.ratio;
    wrong = claimed * 1.15 < low || claimed * 0.85 > high;
    const actual = word.sign === 1 ? middle(ra) / middle(rb) : middle(rb) / middle(ra);
    phrase = `${timesWords(actual)}as ${word.stem} as`;
  } else {
    wrong = word.sign === 1 ? ra.high < rb.low : ra.low > rb.high;
    phrase = `${comparativeOf(OPPOSITE[word.stem] ?? word.stem)} than`;
  }
  if (!wrong) return undefined;
  const [an, bn] = [nameOf(a.entity, packs), nameOf(b.entity, packs)];
  return pairFlag(word, family, ra, rb, `The draft compares the ${measureOf(family)} of ${an} and ${bn}`, `${phrase} (${an}: ${ra.wording}; ${bn}: ${rb.wording})`, [an, bn]);
}

/** "No ice core has a longer record than B", "nothing reaches further back than B": B is first. */
const NONE_BEFORE = /(?<![\p{L}])(?:no|none|nothing|nobody|no\s+one)(?![\p{L}])/iu;

/** A comparison against "no …" ranks B first among all members, unless the group is narrowed by a name ("No Greenland core …"). */
function noneAheadFlag(sentence: string, word: FoundRankWord, b: Named, clauseStart: number, hits: Map<string, [number, number][]>, families: MeasureFamily[], packs: LoadedPacks): FlagDraft | undefined {
  const lead = sentence.slice(clauseStart, word.start);
  const none = NONE_BEFORE.exec(lead);
  if (none === null) return undefined;
  // Only the quantifier's own noun phrase and verb: a capital after "No" narrows the group.
  if (/(?<![\p{L}])\p{Lu}/u.test(lead.slice(none.index + none[0].length))) return undefined;
  const family = chooseFamily(sentence, word, [b.entity], hits, families);
  if (family === undefined) return undefined;
  const own = family.members.find((m) => m.entity === b.entity) as FamilyMember;
  const ahead = family.members.filter((m) => m !== own && (word.sign === 1 ? m.reference.low > own.reference.high : m.reference.high < own.reference.low));
  if (ahead.length === 0) return undefined;
  const first = [...ahead].sort((x, y) => word.sign * (middle(y.reference) - middle(x.reference)))[0] as FamilyMember;
  const [fn, bn] = [nameOf(first.entity, packs), nameOf(b.entity, packs)];
  return {
    ruleId: `value.rank.${family.name}`,
    level: 'error',
    start: b.start,
    end: b.end,
    reason: `The draft ranks ${bn} first by ${measureOf(family)}; by the reference values ${fn} is ahead: ${fn} ${first.reference.wording}, ${bn} ${own.reference.wording}.`,
    claimed: { text: sentence.slice(b.start, b.end), low: own.reference.low, high: own.reference.high, unit: own.reference.unit },
    reference: shown(first.reference),
    correction: `${fn} (${first.reference.wording}; ${bn}: ${own.reference.wording})`,
    sources: sourcesOf([own.reference, first.reference]),
  };
}

/** The family the word measures for these entities: one whose dimension fits; on a choice, the one whose measure words are in the sentence. */
function chooseFamily(sentence: string, word: FoundRankWord, entities: string[], hits: Map<string, [number, number][]>, families: MeasureFamily[], afterEntity = ''): MeasureFamily | undefined {
  let fitting = families.filter((f) => word.dimensions.includes(f.dimension) && entities.every((e) => f.members.some((m) => m.entity === e)));
  // "the longest record": a record is long in time; "the longest core", "3,270 metres": in length.
  // The noun the rank word qualifies decides first ("the longest peer-reviewed continuous record").
  const after = sentence.slice(word.end, word.end + 50);
  // "Vostok's record is the longest": the noun right after the entity names the measure as well.
  const recordNext = /^(?:\W+[\w-]+){0,3}?\W+(?:records?|history|archives?)\b/iu.test(after) || /^(?:['’]s)?\s+(?:[\w-]+\s+)?(?:records?|history|archives?)\b/iu.test(afterEntity);
  const inTime = recordNext || /\b(?:records?|history|archives?|years?|millenni(?:um|a)|kyr|ka)\b/iu.test(sentence);
  const inLength = !recordNext && /\b(?:metres?|meters?|feet|ft|km|deep|depth|drilled|bedrock)\b|\d\s?m\b/iu.test(sentence);
  // A rank said in time is never read as one in length, nor the other way round.
  if (inTime !== inLength) fitting = fitting.filter((f) => (inTime ? f.dimension !== 'length' : f.dimension === 'length'));
  if (fitting.length <= 1) return fitting[0];
  // The rank word's own letters ("long" in "as long as") do not name a measure.
  const outside = (t: string): boolean => (hits.get(t) ?? []).some(([start, end]) => end <= word.start || start >= word.end);
  const spoken = fitting.filter((f) => f.measureTerms.some(outside));
  return spoken.length === 1 ? spoken[0] : undefined;
}

/** The words after `at` up to the end of its clause or the first comma: a superlative's own phrase. */
function clauseRest(sentence: string, at: number): string {
  const rest = sentence.slice(at);
  const stop = /[,;:.!?]|(?<![\p{L}])(?:but|while|whereas|although)(?![\p{L}])/iu.exec(rest);
  return stop === null ? rest : rest.slice(0, stop.index);
}

function lastClauseEnd(text: string): number {
  let at = 0;
  for (const m of text.matchAll(new RegExp(CLAUSE_END.source, 'giu'))) at = m.index + m[0].length;
  return at;
}

function middle(r: ReferenceValue): number {
  return r.central ?? (r.low + r.high) / 2;
}

/** "about half ", "about 1.9 times ", "" (about as long as): a ratio in words, before "as long as". */
function timesWords(ratio: number): string {
  if (Math.abs(ratio - 1) < 0.1) return 'about ';
  if (Math.abs(ratio - 0.5) < 0.06) return 'about half ';
  if (Math.abs(ratio - 2) < 0.15) return 'about twice ';
  return `about ${ratio >= 10 ? Math.round(ratio) : Math.round(ratio * 10) / 10} times `;
}

function nameOf(entity: string, packs: LoadedPacks): string {
  return packs.term(entity)?.words[0] ?? entity;
}

function measureOf(f: MeasureFamily): string {
  return f.name.replace(/-/gu, ' ');
}

function ordinal(n: number): string {
  return ['first', 'second', 'third', 'fourth', 'fifth'][n - 1] ?? `${n}th`;
}

function shown(r: ReferenceValue): NonNullable<FlagDraft['reference']> {
  return { id: r.id, measures: r.measures, text: r.wording, low: r.low, high: r.high, unit: r.unit };
}

function sourcesOf(references: ReferenceValue[]): Source[] {
  const byId = new Map<string, Source>();
  for (const r of references) for (const s of r.sources) byId.set(s.id, s);
  return [...byId.values()];
}
