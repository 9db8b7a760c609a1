/**
 * One sentence as the proposition reader sees it: its words (lower-case, with offsets, clause and
 * segment numbers), the lexicon phrases found in it, and the things it names. No NLP library runs
 * here: the lexicon carries the inflections, and the grammar below is English's closed classes.
 *
 *   "As the oceans warmed, they released CO2."
 *    segment 0 ──────────  segment 1 ─────────   (a comma or a linking word starts a segment)
 */
import { tokenizeSentence } from '../claims/frames-tokens.js';
import type { CompiledLexicon, LexHit } from './lexicon.js';

/** One word of the sentence. `start`/`end` are UTF-16 offsets into the sentence text. */
export interface Word {
  text: string;
  start: number;
  end: number;
  /** Grows at ; : ( ) dashes and at contrast words (but, while, whereas, although...). */
  clause: number;
  /** Grows at each clause, comma and linking word (so, because, when, which...). */
  segment: number;
  quoted: boolean;
}

/** A thing a proposition can be about: a lexicon entity or region, or a pronoun standing for one. */
export interface Thing {
  /** `co2`, `temperature`, `orbit`, `water`, a region key (`antarctic`, `global`...), or `pronoun`. */
  kind: string;
  /** Region key named with a temperature ("Antarctic temperature", "warming in Antarctica"). */
  region?: string;
  first: number;
  last: number;
}

/** A sentence ready for the proposition readers. */
export interface ReadSentence {
  text: string;
  words: Word[];
  hits: LexHit[];
  /** Hits of one class (and key, when given), in order. */
  of(cls: string, key?: string): LexHit[];
  /** True when word `i` is inside a hit of `cls` (and `key`). */
  inside(i: number, cls: string, key?: string): boolean;
  things: Thing[];
  /** The sentence ends with a question mark. */
  question: boolean;
  /** The `not` of a negative question ("Isn't it...?", "Doesn't that...?"): part of the form, no denial. */
  questionNot: number;
  /**
   * The first word of the sentence's own wording, past an utterance label ("[02:20]", "NARRATOR:",
   * "Thu 2/", "4/") and a joining "and" or "but": where "This shows...", "So..." or "The more..." opens.
   */
  opening: number;
}

/** An utterance label before a sentence's own words: a time stamp, a speaker, a post number. */
const UTTERANCE_LABEL = /^\s*(?:[-*+•>↳]\s+)?(?:\[[^\]\n]{1,24}\]\s*)?(?:(?:\p{L}{2,9}\.?\s+)?\d{1,3}\/\s+)?(?:\p{Lu}[\p{L}'’.-]*(?:\s\p{Lu}[\p{L}'’.-]*){0,2}:\s+)?/u;
/** Words that join a sentence to the one before without being part of its own opening. */
const JOINING = new Set(['and', 'but', 'yet', 'now', 'well', 'ok', 'okay']);

function openingOf(text: string, words: readonly Word[]): number {
  const label = UTTERANCE_LABEL.exec(text)?.[0].length ?? 0;
  let i = words.findIndex((w) => w.start >= label);
  if (i < 0) return 0;
  while (JOINING.has(words[i]?.text ?? '') && i + 1 < words.length) i += 1;
  return i;
}

const CONTRAST = ['but', 'while', 'whereas', 'although', 'though', 'yet', 'however'];
/** Words that open a new segment: a linked clause with its own subject. */
const LINKS = new Set(['so', 'therefore', 'thus', 'hence', 'because', 'since', 'when', 'if', 'which', 'meaning', 'means', 'whereby', 'once', 'unless', 'until', 'consequently']);
/** Words after which "that" opens a clause of its own ("shows that temperature drives CO2"). */
const COMPLEMENT_TAKERS = /^(?:show|prove|mean|say|said|know|knew|think|thought|argue|claim|suggest|find|found|note|clear|plain|true|evident|obvious|likely|so|insist|assert|believe|tell|told|demonstrate|confirm|establish|reveal|indicate|impl(?:y|ies|ied)|conclude|maintain|contend|write|wrote|hear|heard|fact|idea|notion|view|belief|myth|argument|sure|certain|agree|recogni[sz]e|shown|proof|evidence|sign|means)\w*$/u;
/** Pronouns whose "'s" is "is": "that's global temperature", "it's an effect, not a cause". */
// "thats" is the same contraction with the apostrophe left out, as informal posts write it.
// "its" without the apostrophe stays the possessive it usually is.
const COPULA_CONTRACTION = /^(that|this|it)'s$|^(that)s$/u;
const AUXILIARIES = new Set(['is', 'does', 'did', 'was', 'are', 'do', 'can', 'could', 'would', 'should', 'has', 'have', 'were', 'will']);
const PRONOUNS = new Set(['it', 'they', 'this', 'that', 'these', 'those', 'its', 'their']);
/** Pronouns that are a determiner when a thing follows them ("this wobble", "those glaciations"). */
const DEMONSTRATIVES = new Set(['this', 'that', 'these', 'those']);
/** Entities that take part in causes and orders. */
/**
 * The entities that take part in what a sentence asserts. The others (an ice core, a station, a unit,
 * climate sensitivity, the glacial sea level) name what a number measures and put a draft on topic.
 */
export const PARTICIPANTS: ReadonlySet<string> = new Set(['co2', 'temperature', 'orbit', 'water', 'ice-age', 'trapped-air', 'ice', 'marginal-forcing', 'modern-rise', 'natural-rise']);

/** Reads one sentence: words, segments, lexicon hits and things. */
export function readSentence(text: string, lexicon: CompiledLexicon): ReadSentence {
  const tokens = tokenizeSentence(text, CONTRAST, null).tokens;
  const words: Word[] = [];
  let segment = 0;
  let lastClause = 0;
  let pendingBreak = false;
  let joinDigits = false;
  for (const [k, token] of tokens.entries()) {
    if (!token.isWord) {
      // "1,120 ppm": a thousands separator joins the digits on either side; it breaks no segment.
      const prev = words.at(-1);
      const following = tokens[k + 1];
      if (token.text === ',' && prev !== undefined && prev.end === token.start && /^\d[\d,]*$/u.test(prev.text) && following?.isWord === true && following.start === token.end && /^\d{3}(?!\d)/u.test(following.text)) {
        joinDigits = true;
        continue;
      }
      if (token.text === ',' || token.clause !== lastClause) pendingBreak = true;
      lastClause = token.clause;
      continue;
    }
    const last = words.at(-1);
    if (joinDigits && last !== undefined) {
      joinDigits = false;
      words[words.length - 1] = { ...last, text: `${last.text},${token.text}`, end: token.end };
      continue;
    }
    joinDigits = false;
    // "Greenland’s" reads as "greenland's"; "that's" as "that is" (the copula reads a record as
    // something), "it's" as "it is" (so the pronoun resolves: "It's an effect, not a cause").
    const text = token.text.replace(/’/gu, "'");
    const copula = COPULA_CONTRACTION.exec(text);
    const complement = text === 'that' && COMPLEMENT_TAKERS.test(words.at(-1)?.text ?? '');
    if (token.clause !== lastClause || pendingBreak || complement || (LINKS.has(text) && words.length > 0)) segment += 1;
    pendingBreak = false;
    lastClause = token.clause;
    const word = { start: token.start, end: token.end, clause: token.clause, segment, quoted: token.quoted };
    const pronoun = copula?.[1] ?? copula?.[2];
    if (pronoun === undefined) words.push({ ...word, text });
    else words.push({ ...word, text: pronoun, end: token.start + pronoun.length }, { ...word, text: 'is', start: token.start + pronoun.length });
  }
  // "how on earth could it...": a place after a question word is an intensifier, no region.
  const hits = lexicon.find(words.map((w) => w.text)).filter((h) => h.cls !== 'regions' || !afterQuestionWord(words, h));
  const of = (cls: string, key?: string) => hits.filter((h) => h.cls === cls && (key === undefined || h.key === key));
  const inside = (i: number, cls: string, key?: string) => of(cls, key).some((h) => h.first <= i && i <= h.last);
  const question = /\?\s*["”’)]*\s*$/u.test(text);
  const things = thingsOf(words, hits);
  return { text, words, hits, of, inside, things, question, questionNot: question ? negativeQuestionNot(words, things) : -1, opening: openingOf(text, words) };
}

/** Entities, regions (as the temperature of that region) and pronouns, left to right. */
function thingsOf(words: readonly Word[], hits: readonly LexHit[]): Thing[] {
  const things: Thing[] = [];
  const regions = hits.filter((h) => h.cls === 'regions');
  for (const h of hits) {
    const inLonger = hits.some((o) => o !== h && o.cls === 'entities' && o.first <= h.first && o.last >= h.last && o.last - o.first > h.last - h.first);
    if (h.cls === 'entities' && PARTICIPANTS.has(h.key) && !inLonger) {
      // "at the other end of the globe, where Antarctic temperatures dropped": the nearest region.
      const distance = (r: LexHit) => Math.min(Math.abs(r.first - h.first), Math.abs(r.last - h.first));
      const near = regions.filter((r) => Math.abs(r.first - h.first) <= 3 && words[r.first]?.clause === words[h.first]?.clause).sort((a, b) => distance(a) - distance(b))[0];
      things.push({ kind: h.key, first: h.first, last: h.last, ...(h.key === 'temperature' && near !== undefined ? { region: near.key } : {}) });
    } else if (h.cls === 'changes' && (h.key === 'warm' || h.key === 'cool') && isNominal(words, h.first)) {
      // "the warming", "Antarctic cooling": a temperature change named as a thing.
      const near = regions.find((r) => r.last === h.first - 1 || r.first === h.last + 2);
      things.push({ kind: 'temperature', first: h.first, last: h.last, ...(near === undefined ? {} : { region: near.key }) });
    } else if (h.cls === 'regions' && !hits.some((o) => o.cls === 'entities' && o.key === 'temperature' && Math.abs(o.first - h.first) <= 3 && words[o.first]?.segment === words[h.first]?.segment) && !ownsNext(words, hits, h) && !insideRegion(hits, h)) {
      // A temperature word near the region names it only in the region's own segment: in "global temp
      // lagged co2, antarctica warmed earlier" Antarctica is a temperature of its own.
      things.push({ kind: 'temperature', region: h.key, first: h.first, last: h.last });
    }
  }
  // "The orbit wobbles; that is the whole story": a "that" opening its segment before a copula stands for what came before.
  const demonstrative = (i: number) => i === 0 || (words[i - 1]?.segment !== words[i]?.segment && ['is', 'was'].includes(words[i + 1]?.text ?? ''));
  // "this wobble of the orbit", "those ice ages": a demonstrative just before a thing is its determiner, no pronoun.
  const determiner = (w: Word, i: number) => DEMONSTRATIVES.has(w.text) && things.some((t) => t.first === i + 1);
  words.forEach((w, i) => {
    if (PRONOUNS.has(w.text) && !(w.text === 'that' && !demonstrative(i)) && !determiner(w, i) && !things.some((t) => t.first <= i && i <= t.last)) {
      things.push({ kind: 'pronoun', first: i, last: i });
    }
  });
  return things.sort((a, b) => a.first - b.first || b.last - a.last).filter((t, k, all) => k === 0 || t.first > (all[k - 1] as Thing).last);
}

const QUESTION_WORDS = new Set(['how', 'what', 'why', 'who', 'where', 'when', 'which', 'whatever', 'however']);

/** "how on earth", "why in the world": a place after a question word is an intensifier, no region. */
function afterQuestionWord(words: readonly Word[], h: LexHit): boolean {
  const k = ['on', 'in'].includes(words[h.first - 1]?.text ?? '') ? h.first - 1 : words[h.first - 1]?.text === 'the' && words[h.first - 2]?.text === 'in' ? h.first - 2 : -1;
  return k > 0 && QUESTION_WORDS.has(words[k - 1]?.text ?? '');
}

/** True when region hit `h` of `s` only owns the entity beside it ("Earth's orbit", "the tilt of the Earth"). */
export function regionOwnsEntity(s: ReadSentence, h: LexHit): boolean {
  return ownsNext(s.words, s.hits, h);
}

/** "Earth" inside "the Earth": a region hit within a longer one is that one. */
function insideRegion(hits: readonly LexHit[], h: LexHit): boolean {
  return hits.some((o) => o !== h && o.cls === 'regions' && o.first <= h.first && o.last >= h.last && o.last - o.first > h.last - h.first);
}

/**
 * "the Earth's orbit", "the planet's oceans", "the tilt of the Earth": a region that owns an entity
 * (in the possessive just before it, or after "of" just after it) is no temperature of its own.
 */
function ownsNext(words: readonly Word[], hits: readonly LexHit[], region: LexHit): boolean {
  const last = words[region.last]?.text ?? '';
  // "the tilt of the Earth": a region after "of" that follows an entity owns nothing; the entity is its.
  const before = words[region.first - 1]?.text;
  if (before === 'of' && hits.some((o) => o.cls === 'entities' && o.key !== 'temperature' && o.last === region.first - 2)) return true;
  const possessive = /['’]s$/u.test(last) || /^['’]s$/u.test(words[region.last + 1]?.text ?? '');
  if (!possessive) return false;
  const from = region.last + (/^['’]s$/u.test(words[region.last + 1]?.text ?? '') ? 2 : 1);
  return hits.some((o) => o.cls === 'entities' && o.key !== 'temperature' && o.first >= from && o.first <= from + 1);
}

/** "the warming", "warming of the ocean", "Antarctic cooling": a change word used as a noun. */
function isNominal(words: readonly Word[], i: number): boolean {
  const w = words[i]?.text ?? '';
  const before = words[i - 1]?.text ?? '';
  return (w.endsWith('ing') && !['is', 'are', 'was', 'were', 'be', 'been', 'keep', 'kept', 'started', 'began'].includes(before)) || ['the', 'a', 'this', 'that', 'its'].includes(before);
}

/** Words that deny what follows within their segment. */
export const NEGATIONS = new Set(['not', 'no', 'zero', 'never', 'nothing', 'none', 'neither', 'nor', 'without', 'hardly', 'barely', 'nobody', 'nowhere']);
/** Words that open a correction after a negation: "not a cause, only a bystander". */
const CORRECTIVES = new Set(['only', 'just', 'merely', 'simply', 'but', 'rather', 'instead', 'purely']);

/** True when a correction opens between the negation at `k` and word `i`, after a comma or "but". */
function corrected(s: ReadSentence, k: number, i: number): boolean {
  for (let j = k + 2; j <= i; j += 1) {
    const w = s.words[j]?.text ?? '';
    if (!CORRECTIVES.has(w)) continue;
    if (w === 'but' || s.words[j]?.segment !== s.words[j - 1]?.segment) return true;
  }
  return false;
}

/** Words that open a clause of their own after an answer's "no" ("no the bubbles are older", "No, it ..."). */
const CLAUSE_OPENERS = new Set(['the', 'a', 'an', 'this', 'that', 'these', 'those', 'it', 'they', 'we', 'i', 'you', 'he', 'she', 'there', 'its', 'their', 'actually', 'in', 'so']);

/**
 * "no the bubbles are older than the ice", "No, it was the other way": a "no" opening its clause
 * before a comma or a clause of its own answers what was asked; it denies nothing in that clause.
 * "No bubble is older than its ice" denies: "no" there determines its noun.
 */
function isAnswerNo(s: ReadSentence, k: number): boolean {
  const w = s.words[k];
  const next = s.words[k + 1];
  if (w?.text !== 'no' || next === undefined) return false;
  const opens = k === s.opening || s.words[k - 1]?.clause !== w.clause;
  return opens && (next.segment !== w.segment || CLAUSE_OPENERS.has(next.text));
}

/** Words that deny an effect by saying it fell short ("unable to end", "insufficient to explain"). */
const LIMITS = new Set(['unable', 'insufficient', 'failed', 'fails', 'fail', 'negligible', 'irrelevant', 'unimportant', 'insignificant', 'immaterial']);
/**
 * "too late to have caused it", "too weak to matter", "far too small to explain": "too", a word or
 * two, then "to" before word `i` states that the verb after it did not happen, whatever the adjective.
 */
function tooToVerb(s: ReadSentence, k: number, i: number): boolean {
  if (s.words[k]?.text !== 'too') return false;
  const segment = s.words[k]?.segment;
  for (let j = k + 2; j <= Math.min(k + 3, i - 1); j += 1) {
    if (s.words[j]?.segment !== segment) return false;
    if (s.words[j]?.text === 'to') return true;
  }
  return false;
}

/** Words that may stand between a contrast and the word it sets aside ("rather than a real cause"); "rather than just an effect" sets aside only the "just". */
const ASIDE_FILLERS = new Set(['a', 'an', 'the', 'any', 'its', 'their', 'real', 'true', 'main', 'primary', 'direct']);

/** Possessive determiners among the fillers: they stand before the noun set aside. */
const POSSESSIVE_DETERMINERS = new Set(['its', 'their']);

/** "one of" at word `j`: a partitive that takes one member of the plural noun after it ("one of its drivers"). */
export function isPartitiveOne(s: ReadSentence, j: number): boolean {
  return s.words[j]?.text === 'one' && s.words[j + 1]?.text === 'of';
}

/**
 * "rather than" or "instead of" at word `k` (its last word) sets aside word `i`: only articles and
 * restricting words stand between, no thing.
 */
function setAside(s: ReadSentence, k: number, i: number): boolean {
  const w = s.words[k]?.text;
  const pair = (w === 'than' && s.words[k - 1]?.text === 'rather') || (w === 'of' && s.words[k - 1]?.text === 'instead');
  // "rather than one of its causes": a partitive "one of" before the fillers sets aside the noun it takes a member of.
  if (!pair || i - k > 4 + (isPartitiveOne(s, k + 1) ? 2 : 0)) return false;
  for (let j = k + 1; j < i; j += 1) {
    if (isPartitiveOne(s, j) || isPartitiveOne(s, j - 1)) continue;
    // A possessive determiner ("its", "their") is read as a pronoun thing, but it names no rival here.
    const text = s.words[j]?.text ?? '';
    if (!ASIDE_FILLERS.has(text) || (!POSSESSIVE_DETERMINERS.has(text) && s.things.some((t) => t.first <= j && j <= t.last))) return false;
  }
  // Only a part in a cause is set aside so: "releases CO2 rather than absorbing it" states one uptake, read by the relation reader.
  return !s.things.some((t) => t.first <= i && i <= t.last) && s.inside(i, 'causes');
}

/**
 * "turned up too late to the party to have done any of the heating", "too late in the thaw to have
 * done": "too" and its adjective, with a phrase of their own between them and the infinitive of word
 * `i`, deny the infinitive as "too late to have done" does, from farther than the denial window
 * reaches (within the segment, at most ten words back).
 */
function farTooTo(s: ReadSentence, i: number, window: number): boolean {
  const inf = s.words[i - 1]?.text === 'to' ? i - 1 : s.words[i - 1]?.text === 'have' && s.words[i - 2]?.text === 'to' ? i - 2 : -1;
  if (inf < 0) return false;
  const segment = s.words[i]?.segment;
  for (let k = i - window - 1; k >= Math.max(0, i - 10); k -= 1) {
    if (s.words[k]?.segment !== segment) return false;
    if (s.words[k]?.text === 'too' && k + 1 < inf) return true;
  }
  return false;
}

/**
 * The "not" of a negative question ("Doesn't that prove it?", "..., so doesn't the lag settle it?",
 * "I might be wrong, but doesn't CO2 ...?"): an auxiliary and "not" opening the sentence or a segment,
 * past one word that opens the segment and names no thing (a joining word). -1 without one.
 */
function negativeQuestionNot(words: readonly Word[], things: readonly Thing[]): number {
  return words.findIndex((w, k) => {
    const aux = k - 1;
    if (w.text !== 'not' || aux < 0 || !AUXILIARIES.has(words[aux]?.text ?? '')) return false;
    const opens = (i: number) => i === 0 || words[i - 1]?.segment !== words[i]?.segment;
    return opens(aux) || (aux >= 1 && opens(aux - 1) && words[aux - 1]?.segment === words[aux]?.segment && !things.some((t) => t.first <= aux - 1 && aux - 1 <= t.last));
  });
}

/** Determiners that may open a subject's noun phrase before its thing ("the orbital changes", "its tilt"): English grammar, common practice. */
const SUBJECT_DETERMINERS = new Set(['the', 'a', 'an', 'its', 'their', 'this', 'that', 'these', 'those', 'our']);

/**
 * Where the clause holding word `i` begins when it is spliced onto the one before by a comma alone
 * and names a subject of its own before `i` ("it didn't drive anything, the orbital changes did all
 * the work"): a denial of the clause before does not reach into it. -1 otherwise: a parenthetical
 * ("cannot, by definition, have caused") or a verb phrase after a comma has no subject of its own.
 */
export function splicedClauseStart(s: ReadSentence, i: number): number {
  const segment = s.words[i]?.segment;
  const first = s.words.findIndex((w) => w.segment === segment);
  if (first <= 0 || first >= i) return -1;
  const gap = s.text.slice(s.words[first - 1]?.end ?? 0, s.words[first]?.start ?? 0);
  if (!gap.includes(',')) return -1;
  const opening = SUBJECT_DETERMINERS.has(s.words[first]?.text ?? '') ? first + 1 : first;
  const subject = s.things.find((t) => t.first === opening || t.first === first);
  return subject !== undefined && subject.last < i ? first : -1;
}

/** Verbs that deny their object ("rules out CO2 as a driver"). */
export const DENIALS = new Set(['rule', 'rules', 'ruled', 'ruling', 'exclude', 'excludes', 'excluded', 'deny', 'denies', 'denied', 'disprove', 'disproves', 'disproved', 'refute', 'refutes', 'refuted', 'dismiss', 'dismisses', 'dismissed', 'exonerate', 'exonerates', 'exonerated', 'acquit', 'acquits', 'acquitted', 'eliminate', 'eliminates', 'eliminated', 'eliminating', 'discount', 'discounts', 'discounted', 'strike', 'strikes', 'struck', 'cross', 'crosses', 'crossed']);
/** Denials that need the particle after them ("struck off the list", "crossed off"). */
const WITH_OFF = new Set(['strike', 'strikes', 'struck', 'cross', 'crosses', 'crossed']);
/** How many words of an object may stand between a phrasal denial and its particle ("rule **the gas** out"). */
const PARTICLE_GAP = 3;

/**
 * The particle a phrasal denial at `k` needs ("out" for "rule", "off" for "strike"), just after it or
 * past a short object in its segment ("rule CO2 out", "struck the orbit off"): the index of the
 * particle, else -1. A denial that needs no particle has it at `k`.
 */
function denialParticle(s: ReadSentence, k: number): number {
  const verb = s.words[k]?.text ?? '';
  const particle = verb.startsWith('rul') ? 'out' : WITH_OFF.has(verb) ? 'off' : undefined;
  if (particle === undefined) return k;
  for (let j = k + 1; j <= k + 1 + PARTICLE_GAP && j < s.words.length; j += 1) {
    if (s.words[j]?.segment !== s.words[k]?.segment) return -1;
    if (s.words[j]?.text === particle) return j;
  }
  return -1;
}

/**
 * How many denials stand before word `i` in its clause, within `window` words and not past a linking
 * word such as "so" or "because" (odd: denied).
 * "ruled out" counts through its verb; "not only" is no denial.
 */
export function denialsBefore(s: ReadSentence, i: number, window = 6): number {
  let count = farTooTo(s, i, window) ? 1 : 0;
  const clause = s.words[i]?.clause;
  // "struck off the list of suspects for what melted...": a phrasal denial reaches past its own object.
  // A phrasal denial counted past the window brings the words that govern it ("cannot be struck off").
  let reach = i - window;
  const spliced = splicedClauseStart(s, i);
  for (let k = i - 1; k >= 0 && k >= i - window - 7; k -= 1) {
    const w = s.words[k] as Word;
    // "cannot, by definition, have caused": a denial reaches across a parenthetical comma, not past "so" or "because".
    if (w.clause !== clause || LINKS.has(s.words[k + 1]?.text ?? '') && k + 1 < i) break;
    // "it didn't drive anything, the orbit did all the work": not into a clause spliced on with a subject of its own.
    if (k < spliced) break;
    const phrasal = DENIALS.has(w.text) && denialParticle(s, k) > k;
    if (k < reach && !(phrasal && k >= i - window - 4)) continue;
    if (phrasal) reach = Math.min(reach, k - 3);
    if (k === s.questionNot) continue;
    const after = s.words[k + 1]?.text ?? '';
    // "Orbital changes, not CO2, caused it": a "not" that sets one thing against another denies no verb.
    const contrast = w.text === 'not' && s.things.some((t) => (t.first === k + 1 || t.first === k + 2) && s.words[t.last + 1]?.segment !== s.words[t.last]?.segment && t.last < i);
    if (contrast) continue;
    // "not a cause, only a bystander", "not the driver but a passenger": a correction after a break
    // states what is, and the negation before it does not reach it.
    if (NEGATIONS.has(w.text) && corrected(s, k, i)) continue;
    // "nothing else", "nothing more", "no other": a negation inside a restricting phrase restricts, it denies nothing.
    const restricting = s.inside(k, 'exclusive') || (w.text === 'nothing' && (after === 'else' || after === 'but'));
    if (NEGATIONS.has(w.text) && after !== 'only' && !(w.text === 'no' && after === 'doubt') && !restricting && !isAnswerNo(s, k)) count += 1;
    else if (LIMITS.has(w.text) || tooToVerb(s, k, i)) count += 1;
    // "rules out CO2", "doesn't rule CO2 out as a cause": the particle may follow a short object.
    else if (DENIALS.has(w.text) && denialParticle(s, k) >= 0) count += 1;
    // "so much for CO2 causing the warming": a dismissal.
    else if (w.text === 'much' && s.words[k - 1]?.text === 'so' && after === 'for') count += 1;
    // "an effect of the warming rather than a cause of it", "instead of driving it": the contrast
    // denies the word it stands just before (a thing between is what it sets aside: "temperature
    // rather than CO2 drove it").
    else if (setAside(s, k, i)) count += 1;
  }
  return count;
}
