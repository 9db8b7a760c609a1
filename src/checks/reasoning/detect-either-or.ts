/**
 * `logic.either-or-causation`: CO2 and temperature framed as alternatives, one direction asserted
 * and the other denied, when each drove the other.
 *
 *   "CO2 was an effect of the warming, not a cause."         temperature → co2 asserted; co2 → temperature denied
 *   "Temperature drives CO2, not the other way round."       the reverse denied
 *
 * A feedback, a loop or "both" in the sentence or its neighbours answers the framing, and passes.
 */
import { polarityAt } from '../../propositions/causes.js';
import type { Cause, LexHit, ReadSentence } from '../../propositions/index.js';
import { opensUtterance } from '../../prose/index.js';
import type { Cue, DetectInput, DetectorEntry } from './detector.js';
import { isCo2OnWarming, isWarmingOnCo2, isWarmingSide } from './queries.js';
import { roleKeptForToday } from './role-for-today.js';
import { choicePickedInSentence, eitherChoiceAsserted, pickedPart, roleChoiceEnd } from './role-choice.js';

const REVERSE = /\b(?:not|never|rather than|instead of)\s+(?:\w+\s+){0,2}(?:the other way (?:round|around|about)|vice versa|the reverse|the opposite way)\b|\b(?:one-way|one way street|only one way)\b/iu;

function detect({ index, own, read }: DetectInput): Cue[] {
  const here = read(index);
  if (here === undefined) return [];
  const loopAt = (i: number) => {
    const r = read(i);
    // "it cannot be both" denies the loop; "both" alone grants it.
    const both = r?.s.words.findIndex((w) => w.text === 'both') ?? -1;
    const bothGranted = r !== undefined && both >= 0 && !r.s.words.slice(Math.max(0, both - 3), both).some((w) => ['not', 'never', 'no'].includes(w.text));
    return r !== undefined && (r.props.causes.some((c) => c.role === 'feedback' && c.polarity === 'asserted' && !scareQuoted(r.s, c.start)) || bothGranted);
  };
  if (loopAt(index)) return [];
  const causes = here.props.causes.filter((c) => c.polarity !== 'open' && c.role !== 'start');
  const aboutCo2 = here.s.of('entities', 'co2').length > 0;
  // An unnamed agent denied beside an asserted "CO2 is an effect" is CO2 ("a consequence cannot be a cause").
  // Which side acts: CO2, or temperature (on CO2 or on what the sentence is about).
  const direction = (c: Cause) => {
    if (isCo2OnWarming(c) || (aboutCo2 && c.agent === undefined && c.polarity === 'denied')) return 'co2';
    // "temperature drives CO2"; "the driver of the glacial cycles was temperature rather than CO2".
    // "Temperature is the cause of the swings and the gas merely reads the gauge": temperature named the
    // cause of what is left unnamed, set against CO2 denied one.
    if (isWarmingOnCo2(c) || (isWarmingSide(c.agent) && c.patient !== undefined && c.patient !== c.agent)) return 'temperature';
    if (c.agent === 'temperature' && c.patient === undefined && c.polarity === 'asserted' && c.role === 'cause') return 'temperature';
    return undefined;
  };
  // "Either CO2 drives the climate or the climate drives CO2, and the cores settle it in favour of the
  // second": a sentence that picks one side is the draft's pick, whatever a neighbour grants.
  const picked = pickedSide(here.s, here.props.causes, direction);
  if (picked !== undefined) return [picked];
  // "whether CO2 was the cause or the effect ..., and the cores answer: it was the effect": a choice
  // of parts and its answer in one sentence (role-choice.ts).
  // "it's either the driver or the passenger, and the cores say passenger": the pronoun may stand for
  // the CO2 of the sentences just before (a post's lead-in too).
  // A neighbour answers only in the same voice: in a thread, the next reply is someone else's.
  // A list item or a post before this block (its lead-in) is a claim of its own, and answers nothing here.
  const sameVoice = (i: number) => i >= own && !opensUtterance((i > index ? read(i) : here)?.s.text ?? '');
  // The sentences a pronoun of a choice of parts may stand for: the few just before, and the next
  // one in the same voice (a post that names the gas after its opening line).
  const nextSame = sameVoice(index + 1) ? read(index + 1)?.s : undefined;
  const referents = [...earlierSentences(read, index).slice(0, PRONOUN_REACH), ...(nextSame === undefined ? [] : [nextSame])];
  const partAnswer = choicePickedInSentence(here.s, referents);
  if (partAnswer !== undefined) return [partAnswer];
  if ((sameVoice(index - 1) && loopAt(index - 1)) || (sameVoice(index + 1) && loopAt(index + 1))) return [];
  // "Back then CO2 was a result of the warming; today it's the cause": the cause kept for the present.
  const today = roleKeptForToday(here, sameVoice(index + 1) ? read(index + 1) : undefined);
  if (today !== undefined) return [today];
  const frame = framedInWords(here.s, earlierSentences(read, index));
  if (frame !== undefined) return [frame];
  // "it's either the cause or the effect, pick one": the choice of parts set up as exhaustive and said, not asked.
  const either = eitherChoiceAsserted(here.s, referents);
  if (either !== undefined) return [{ start: here.s.words[either.first]?.start ?? 0, end: here.s.words[either.last]?.end ?? here.s.text.length }];
  // The answer's own propositions take one side only: "The evidence points to passenger."
  const asserted = new Set(here.props.causes.filter((c) => c.polarity === 'asserted' && c.role !== 'start').map(direction).filter((d) => d !== undefined));
  const answer = answersEitherOr(read(index - 1), here.s.text, asserted.size === 1);
  if (answer) return [{ start: 0, end: here.s.text.length }];
  // "Was CO2 a driver of the warming, or merely a passenger? The record points to passenger.": the
  // sentence after a choice of parts picks one, by its part nouns or by causes of one direction.
  if (answersRoleChoice(read(index - 1), read(index - 2), here.s, asserted.size === 1)) return [{ start: 0, end: here.s.text.length }];
  // "it was warming that moved CO2, not CO2 that moved temperature": both directions set against
  // each other in one sentence, one set aside.
  const all = here.props.causes.filter((c) => c.role !== 'start' && direction(c) !== undefined);
  for (const first of all) {
    const second = all.find((c) => c.start > first.start && direction(c) !== direction(first));
    if (second === undefined) continue;
    // "..., not CO2 that moved temperature": the second direction itself is what "not" sets aside.
    const against = /(?:^|[,;]\s*|\s)(?:not|rather than|instead of)\s+(?:the\s+)?$/u.test(here.s.text.slice(first.end, second.start));
    if (against && first.polarity === 'asserted') return [{ start: first.start, end: second.end }];
  }
  for (const asserted of causes.filter((c) => c.polarity === 'asserted' && direction(c) !== undefined)) {
    const denied = causes.find((c) => c.polarity === 'denied' && direction(c) !== undefined && direction(c) !== direction(asserted));
    if (denied !== undefined) return [{ start: Math.min(asserted.start, denied.start), end: Math.max(asserted.end, denied.end) }];
    // "Either CO2 drives temperature or temperature drives CO2": two directions set up as a choice.
    const choice = causes.find((c) => c.polarity === 'asserted' && direction(c) !== undefined && direction(c) !== direction(asserted));
    if (choice !== undefined && joinedByOr(here.s, asserted, choice) && !here.s.question) {
      return [{ start: Math.min(asserted.start, choice.start), end: Math.max(asserted.end, choice.end) }];
    }
    const reverse = REVERSE.exec(here.s.text);
    if (reverse !== null && reverse.index >= asserted.end - 1) return [{ start: asserted.start, end: reverse.index + reverse[0].length }];
  }
  return [];
}

/** The most words a quotation may hold and still be a term held up, not a saying. */
const TERM_WORDS = 2;

/**
 * The word at `start` is a term held up in quotation marks ('"feedback" is a cope word', '"feedback"
 * lmao'): a quotation of one or two words in a sentence with words of its own mentions the term and
 * grants nothing.
 */
function scareQuoted(s: ReadSentence, start: number): boolean {
  const at = s.words.findIndex((w) => w.end > start);
  if (at < 0 || s.words[at]?.quoted !== true) return false;
  let first = at;
  while (first > 0 && s.words[first - 1]?.quoted === true) first -= 1;
  let last = at;
  while (last + 1 < s.words.length && s.words[last + 1]?.quoted === true) last += 1;
  return last - first + 1 <= TERM_WORDS && s.words.some((w) => w.quoted !== true);
}

/**
 * Two directions set up as a choice: an "or" stands between them, inside the stretch the two causes
 * cover ("Either the ocean warmed and released CO2, or CO2 warmed the ocean"). An "or" elsewhere in
 * the sentence ("..., so it's not one or the other") joins no choice of theirs, nor does one in the
 * words both causes share, joining two modifiers of a common agent ("CO2 and shrinking or growing
 * ice sheets then amplified the changes").
 */
function joinedByOr(s: ReadSentence, a: Cause, b: Cause): boolean {
  const shared: [number, number] = [Math.max(a.start, b.start), Math.min(a.end, b.end)];
  const inShared = (w: { start: number; end: number }) => w.start >= shared[0] && w.end <= shared[1];
  return s.words.some((w, i) => w.text === 'or' && w.start > Math.min(a.start, b.start) && w.end < Math.max(a.end, b.end) && !inShared(w) && !joinsModifiers(s, i));
}

/**
 * Words that open a verb's object or complement rather than stand as the head noun of a phrase:
 * determiners, pronouns and prepositions (English grammar, common practice).
 */
const OBJECT_OPENERS = new Set(['the', 'a', 'an', 'it', 'its', 'them', 'their', 'this', 'that', 'these', 'those', 'by', 'on', 'of', 'to', 'in', 'from', 'with', 'behind', 'after', 'before', 'each', 'one']);

/**
 * Whether the "or" at word `i` joins two participles that modify the noun after them, in a phrase
 * joined to another ("CO2 and spreading or shrinking ice", "CO2 and shrinking or growing ice
 * sheets"), not two verbs with an object ("driving or following the warming") nor a noun in -ing and
 * a new clause ("the warming or rising temperatures drove CO2").
 */
function joinsModifiers(s: ReadSentence, i: number): boolean {
  if (!['and', 'with', 'plus'].includes(s.words[i - 2]?.text ?? '')) return false;
  const before = s.words[i - 1]?.text ?? '';
  const after = s.words[i + 1]?.text ?? '';
  const head = s.words[i + 2]?.text;
  return before.endsWith('ing') && after.endsWith('ing') && head !== undefined && /^\p{L}/u.test(head) && !OBJECT_OPENERS.has(head) && s.words[i + 2]?.segment === s.words[i]?.segment;
}

/** How many sentences back a choice of parts told of "it" looks for the CO2 it stands for. */
const PRONOUN_REACH = 3;

/** How far back a frame that names neither side looks for the cause and CO2 it is about. */
const FRAME_REACH = 6;

/** The sentences before sentence `index` of its paragraph, nearest first, as far as FRAME_REACH. */
function earlierSentences(read: DetectInput['read'], index: number): ReadSentence[] {
  const out: ReadSentence[] = [];
  for (let i = index - 1; i >= 0 && i >= index - FRAME_REACH; i--) {
    const r = read(i);
    if (r !== undefined) out.push(r.s);
  }
  return out;
}

/**
 * The either/or frame stated in words (lexicon `causes.either-or`: "which of the two", "the two
 * roles exclude each other", "can't be both"), undenied, about a cause of CO2's: the sentence or one
 * before it names a cause and CO2. In a thread the frame often stands alone ("It can't be both.",
 * "its either a cause or an effect, cant be both") and takes its subject from the posts above: the
 * nearest earlier sentence of the paragraph that names CO2, and a cause there or in between.
 * "The two roles do not exclude each other" passes.
 */
function framedInWords(s: ReadSentence, earlier: readonly ReadSentence[]): Cue | undefined {
  const frame = s.of('causes', 'either-or').find((h) => polarityAt(s, h.first) === 'asserted');
  if (frame === undefined) return undefined;
  const causal = (r: ReadSentence | undefined) => r !== undefined && r.of('causes').some((h) => h.key !== 'either-or' && h.key !== 'passive' && h.key !== 'needed-without');
  const co2 = (r: ReadSentence | undefined) => r !== undefined && r.of('entities', 'co2').length > 0;
  if (co2(s)) {
    if (!causal(s) && !causal(earlier[0])) return undefined;
  } else {
    const at = earlier.findIndex(co2);
    // "The orbit kicked off each ending. So which is it: the orbit or the CO2? It can't be both.": a
    // question naming the gas asks about the cause told just before it.
    const reach = earlier[at]?.question === true ? at + 2 : at + 1;
    if (at < 0 || (!causal(s) && !earlier.slice(0, reach).some(causal))) return undefined;
  }
  const clause = s.words[frame.first]?.clause;
  const end = s.words.filter((w) => w.clause === clause).at(-1)?.end ?? s.text.length;
  return { start: s.words[frame.first]?.start ?? 0, end };
}

/**
 * A question that sets the two directions against each other ("...or did temperature drive CO2?"),
 * answered by picking one: in words ("the latter") or by asserting causes of one direction only
 * (`oneSide`: "In the ice, it is clearly an effect.").
 */
function answersEitherOr(question: ReturnType<DetectInput['read']>, text: string, oneSide: boolean): boolean {
  if (question === undefined || !question.s.question || !question.s.words.some((w) => w.text === 'or')) return false;
  const both = question.props.causes.some(isCo2OnWarming) && question.props.causes.some(isWarmingOnCo2);
  if (!both) return false;
  if (oneSide) return true;
  // "The cores give a clear answer: temperature." picks one side, as "the latter" does.
  const short = text.split(/\s+/u).length <= 12 && /\b(?:temperature|warming|co2|co₂|carbon dioxide)\b/iu.test(text) && !/\b(?:both|each|feedback|loop|and)\b/iu.test(text);
  return short || /\b(?:the (?:first|second|former|latter)|the one|only one)\b/iu.test(text);
}

/**
 * Whether `s` answers the choice of parts that the sentence before it offers and leaves open ("Was it
 * a cause or a consequence?", "People ask whether CO2 is a cause or an effect."), by holding one part
 * only or (`oneSide`) by asserting causes of one direction only.
 */
function answersRoleChoice(choice: ReturnType<DetectInput['read']>, before: ReturnType<DetectInput['read']>, s: ReadSentence, oneSide: boolean): boolean {
  if (choice === undefined || roleChoiceEnd(choice.s, before?.s) === undefined || choicePickedInSentence(choice.s) !== undefined) return false;
  if (s.words.some((w) => w.text === 'both') || s.of('causes', 'feedback').length > 0) return false;
  return pickedPart(s) !== undefined || oneSide;
}

/**
 * Both directions set up as a choice in one sentence, then one picked: "Ask whether CO2 pushes
 * temperature or temperature pushes CO2, and the ice answers: temperature".
 */
function pickedSide(s: ReadSentence, causes: readonly Cause[], side: (c: Cause) => string | undefined): Cue | undefined {
  const all = causes.filter((c) => c.role !== 'start' && side(c) !== undefined);
  for (const first of all) {
    const second = all.find((c) => c.start > first.start && side(c) !== side(first));
    if (second === undefined || !/\bor\b/u.test(s.text.slice(first.end, second.start + 12))) continue;
    // The answer starts past the second direction's own object ("...or temperature pushes CO2, and ...").
    const boundary = /[,;:—–]|\s(?:and|but|so)\s/u.exec(s.text.slice(second.end));
    if (boundary !== null && picksOne(s, second.end + boundary.index)) return { start: first.start, end: s.text.length };
  }
  return undefined;
}

/**
 * After a choice between the two directions, an answer that picks one: "the second", "in favour of
 * the latter", or a short answer naming one side only ("a one-word answer: temperature").
 */
function picksOne(s: ReadSentence, from: number): boolean {
  const rest = s.text.slice(from);
  const after = (h: LexHit) => (s.words[h.first]?.start ?? -1) >= from;
  // A feedback or a loop (lexicon `causes.feedback`: "each other", "both ways", "mutual") answers both.
  if (s.of('causes', 'feedback').some(after) || /\bboth\b/iu.test(rest)) return false;
  if (/\b(?:the (?:first|second|former|latter)|in favou?r of)\b/iu.test(rest)) return true;
  // The sides as the lexicon names them: temperature (or a warming) and CO2.
  const temperature = [...s.of('entities', 'temperature'), ...s.of('changes', 'warm'), ...s.of('changes', 'cool')].some(after);
  const co2 = s.of('entities', 'co2').some(after);
  const answered = /[:—–]|\banswers?\b|\bsays?\b/iu.test(rest) || s.of('proof', 'all').some(after);
  return temperature !== co2 && answered;
}

/** The detector entry for the registry. */
export const eitherOrCausation: DetectorEntry = { detect, keys: [] };
