/**
 * Stance: how a sentence holds what it says. Only an asserted claim (or the answer a rhetorical
 * question asserts) is the writer's own; a reported, quoted, myth-labelled, asked, hypothetical or
 * superseded one is not, unless the draft endorses it ("...and they are right").
 *
 *   "Myth: CO2 lags, so it cannot be the cause."            myth
 *   "Some commentators claim the lag rules CO2 out."         reported
 *   "If CO2 trails temperature, how could it be the cause?"  rhetorical (asserts: it is not)
 *   "Doesn't the lag prove CO2 is not a cause? No: ..."      asked (the next sentence answers)
 */
import { isByline } from '../prose/byline.js';
import type { BlockKind } from '../types.js';
import type { LexHit } from './lexicon.js';
import type { ReadSentence } from './sentence.js';

export const STANCES = ['asserted', 'rhetorical', 'reported', 'quoted', 'myth', 'asked', 'hypothetical', 'superseded', 'marked'] as const;
export type StanceKind = (typeof STANCES)[number];

/** The stance of one sentence, and whether the draft endorses it anyway. */
export interface SentenceStance {
  kind: StanceKind;
  endorsed: boolean;
  /** For a rhetorical question: `how` flips what it asks ("how could it be...?" asserts it is not). */
  flips: boolean;
  /**
   * For a question that follows a statement in the same sentence ("The air is older than the ice,
   * so how can you trust it?"): where the question starts. What ends before it is the premise, the
   * writer's own claim.
   */
  questionFrom?: number;
  /**
   * For a view made earlier by the sentence after it, or a question reported before its answer
   * ("People ask whether ..., and the cores answer: ...") ("Studies in 2001 put the lag at 800 years.
   * Later work ..."): where the view ends. Words after it (an apposition of the writer's own: ", a
   * deglaciation that ended ...") stay the draft's claim.
   */
  viewEnd?: number;
  /**
   * The quotations the sentence names rather than says, as spans of its text: 'His "CO2 follows"
   * line ...', '"CO2 lags, so it can't be the cause" is the oldest one in the book', 'The line I
   * hear most is "..."'. A flag on words inside one is the quoted speaker's, whatever the stance of
   * the rest of the sentence.
   */
  named?: { start: number; end: number }[];
}

/** What around a sentence bears on its stance. */
export interface StanceContext {
  blockKind?: BlockKind;
  /** The heading the sentence's block sits under. */
  heading?: string;
  /** The block carries the deliberate-quotation marker (`<!-- firnline: reported -->`). */
  marked?: boolean;
  /** A block quote that is a post under its byline or holds a passage of its own, repeating nothing said before: a voice of the draft (prose/reply-quote.ts isVoicedQuote). */
  voiced?: boolean;
  /** The block's lines that a plain-text reply quotes from the post it answers (prose/reply-quote.ts quotesEarlierLine). */
  quotedLines?: readonly string[];
  /** The next sentence of the paragraph, read (it can answer a question or endorse a report). */
  next?: ReadSentence;
  /** The paragraph's first sentence, read, when it is not this one (a block quote's label). */
  first?: ReadSentence;
  /** The sentence just before in the paragraph: a label standing as a sentence of its own ("Myth."). */
  previous?: ReadSentence;
}

/** Words that join a question to the statement before it ("..., so how can you trust it?"). */
const JOINS = new Set(['so', 'and', 'but', 'then', 'or', 'yet']);
const AUX = new Set(['is', 'does', 'did', 'was', 'are', 'do', 'can', 'could', 'would', 'should', 'has', 'have', 'were', 'will']);
const WH = new Set(['how', 'why']);
/** Words that open a question after a joining word ("..., so which is it?", "..., so maybe we ...?"). */
const JOINED_OPENERS = new Set(['which', 'what', 'who', 'maybe', 'perhaps']);
/**
 * Subjects whose report the writer relies on rather than answers. "The release itself concludes
 * that...": a source stressed by "itself" is the draft's own or one it cites as authority (an outside
 * voice named by lexicon `stance.reporters`, "the op-ed itself claims", stays a report).
 */
const AUTHORITIES = new Set(['itself', 'we', 'i', 'scientists', 'researchers', 'study', 'studies', 'data', 'evidence', 'cores', 'core', 'record', 'records', 'team', 'authors', 'our', 'measurements', 'this', 'that', 'it', 'which', 'analysis', 'results', 'paper', 'ipcc', 'report', 'assessment', 'lag', 'physics']);
/** The writer as the subject right before a report verb ("I wrote", "we argued"): English's first-person pronouns. */
const WRITER = new Set(['i', 'we']);
/** Whom a record or the writer tells ("tells us that"): no outside source. */
const SELF = new Set(['us', 'me', 'you', 'is', 'was', 'are']);
/**
 * What a sentence says of a quotation it opens with: '"CO2 lagged, so it can't have warmed anything"
 * is the oldest one in the book'. The quotation is named, not asserted (English's copulas and verbs
 * of seeming, common practice of grammar).
 */
const SAID_OF = new Set(['is', 'was', 'remains', 'sounds', 'seems', 'has', 'gets', 'keeps', 'makes', 'became', 'becomes']);
/** Verbs of quotative inversion: '"CO2 lagged, so it can't be the driver," runs the line' (goes, went, ran). */
const QUOTATIVE = new Set(['runs', 'ran', 'goes', 'went']);
/** Copulas before a quotation that a noun before them names ("The line I hear most is "...""). */
const COPULAS = new Set(['is', 'was', 'are', 'were']);
const ANSWER_OPENERS = new Set(['no', 'not', 'nope', 'actually', 'yes', 'well', 'short', 'a', 'answer', 'in', 'it', 'they', 'that', 'this', 'quite', 'hardly', 'far', 'nothing', 'partly', 'only', 'both', 'neither', 'sort', 'kind']);
/** Response words that answer a yes-no question outright ("Not quite.", "Nope,", "Actually, ..."): English grammar, common practice. */
const RESPONSE_WORDS = new Set(['no', 'not', 'nope', 'nah', 'yes', 'yeah', 'yep', 'yup', 'actually', 'correct', 'wrong', 'exactly', 'true', 'false', 'indeed']);
const LABEL = /^\s*(?:[*_#>\s]*)(myth|misconception|claim|the claim|fiction|false|what (?:they|you|people|some) (?:say|hear|claim)|you may hear|you might hear|you'll hear|the myth|the misconception|misunderstanding|mistake|rumou?r)\b(?:[^:.]{0,12}:|[*_]*\.)/iu;
const FACT_LABEL = /^\s*(?:[*_#>\s]*)(fact|reality|the facts?|the science|the evidence|truth|answer|a)\b(?:[^:.]{0,12}:|[*_]*\.(?=[*_\s]))/iu;

/** A forum quotation's opening tag ("[quote]", "[quote=name]"), common practice of forum software. */
const QUOTE_TAG = /^\s*\[quote(?:[=\s][^\]\n]*)?\]/iu;

/** The stance of `s` in its context. */
export function stanceOf(s: ReadSentence, context: StanceContext = {}): SentenceStance {
  const named = namedQuotations(s);
  const stance = sentenceStance(s, context);
  return named.length === 0 ? stance : { ...stance, named };
}

function sentenceStance(s: ReadSentence, context: StanceContext): SentenceStance {
  const endorsed = s.of('stance', 'endorse').length > 0 || endorsesPerson(s, s.words.length) || (context.next !== undefined && (context.next.of('stance', 'endorse').some((h) => h.first <= 4) || endorsesPerson(context.next, 6)));
  const make = (kind: StanceKind, flips = false): SentenceStance => ({ kind, endorsed: kind !== 'asserted' && endorsed, flips });
  if (context.marked === true) return make('marked');
  // A block quote of one sentence, or a reply repeating words said earlier in the draft, quotes it; a
  // block quote that holds a passage of its own (a reader's letter, a comment, a speaker's lines) is
  // a voice of the draft, read like any utterance by what its own words mark (quotation marks, a
  // myth label, a report). One that opens with a byline ("BigSkyBarb · 5h") or a label of its own
  // ("Did you know?") is in its writer's voice.
  if (context.blockKind === 'blockquote' && context.voiced !== true && !isCallout(context.first) && !isByline(context.first?.text ?? s.text)) return make('quoted');
  // "> so the core goes back 800,000 yrs" under the post that said it: a reply quoting what it answers.
  if (context.quotedLines?.includes(s.text) === true) return make('quoted');
  // "[quote=fen_walker]the air is older than the ice[/quote]": forum software's quotation of the post
  // a reply answers, the reply's words after it.
  if (QUOTE_TAG.test(s.text)) return make('quoted');
  // "**Myth.** CO2 lags, so ...": a label that ends with a full stop is a sentence of its own, and labels the one after it.
  const label = bareLabel(context.previous);
  if (FACT_LABEL.test(s.text) || label === 'fact') return make('asserted');
  if (LABEL.test(s.text) || label === 'myth' || isMythHeading(context.heading) || (context.blockKind === 'heading' && s.of('stance', 'myth').length > 0)) return make('myth');
  const quotedWords = s.words.filter((w) => w.quoted).length;
  if (s.words.length > 0 && quotedWords / s.words.length >= 0.6 && !isLabelledUtterance(s)) return make(insiderSpeaks(s) ? 'asserted' : 'quoted');
  if (opensWithNamedQuotation(s)) return make('quoted');
  if (s.question) return questionStance(s, context, make);
  if (isTrueOrFalseItem(s.text) || (context.next !== undefined && TRUE_OR_FALSE_ALONE.test(context.next.text)) || asksWhether(s)) return make('asked');
  if (isReported(s)) {
    // "People ask me whether CO2 was the cause or the effect, and the cores answer that: ...": a
    // question reported ends at its clause; the answer joined after it is the writer's own.
    const answerFrom = answerAfterReportedQuestion(s);
    return answerFrom === undefined ? make('reported') : { ...make('reported'), viewEnd: answerFrom };
  }
  if (s.of('stance', 'myth').length > 0) return make('myth');
  if (s.of('stance', 'superseded').length > 0 || isFormerOwnView(s)) return make('superseded');
  const viewEnd = outdatedViewEnd(s, context.next);
  if (viewEnd !== undefined) return { ...make('superseded'), viewEnd };
  if (isHypothetical(s)) {
    // "If CO2 had driven the ice ages it would have moved first, and it didn't, so the orbit did the
    // work": the conclusion drawn after the supposed case is the writer's own.
    const conclusion = conclusionAfterSupposition(s);
    return conclusion === undefined ? make('hypothetical') : { ...make('hypothetical'), viewEnd: conclusion };
  }
  return make('asserted');
}

/**
 * The quotations of two words or more that `s` names instead of saying them: one followed by a word
 * that names a saying (lexicon `stance.quotation-names`: "line", "slogan", "argument"), by a copula
 * or verb of seeming ("is the oldest one in the book", "gets said a lot") or by a verb of quotative
 * inversion ("runs a line"); or one that a saying's name before it introduces across a copula or a
 * colon ("The line I hear most is "..."", "the usual refrain: "..."").
 */
function namedQuotations(s: ReadSentence): { start: number; end: number }[] {
  const names = s.of('stance', 'quotation-names');
  const spans: { start: number; end: number }[] = [];
  for (let i = 0; i < s.words.length; ) {
    if (s.words[i]?.quoted !== true) { i++; continue; }
    let j = i;
    while (s.words[j + 1]?.quoted === true) j++;
    const after = s.words[j + 1];
    const before = s.words[i - 1];
    const namedAfter = after !== undefined && (SAID_OF.has(after.text) || QUOTATIVE.has(after.text) || names.some((h) => h.first === j + 1));
    const gap = before === undefined ? '' : s.text.slice(before.end, s.words[i]?.start ?? before.end);
    const introduced = before !== undefined && (COPULAS.has(before.text) || gap.includes(':')) && names.some((h) => h.last < i);
    if (j > i && (namedAfter || introduced)) spans.push({ start: s.words[i]?.start ?? 0, end: s.words[j]?.end ?? 0 });
    i = j + 1;
  }
  return spans;
}

/** A sentence that opens with a quotation of three words or more and then says something of it ("... is a myth"). */
function opensWithNamedQuotation(s: ReadSentence): boolean {
  const run = s.words.findIndex((w) => w.quoted !== true);
  return run >= 3 && SAID_OF.has(s.words[run]?.text ?? '');
}

/**
 * "b) Warm water holds more CO2 than cold water. T / F": a statement set for the reader to judge, as
 * quizzes and worksheets print it (common practice), asserts nothing.
 */
function isTrueOrFalseItem(text: string): boolean {
  return /(?:^|[\s(])(?:T\s*\/\s*F|true\s*(?:\/|or)\s*false)\s*[)?.!]*\s*$/iu.test(text);
}

/** The true-or-false mark standing as a sentence of its own after the statement it asks about. */
const TRUE_OR_FALSE_ALONE = /^[\s([]*(?:T\s*\/\s*F|true\s*(?:\/|or)\s*false)\s*[)\]?.!]*\s*$/iu;

/**
 * "One reader asked whether the lag means CO2 cannot warm anything": a verb of reporting or asking
 * followed by "whether" (an indirect yes-no question in English grammar, common practice) asks
 * what follows it and asserts nothing of it. Not a question between two alternatives ("whether A
 * or B"), which the sentence may go on to answer.
 */
function asksWhether(s: ReadSentence): boolean {
  return s.of('stance', 'report-verbs').some((v) => {
    const at = s.words.findIndex((w, i) => i > v.last && i <= v.last + 3 && w.text === 'whether');
    // "asks whether CO2 drives temperature or temperature drives CO2, and the cores settle it: ...":
    // a question between two answers is the either/or frame, which the sentence goes on to answer.
    return at >= 0 && !s.words.slice(at + 1).some((w) => w.text === 'or');
  });
}

/** Whether `s` is a label and nothing more ("Myth.", "Fact.", "The claim."): which one. */
function bareLabel(s: ReadSentence | undefined): 'myth' | 'fact' | undefined {
  if (s === undefined || s.words.length === 0 || s.words.length > 3) return undefined;
  const text = `${s.text.trimEnd()} `;
  if (FACT_LABEL.test(text)) return 'fact';
  if (LABEL.test(text)) return 'myth';
  return undefined;
}

function questionStance(s: ReadSentence, context: StanceContext, make: (k: StanceKind, flips?: boolean) => SentenceStance): SentenceStance {
  const first = s.words[0]?.text ?? '';
  if (first === 'q' || isReported(s)) return make('asked');
  // "the question she hears at every talk: if CO2 rose after ..., how can it be a cause?": a question
  // that a saying's name before a colon introduces is someone's question, set out to be answered.
  // Any colon after the name counts: a speaker's label may hold the first ("ROZ: Okay, the question we get every week: ...?").
  if (s.of('stance', 'quotation-names').some((h) => s.text.indexOf(':', s.words[h.last]?.end ?? Infinity) > 0)) return make('asked');
  // "Did you know the poles swing less?": a teaser that states its content as a fact.
  if ((first === 'did' || first === 'do') && s.words[1]?.text === 'you' && s.words[2]?.text === 'know') return make('asserted');
  const next = context.next;
  // "[18:21] Jess: no, ...", "↳ @lin: Easily, ...": the answer opens past its speaker's label, and
  // another speaker taking the floor right after a question answers it.
  const answeredNext = next !== undefined && (ANSWER_OPENERS.has(next.words[0]?.text ?? '') || ANSWER_OPENERS.has(next.words[next.opening]?.text ?? '') || anotherVoice(s.text, next.text));
  // "That curve is the whole planet's temperature, isn't it?": a tag question asks the listener to
  // confirm the statement before it, which the speaker holds (English grammar, common practice),
  // unless the next sentence answers it ("Not quite. ..."), as an answered question is.
  if (isTagQuestion(s) && !answeredNext) return make('asserted');
  // A segment opens a question with a wh-word or an auxiliary, after a joining word if any.
  const opens = (i: number) => {
    const at = JOINS.has(s.words[i]?.text ?? '') ? i + 1 : i;
    return (i === 0 || s.words[i - 1]?.segment !== s.words[i]?.segment) && s.words[at]?.segment === s.words[i]?.segment ? at : -1;
  };
  const how = s.words.some((w, i) => {
    const at = opens(i);
    return at >= 0 && WH.has(s.words[at]?.text ?? '') && AUX.has(s.words[pastIntensifier(s, at + 1)]?.text ?? '');
  });
  // "Doesn't that prove it?", "..., so doesn't the lag settle it?": a negative question, at the opening or after a joining word.
  const negative = s.questionNot > 0;
  // "X, so how can you trust it?", "X, so what's the fuss?", "X, right?": a question after a
  // statement leaves the statement asserted (a trailing tag asks only for agreement).
  // "..., so which is it?", "..., so maybe we drop the point?": after a joining word, a question word
  // of any kind or a word of proposing opens the question too.
  const joined = (at: number) => JOINED_OPENERS.has(s.words[at]?.text ?? '') && JOINS.has(s.words[at - 1]?.text ?? '');
  const opened = s.words.findIndex((_, i) => {
    const at = opens(i);
    return at >= 0 && (WH.has(s.words[at]?.text ?? '') || AUX.has(s.words[at]?.text ?? '') || isPremiseQuestionWord(s.words[at]?.text ?? '') || joined(at));
  });
  // A tag answered yes or no by the next sentence ("..., right?" "Not quite. ...") was put up to be
  // answered, as an interviewer prompts a guest; one that the next voice merely goes on from keeps
  // its statement.
  const directAnswer = next !== undefined && (RESPONSE_WORDS.has(next.words[0]?.text ?? '') || RESPONSE_WORDS.has(next.words[next.opening]?.text ?? ''));
  const start = opened >= 0 ? opened : directAnswer ? -1 : tagStart(s);
  const own = s.opening;
  const ownFirst = s.words[own]?.text ?? '';
  const premise = start > own + 2 && !WH.has(ownFirst) && !AUX.has(ownFirst) ? { questionFrom: s.words[start]?.start ?? 0 } : {};
  // "so each one's about 150k long??", "Greenland was maybe 5 degrees colder than now?": a
  // statement in statement order that only ends in a question mark (a declarative question, English
  // grammar, common practice) puts its content forward as the speaker's own, as a tag question does.
  if (start < 0 && !directAnswer && isDeclarativeQuestion(s)) return make('asserted');
  if ((how || negative) && !answeredNext) return { ...make('rhetorical', how), ...premise };
  return { ...make('asked'), ...premise };
}

/**
 * Question words that open a question after a statement ("..., so what's the fuss?", "..., so who
 * cares?", "..., where's the problem?"), with the "'s" a writer attaches. Not "how" and "why", which
 * WH reads (and which can make the question rhetorical), nor "which", "when" and "that", which open
 * relative and time clauses as often as questions.
 */
const PREMISE_QUESTION_WORDS = new Set(['what', 'who', 'where', "what's", "who's", "where's", 'whats', 'wheres']);

function isPremiseQuestionWord(word: string): boolean {
  return PREMISE_QUESTION_WORDS.has(word) || /^(?:how|why)['’]s$/u.test(word);
}

/**
 * Where a trailing tag begins: "..., right?", "... 0.42% right??", "..., is that right?", "... isn't
 * it?", "..., didn't they?" (an auxiliary, "not" if any, and a pronoun; or a one-word tag after a
 * word that is no copula, so "is that figure right?" asks about the figure). -1 without one.
 */
function tagStart(s: ReadSentence): number {
  const n = s.words.length;
  const at = (k: number) => s.words[k]?.text ?? '';
  if (n < 4) return -1;
  if (TAG_WORDS.has(at(n - 1))) {
    // "is that right", "am i right", "that right": a tag of its own clause.
    if (AUX.has(at(n - 3)) && TAG_PRONOUNS.has(at(n - 2))) return n - 3;
    if (at(n - 3) === 'am' && at(n - 2) === 'i') return n - 3;
    if (at(n - 2) === 'that') return n - 2;
    const own = s.words[n - 1]?.segment !== s.words[n - 2]?.segment;
    return own || !(AUX.has(at(n - 2)) || at(n - 2) === 'not') ? n - 1 : -1;
  }
  if (TAG_PRONOUNS.has(at(n - 1))) {
    if (at(n - 2) === 'not' && AUX.has(at(n - 3))) return n - 3;
    // "..., did they?": the auxiliary opens a segment of its own (a comma before it).
    if (AUX.has(at(n - 2)) && s.words[n - 2]?.segment !== s.words[n - 3]?.segment) return n - 2;
  }
  return -1;
}

/**
 * A sentence in statement order that ends in a question mark: its own wording opens with neither a
 * question word nor an auxiliary, holds no "whether" or "if", and says something (four words or more).
 */
function isDeclarativeQuestion(s: ReadSentence): boolean {
  const own = s.words.slice(s.opening);
  const lead = own[0]?.text ?? '';
  if (own.length < 4 || WH.has(lead) || AUX.has(lead) || QUESTION_OPENERS.has(lead) || isPremiseQuestionWord(lead) || lead === 'q') return false;
  // "so how do we know?", "and which one is it?": a question word opening a later clause makes it a question.
  return !own.some((w) => WH.has(w.text) || QUESTION_OPENERS.has(w.text) || isPremiseQuestionWord(w.text));
}

/** Pronouns that close a tag question ("isn't it?", "didn't they?"). */
const TAG_PRONOUNS = new Set(['it', 'they', 'he', 'she', 'we', 'you', 'there', 'that', 'this', 'i']);
/** Words that make a tag of their own after a statement ("..., right?"). */
const TAG_WORDS = new Set(['right', 'eh', 'innit', 'yes', 'no', 'correct', 'true']);

/**
 * A statement closed by a tag: its last segment is an auxiliary, "not" if any, and a pronoun
 * ("isn't it", "did they", "wasn't there") or a one-word tag ("right"), after a statement that
 * opens with neither a question word nor an auxiliary.
 */
function isTagQuestion(s: ReadSentence): boolean {
  const last = s.words.at(-1);
  if (last === undefined || last.segment === 0) return false;
  const tag = s.words.filter((w) => w.segment === last.segment).map((w) => w.text);
  const body = s.words.filter((w) => w.segment < last.segment);
  const opener = body[0]?.text ?? '';
  if (body.length < 3 || WH.has(opener) || AUX.has(opener) || QUESTION_OPENERS.has(opener)) return false;
  if (tag.length === 1) return TAG_WORDS.has(tag[0] ?? '');
  const [aux, second, third] = tag;
  if (!AUX.has(aux ?? '')) return false;
  return (tag.length === 2 && TAG_PRONOUNS.has(second ?? '')) || (tag.length === 3 && second === 'not' && TAG_PRONOUNS.has(third ?? ''));
}

const QUESTION_OPENERS = new Set(['what', 'which', 'who', 'where', 'when', 'whether', 'if']);

/** "how on earth could...", "why in the world would...", "how ever can...": the word past an intensifier after a question word. */
function pastIntensifier(s: ReadSentence, i: number): number {
  const at = (k: number) => s.words[k]?.text ?? '';
  if (at(i) === 'on' && at(i + 1) === 'earth') return i + 2;
  if (at(i) === 'in' && at(i + 1) === 'the' && at(i + 2) === 'world') return i + 3;
  // "how exactly is it supposed to...", "why then would...": a word of emphasis after the question word.
  if (at(i) === 'ever' || at(i) === 'exactly' || at(i) === 'then' || at(i) === 'precisely') return i + 1;
  return i;
}

/** A speaker's label that opens an utterance: "MO:", "[18:21] Jess:", "@lin", "↳ @lin:", "GWEN (front row):". */
const SPEAKER = /^\s*(?:[-*+>↳]\s+)?(?:\[[^\]\n]{1,24}\]\s*)?(?:(@[\p{L}\p{N}_.-]+)|(\p{Lu}[\p{L}'’.-]*(?:\s\p{Lu}[\p{L}'’.-]*){0,2})\s*(?:\([^)\n]{1,30}\))?:\s)/u;

function speakerOf(text: string): string | undefined {
  const m = SPEAKER.exec(text);
  return (m?.[1] ?? m?.[2])?.toLowerCase();
}

/** How many words a label before a colon may hold ("EMAIL (Col)", "MARISA: Text from Sunil in Old Harbour"). */
const LABEL_WORDS = 8;

/**
 * 'EMAIL (Col): "The GRIP core shows ...', 'KOFI: Text from Sunil: "So the whole Earth ..."', 'Then: "So
 * the entire planet ..."': a quotation that makes up all the rest of an utterance after a speaker's
 * label (SPEAKER) is that utterance, a voice of the draft as a speaker's own line in a script, log or
 * thread is, read for what its own words mark (a myth label, a report). Between the label and the
 * quotation a short description of the message may stand, ending in a colon; none of the words before
 * the quotation may name a saying (lexicon `stance.quotation-names`: "HOST: The usual line: "..."") or
 * report one (`stance.report-verbs`, `stance.myth`: "HOST: A caller insists: "...""). A lead-in that is
 * no speaker's label ("Several submissions put it this way: "..."", "Now the famous objection: "..."")
 * keeps the quotation a quotation.
 */
function isLabelledUtterance(s: ReadSentence): boolean {
  if (speakerOf(s.text) === undefined) return false;
  const open = s.words.findIndex((w) => w.quoted === true);
  if (open <= 0 || open > LABEL_WORDS || !s.words.slice(open).every((w) => w.quoted === true)) return false;
  const before = s.words[open - 1];
  if (before === undefined || !s.text.slice(before.end, s.words[open]?.start ?? before.end).includes(':')) return false;
  const inLabel = (h: { first: number }) => h.first < open;
  return ![...s.of('stance', 'quotation-names'), ...s.of('stance', 'report-verbs'), ...s.of('stance', 'myth')].some(inLabel);
}

/** The next sentence opens with a speaker's label, and not this sentence's speaker. */
function anotherVoice(text: string, next: string): boolean {
  const them = speakerOf(next);
  return them !== undefined && them !== speakerOf(text);
}

/**
 * "...," said Professor X, who led the study: a quotation given to one of the people whose work the
 * draft presents (lexicon `stance.insider`, outside the quotation marks) is the draft's own voice,
 * as a press release quotes its own scientists.
 */
function insiderSpeaks(s: ReadSentence): boolean {
  return s.of('stance', 'insider').some((h) => s.words.slice(h.first, h.last + 1).every((w) => !w.quoted));
}

/**
 * A block quote that opens with a short label of its own ("Did you know?", "Had you noticed?") is a panel
 * in the writer's voice, not a quotation; a myth label or a report ("What critics say:") is not one.
 */
function isCallout(first: ReadSentence | undefined): boolean {
  if (first === undefined || first.words.length === 0 || first.words.length > 5 || !/[?:]\s*[*_]*\s*$/u.test(first.text)) return false;
  return !LABEL.test(first.text) && first.of('stance', 'myth').length === 0 && first.of('stance', 'report-verbs').length === 0 && first.words.every((w) => !w.quoted);
}

/** "Some claim that...", "Critics argue...", "You may have heard that...", "It is often said...". */
function isReported(s: ReadSentence): boolean {
  // "they could hold more dissolved CO2": a verb that also takes up gas reports a view only before "that".
  // "you will have read that...": a verb of taking in (read) reports only what it introduces ("you can
  // read the answer in the cores" is the writer's own pointer; "the highest reading" is a measurement).
  const introduces = (v: LexHit) =>
    v.base !== 'read' || (!/^readings?$/u.test(s.words[v.first]?.text ?? '') && s.words.slice(v.last + 1, v.last + 4).some((w) => w.text === 'that' || w.quoted === true));
  // The verb stands near the opening of what the sentence itself says, past a speaker's label or a byline.
  // "worth saying that ...", "worth noting that ...": a verb the writer recommends has no other speaker.
  const verbs = s.of('stance', 'report-verbs').filter((v) => v.first - s.opening <= 10 && s.words[v.first - 1]?.text !== 'worth' && !(s.inside(v.first, 'uptake') && s.words[v.last + 1]?.text !== 'that') && introduces(v));
  // "For readers who think in Fahrenheit, ...": a reporter inside a phrase is nobody's report.
  const reporters = s.of('stance', 'reporters').filter((r) => !/^(?:for|to|with|among|of|from)$/u.test(s.words[r.first - 1]?.text ?? ''));
  if (verbs.some((v) => reporters.some((r) => r.last < v.first && v.first - r.last <= 4))) return true;
  // "I keep hearing two stories. One says ..., the other says ...": a pronoun of choice ("one",
  // "another", "the other") standing alone as the verb's subject at the sentence's opening is one of
  // several voices the writer sets out.
  const chooser = ONE_OF_SEVERAL.has(s.words.slice(s.opening, s.opening + 2).map((w) => w.text).join(' ')) ? s.opening + 2 : ONE_OF_SEVERAL.has(s.words[s.opening]?.text ?? '') ? s.opening + 1 : -1;
  if (chooser > 0 && verbs.some((v) => v.first === chooser)) return true;
  // "My neighbour insists...", "Her uncle keeps saying...": someone of a person's circle, named as the
  // verb's subject, is an outside source with or without "that".
  // The subject may be a compound noun and a name ("My brother-in-law Clive insists"): six words back.
  // "In my notes I wrote that ...": the writer as the verb's own subject is no one of the circle.
  const circle = (v: LexHit) => !WRITER.has(s.words[v.first - 1]?.text ?? '') && s.words.slice(Math.max(0, v.first - 6), v.first).some((w, k, all) => /^(?:my|your|his|her|their)$/u.test(w.text) && k < all.length - 1);
  if (verbs.some((v) => v.first - s.opening <= 6 && circle(v))) return true;
  // "Mr Pell's central claim is that...", "the letter's argument is that...": a report told as a noun
  // that someone owns, then "is that".
  const owned = verbs.some((v) => s.words[v.last + 1]?.text === 'is' && s.words[v.last + 2]?.text === 'that' && s.words.slice(Math.max(0, v.first - 3), v.first).some((w) => /['’]s$/u.test(w.text) || /^(?:his|her|their|the)$/u.test(w.text)));
  if (owned) return true;
  // "Mr Pratley writes that...", "The op-ed insists the lag...": a report with a named outside source.
  // "The column told readers that...", "A correspondent wrote last month that...": up to three words
  // (whom it was told, when) may stand between the verb and its "that" or quotation.
  const attributed = verbs.some((v) => {
    const opens = s.words.slice(v.last + 1, v.last + 5).findIndex((w) => w.text === 'that' || w.quoted === true);
    // "tells us that" is the record speaking to the writer, not someone else's claim.
    const between = s.words.slice(v.last + 1, v.last + 2 + Math.max(0, opens));
    // "I've read that...": a contraction keeps its subject ("i've" is "i").
    // "The IPCC's assessment concluded that...": a possessive names its owner ("ipcc's" is "ipcc").
    const subject = s.words.slice(Math.max(0, v.first - 3), v.first).map((w) => w.text.replace(/['’](?:ve|d|m|ll|re|s)$/u, ''));
    const gap = s.text.slice(s.words[v.last]?.end ?? 0, between.at(-1)?.start ?? 0);
    // "My uncle keeps telling me that...": someone of the writer's own circle is an outside source.
    const circle = subject.some((w) => /^(?:my|your|his|her|their)$/u.test(w));
    const told = (circle || between.slice(0, -1).every((w) => !SELF.has(w.text))) && !/[,;:()]/u.test(gap);
    return opens >= 0 && told && v.first > 0 && !subject.some((w) => AUTHORITIES.has(w));
  });
  if (attributed) return true;
  const text = s.words.slice(0, 8).map((w) => w.text).join(' ');
  return /\b(?:it is|it's|is) (?:often|sometimes|commonly|frequently|widely) (?:said|claimed|argued|heard|repeated|asserted)\b|\baccording to (?:some|critics|sceptics|skeptics)\b/u.test(text);
}

/**
 * "The lag argument, as I used to make it, went like this: ...", "We once argued that...": the
 * writer's own former view, told as past ("used to" or "once" after "I" or "we").
 */
function isFormerOwnView(s: ReadSentence): boolean {
  // "For a long time we said...", "Until recently, textbooks gave...": a report verb in the simple
  // past, a few words after a time now past (lexicon `stance.former-time`).
  const past = (v: LexHit) => {
    const w = s.words[v.first]?.text ?? '';
    return w !== v.base && !w.endsWith('ing') && !/s$/u.test(w) && !['have', 'has', "'ve"].includes(s.words[v.first - 1]?.text ?? '');
  };
  const former = s.of('stance', 'former-time').some((t) => s.of('stance', 'report-verbs').some((v) => v.first > t.last && v.first - t.last <= 5 && past(v)));
  if (former) return true;
  return s.words.some((w, i) => (w.text === 'i' || w.text === 'we') && ((s.words[i + 1]?.text === 'used' && s.words[i + 2]?.text === 'to') || (s.words[i + 1]?.text === 'once' && s.of('stance', 'report-verbs').some((v) => v.first === i + 2))));
}

/** Words that open a clause about the source before them ("studies ..., which put the lag at ..."). */
const RELATIVES = new Set(['which', 'who', 'whose', 'that']);

/**
 * "Studies published around 2001 reported a lag of about 800 years. Later work with sharper dating
 * has shrunk it.": a view told as coming from studies (lexicon `stance.view-sources`) is an earlier
 * one when a newer view (`stance.newer`) opens the next sentence of the paragraph (within its first
 * eight words) or a later segment of the same sentence ("...; studies since 2012 find ..."), and
 * does not agree with it (`stance.confirming`: "Later work confirms this" keeps the view the draft's).
 * Returns where the view ends: the source's segment and the segments before it, with a relative
 * clause that opens right after ("..., which put CO2 800 years behind"); undefined when no newer view
 * makes it earlier.
 */
function outdatedViewEnd(s: ReadSentence, next: ReadSentence | undefined): number | undefined {
  const sources = s.of('stance', 'view-sources');
  if (sources.length === 0) return undefined;
  const segmentOf = (h: { first: number }) => s.words[h.first]?.segment ?? 0;
  const firstSource = Math.min(...sources.map(segmentOf));
  const later = s.of('stance', 'newer').filter((h) => segmentOf(h) > firstSource);
  const agrees = (r: ReadSentence, segment?: number) => r.of('stance', 'confirming').some((c) => segment === undefined || (r.words[c.first]?.segment ?? 0) === segment);
  const outdated = later.length > 0
    ? !later.some((h) => agrees(s, segmentOf(h)))
    : next !== undefined && next.of('stance', 'newer').some((h) => h.first < 8) && !agrees(next);
  if (!outdated) return undefined;
  let last = firstSource;
  const opener = s.words.find((w) => w.segment === last + 1);
  if (opener !== undefined && RELATIVES.has(opener.text)) last += 1;
  const end = s.words.filter((w) => w.segment <= last).at(-1)?.end;
  return end ?? s.text.length;
}

function isHypothetical(s: ReadSentence): boolean {
  const first = s.words[0]?.text ?? '';
  if (!['if', 'suppose', 'supposing', 'imagine', 'were'].includes(first)) return false;
  return s.words.some((w) => ['would', 'might'].includes(w.text));
}

/** Personal pronouns that stand for the person whose words were reported ("he", "him", "she's"). */
const PERSONS = new Set(['he', 'she', 'they', 'him', 'her', 'them', "he's", "she's", "they're", 'hes', 'shes', 'theyre']);
/** Words that deny what follows them in a short predicate. */
const DENIALS = new Set(['not', 'never', 'no', 'hardly']);

/**
 * "..., and honestly I think he's right", "your panel proves him right", "he's got a point": a
 * predicate of rightness ("right", "correct", "a point") said of a person named by a pronoun, within
 * the first `within` words and with no denial just before, in a sentence that asks nothing, endorses
 * the view reported of that person.
 */
function endorsesPerson(s: ReadSentence, within: number): boolean {
  // "Is he right?" asks; it endorses nothing.
  if (s.question) return false;
  return s.words.some((w, k) => {
    if (k >= within) return false;
    const rightness = w.text === 'right' || w.text === 'correct' || (w.text === 'point' && s.words[k - 1]?.text === 'a');
    if (!rightness) return false;
    const before = s.words.slice(Math.max(0, k - 4), k);
    const person = before.findLastIndex((b) => PERSONS.has(b.text));
    return person >= 0 && !s.words.slice(Math.max(0, k - 6), k).some((b) => DENIALS.has(b.text));
  });
}

/** Pronouns that pick one of several voices or views named before ("One says ...", "The other claims ..."). */
const ONE_OF_SEVERAL = new Set(['one', 'another', 'the other', 'the first', 'the second', 'a second', 'a third']);

/** Words that open a conclusion drawn from what came before (English grammar, common practice). */
const CONCLUSION_OPENERS = new Set(['so', 'therefore', 'hence', 'thus', 'consequently']);

/**
 * Where a supposed case gives way to the writer's own conclusion: the first segment past the
 * supposition's consequence ("would", "might") opened by a word of concluding. Undefined without one.
 */
function conclusionAfterSupposition(s: ReadSentence): number | undefined {
  const consequence = s.words.findIndex((w) => w.text === 'would' || w.text === 'might');
  if (consequence < 0) return undefined;
  const at = s.words.findIndex((w, i) => i > consequence && CONCLUSION_OPENERS.has(w.text) && s.words[i - 1]?.segment !== w.segment);
  return at < 0 ? undefined : s.words[at]?.start;
}

/** A short heading that labels its section as the myth ("The myth", "What you may hear"). */
function isMythHeading(heading: string | undefined): boolean {
  if (heading === undefined) return false;
  const words = heading.trim().split(/\s+/u);
  return words.length <= 5 && /\b(?:myths?|misconceptions?|the claim|what (?:they|you|people|some) (?:say|hear|claim)|you may hear|false)\b/iu.test(heading) && !/\b(?:fact|facts|truth|busting|debunk\w*|answer\w*|vs\.?|versus)\b/iu.test(heading);
}

/** True when a flag on this sentence stands as the writer's own error. */
export function isOwnClaim(stance: SentenceStance): boolean {
  return stance.kind === 'asserted' || stance.kind === 'rhetorical' || stance.endorsed;
}

/**
 * Where the answer to a question that `s` reports begins: past the "whether" that opens the question
 * (after a report verb), the first word of another clause, or an "and"/"but" after a comma, that does
 * not open a further part of the question ("and whether", "or"). Undefined when `s` reports no question.
 *
 *   "People ask me whether CO2 was the cause or the effect, and the cores answer that: ..."
 *                  ^ whether                             ^ the answer begins
 */
function answerAfterReportedQuestion(s: ReadSentence): number | undefined {
  const verb = s.of('stance', 'report-verbs')[0];
  const whether = s.words.findIndex((w, i) => w.text === 'whether' && verb !== undefined && i > verb.last && i - verb.last <= 3);
  if (whether < 0) return undefined;
  const clause = s.words[whether]?.clause;
  for (let k = whether + 1; k < s.words.length; k++) {
    const w = s.words[k];
    if (w === undefined) break;
    const joined = (w.text === 'and' || w.text === 'but') && s.text.slice(s.words[k - 1]?.end ?? 0, w.start).includes(',');
    if ((w.clause !== clause || joined) && !['whether', 'or', 'if'].includes(s.words[k + 1]?.text ?? '')) return w.start;
  }
  return undefined;
}
