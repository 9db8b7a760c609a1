import type { Sentence } from '../types.js';
import { isByline } from './byline.js';

/** Abbreviations whose full stop does not end a sentence (lower-case, without the final dot). */
const ABBREVIATIONS = new Set([
  'c', 'ca', 'cf', 'e.g', 'i.e', 'al', 'approx', 'fig', 'figs', 'dr', 'prof', 'mr', 'mrs', 'ms', 'st',
  'no', 'vol', 'pp', 'p', 'ed', 'eds', 'etc', 'vs', 'jan', 'feb', 'mar', 'apr', 'jun', 'jul', 'aug',
  'sep', 'sept', 'oct', 'nov', 'dec', 'yr', 'yrs', 'kyr', 'approx', 'est', 'resp', 'incl',
]);

/**
 * Words that open a sentence and are never a surname after an initial: articles, pronouns,
 * conjunctions and the commonest sentence adverbs (a closed class; common practice of English).
 */
const OPENS_NOT_NAME = /^(?:the|a|an|it|its|it's|this|that|these|those|there|they|we|i|you|he|she|but|and|so|yet|or|if|in|on|at|for|from|to|with|as|its|not|no)(?![\p{L}'’])/iu;

/**
 * Sentence-final punctuation, then closing quotes or brackets, then white space; or an emoji that
 * ends a line (its modifiers and joiners with it), which informal writers put where a full stop
 * would go ("... at the peak of the ice age 🥶\nalso Vostok ...").
 */
const BOUNDARY = /([.!?…]+|\p{Extended_Pictographic}(?:\p{Extended_Pictographic}|\p{Emoji_Modifier}|\u200d|\ufe0f)*(?=[ \t]*\n))(["'”’)\]]*)(\s+)/gu;
/** An emoji that ends a line: a sentence's end, whatever case the next line opens in. */
const EMOJI_END = /^\p{Extended_Pictographic}/u;

/**
 * Splits one prose block into sentences with their offsets in the block. A full stop ends a sentence
 * unless it closes a known abbreviation ("c. 800 years", "Petit et al. 1999") or an initial, or the
 * next word starts in lower case. A blank line always ends a sentence.
 *
 *   splitSentences('Vostok spans c. 420,000 years. EPICA is longer.', 0)
 *   → ['Vostok spans c. 420,000 years.', 'EPICA is longer.']
 */
export function splitSentences(text: string, blockIndex: number, width = 0): Sentence[] {
  const sentences: Sentence[] = [];
  let chunkStart = 0;
  for (const gap of text.matchAll(BLANK_LINE)) {
    splitChunk(sentences, text, blockIndex, chunkStart, gap.index, width);
    chunkStart = gap.index + gap[0].length;
  }
  splitChunk(sentences, text, blockIndex, chunkStart, text.length, width);
  return sentences;
}

const BLANK_LINE = /\n[ \t]*\n/gu;

function splitChunk(sentences: Sentence[], whole: string, blockIndex: number, from: number, to: number, width: number): void {
  // A line that opens with a speaker, a time stamp, a handle or a bullet is an utterance of its own,
  // full stop or not: chat logs, scripts and thread dumps put one on each line.
  // A post's byline ("BigSkyBarb · 5h") is a line of its own: the post starts on the next line.
  const cuts = new Set<number>();
  for (const line of whole.slice(from, to).matchAll(UTTERANCE_LINE)) cuts.add(from + line.index + 1);
  for (const line of whole.slice(from, to).matchAll(LINE)) {
    const end = from + line.index + line[0].length;
    // A byline or a signature stands on its line between two posts: cut on both sides of it.
    if (isByline(line[0])) {
      if (line.index > 0) cuts.add(from + line.index);
      if (end < to) cuts.add(end + 1);
    }
    // "↳ @ana · 2 days ago · ♥ 14: Nope, ...": a byline that leads its post on the same line.
    const colon = line[0].indexOf(': ');
    if (colon > 0 && isByline(line[0].slice(0, colon))) cuts.add(from + line.index + colon + 2);
  }
  for (const at of unwrappedLineEnds(whole, from, to, width)) cuts.add(at);
  let lineFrom = from;
  for (const at of [...cuts].sort((a, b) => a - b)) {
    splitLines(sentences, whole, blockIndex, lineFrom, at);
    lineFrom = at;
  }
  splitLines(sentences, whole, blockIndex, lineFrom, to);
  // A title, a by-line or a label on a line of its own opens the sentence it stands over: the
  // sentence keeps it (a label gives the subject or the date of the text under it), and records
  // how long it is, so that the checks that read what the sentence asserts skip it.
  const labels = labelCuts(whole, from, to);
  for (const sentence of sentences) {
    if (sentence.end <= from || sentence.start < from) continue;
    const last = labels.filter((at) => at > sentence.start && at < sentence.end).at(-1);
    if (last !== undefined) sentence.label = last - sentence.start;
  }
}

/**
 * Where a chunk's lines that stand on their own end: a title, a by-line or a panel label on a line of
 * its own ("B-04  Solubility is not the whole story", "J. Hale, L. Crowe (Ocean Centre)", "Panel 10 |
 * 1992"). A line is one when it was broken on purpose by the greedy line-filling rule every wrapping
 * writer and editor follows (common practice): it left room for the next line's first word, yet that
 * word went on the next line. Slack keeps hard-wrapped prose whole: the line with the next word must
 * be shorter than `LABEL_SLACK` of the chunk's widest line, the line must end in no mark or word that
 * carries a sentence on (a comma, a dash, "and", "of"), and the next line must open with a capital.
 * Each cut is the offset where the next line starts.
 */
export function labelCuts(whole: string, from: number, to: number): number[] {
  const lines = [...whole.slice(from, to).matchAll(LINE)].map((m) => ({ text: m[0], at: from + m.index }));
  if (lines.length < 2) return [];
  const widest = Math.max(...lines.map((l) => l.text.trim().length));
  const cuts: number[] = [];
  for (let i = 0; i + 1 < lines.length; i += 1) {
    const line = (lines[i] as { text: string }).text.trim();
    const next = lines[i + 1] as { text: string; at: number };
    const first = /^\S+/u.exec(next.text.trimStart())?.[0] ?? '';
    if (line === '' || !OPENS_CAPITAL.test(first) || CARRIES_ON.test(line)) continue;
    if (line.length + 1 + first.length < LABEL_SLACK * widest) cuts.push(next.at);
  }
  return cuts;
}

/**
 * Where a writer who opens sentences in lower case (chat logs, comment threads, forum posts) ends one
 * at a line break without a mark: such writers break a line where a thought ends, not to wrap it.
 * The sentence the line ends in opened in lower case, the line ends in no mark or word that carries
 * a sentence on or in a number (its unit may open the next line), the next line opens with no capital (a short line over a capitalised one is a label,
 * labelCuts) and no word that carries the sentence on ("which", "of"), and the line with the next
 * line's first word falls well short (`LABEL_SLACK`) of the draft's widest line (`width`), so it was
 * no line wrapped to fill it. "the vostok record goes back 800k yrs\nis that right?" is two
 * sentences. Each cut is the offset where the next line starts.
 */
function unwrappedLineEnds(whole: string, from: number, to: number, width: number): number[] {
  const lines = [...whole.slice(from, to).matchAll(LINE)].map((m) => ({ text: m[0], at: from + m.index }));
  if (lines.length < 2) return [];
  if (!writesInLowerCase(whole.slice(from, to))) return [];
  const widest = Math.max(...lines.map((l) => l.text.trim().length));
  const cuts: number[] = [];
  // Whether the sentence the line ends in opened in lower case: a line with no end mark of its own
  // carries on the sentence of the line before.
  let lower = false;
  let opensSentence = true;
  for (let i = 0; i + 1 < lines.length; i += 1) {
    const line = (lines[i] as { text: string }).text.trim();
    const next = lines[i + 1] as { text: string; at: number };
    const first = /^\S+/u.exec(next.text.trimStart())?.[0] ?? '';
    const piece = lastSentenceOf(line, opensSentence);
    if (piece !== undefined) lower = opensInLowerCase(piece);
    const ended = /[.!?…]["'”’)\]]*$/u.test(line) || OPENER_LINE.test(next.text) || isByline(line);
    const cut = lower && !ended && line !== '' && !/\d$/u.test(line) && first !== '' && !OPENS_CAPITAL.test(first) && !CARRIES_ON.test(line) && !OPENS_ON.test(first) && line.length + 1 + first.length < LABEL_SLACK * Math.max(width, widest);
    if (cut) cuts.push(next.at);
    opensSentence = ended || cut;
  }
  return cuts;
}

/**
 * Whether the chunk's writer opens sentences in lower case: as many of its sentence openings (its
 * start, and the word after each end mark) open in lower case as with a capital, at least one ("I" counts for
 * neither). One lower-case opening in edited prose (a quoted sentence's full stop, a name written in
 * lower case) does not make its writer one who breaks lines where a thought ends.
 *
 *   writesInLowerCase('the record goes back 800k yrs\nis that right? what am i missing') → true
 *   writesInLowerCase('It reads "CO2 rose." then falls\nback. So it goes.') → false
 */
function writesInLowerCase(chunk: string): boolean {
  let lower = 0;
  let upper = 0;
  for (const at of [0, ...[...chunk.matchAll(SENTENCE_GAP)].map((m) => m.index + m[0].length)]) {
    const word = /^\S+/u.exec(chunk.slice(at).replace(UTTERANCE_PREFIX, ''))?.[0] ?? '';
    if (/^\p{Ll}/u.test(word)) lower += 1;
    else if (/^\p{Lu}/u.test(word) && !/^I(?:['’]\p{L}+)?$/u.test(word)) upper += 1;
  }
  return lower > 0 && lower >= upper;
}

/** An end mark, any closing quote or bracket after it, and the space before the next sentence. */
const SENTENCE_GAP = /[.!?…]["'”’)\]]*\s+/gu;

/** The line's last sentence, when it opens one: after its last end mark, or the whole line when the line opens a sentence. */
function lastSentenceOf(line: string, opensSentence: boolean): string | undefined {
  const marks = [...line.matchAll(SENTENCE_GAP)];
  const last = marks.at(-1);
  if (last === undefined) return opensSentence ? line : undefined;
  return line.slice(last.index + last[0].length);
}

/** A word that opens a line and carries the sentence before it on: a relative pronoun, "of", "than" (an "and" opening a chat line opens a new thought). */
const OPENS_ON = /^(?:which|who|whose|whom|of|than)(?![\p{L}'’])/u;

/** How much shorter than the chunk's widest line a line and the next word must be to be a line of its own. */
const LABEL_SLACK = 0.8;

/** A first word that opens with a capital, after an opening quote, bracket or emphasis mark. */
const OPENS_CAPITAL = /^["'“‘([*_]*\p{Lu}/u;

/**
 * The end of a line that carries a sentence on to the next: end punctuation (already a boundary), a
 * comma, colon, semicolon, dash, slash, ampersand or opening bracket, or a word that cannot end a
 * sentence (an article, a conjunction, a preposition: a closed class of English).
 */
const CARRIES_ON = /(?:[.!?…,;:\-–—/&(+=]["'”’)\]*_]*|(?<![\p{L}'’])(?:a|an|the|and|or|nor|but|of|to|in|on|at|by|for|from|with|as|than|that|which|who|whose|into|onto|per|via|is|are|was|were)(?:[*_]*))$/iu;

/** One line of a chunk (without its line break). */
const LINE = /[^\n]+/gu;

/** A clock time as chat software stamps a line: "14:12", "09:05:33", "2:41 pm". */
const CLOCK_TIME = String.raw`(?:[01]?\d|2[0-3]):[0-5]\d(?::[0-5]\d)?(?:[ \t]?[ap]\.?m\.?)?`;

/**
 * A new line that opens an utterance: "[18:58] ", "14:12 ", "AMARA: ", "@ana ", "↳ ", "• ", "- ",
 * "3/ ", a reply's quote marks ">> " and a wiki talk page's indent "::". A speaker label is one to
 * three capitalised words, or one word in capitals, before a colon. A clock time with no brackets
 * opens a chat log's line as a bracketed one does when a speaker's label or a field separator
 * follows it ("14:12 wren_m: ...", "21:04 | text"), not a wrapped line ("10:30 talk ..."); a reply's quote marks and a
 * talk page's colons are how those threads set one post under another (common practice of mail
 * software and of wiki talk pages).
 */
const OPENER = String.raw`[ \t]*(?:\[[^\]\n]{1,24}\]|${CLOCK_TIME}[ \t]+(?=[|·•]|[^\n:]{1,40}:[ \t])|[@↳•▶►]|[-*+][ \t]|>{1,8}[ \t]|:{1,8}(?=[^\s:])|\d{1,3}\/[ \t]|\p{Lu}[\p{L}'’.-]*(?:[ \t]\p{Lu}[\p{L}'’.-]*){0,2}:[ \t])`;
/** A line that opens an utterance of its own (a speaker, a time stamp, a handle, a bullet). */
const OPENER_LINE = new RegExp(String.raw`^${OPENER}`, 'u');

const UTTERANCE_LINE = new RegExp(String.raw`\n(?=${OPENER})`, 'gu');
const OPENS_UTTERANCE = new RegExp(String.raw`^${OPENER.replace('[@↳•▶►]', '[@↳▶►]')}`, 'u');

/**
 * True when a sentence opens an utterance of its own in a thread or a script ("↳ @ana: ...",
 * "[09:12] Rosa: ...", "TOBIAS: ..."): another voice, whose words neither answer nor endorse the
 * sentence before on its speaker's behalf.
 */
export function opensUtterance(sentence: string): boolean {
  return OPENS_UTTERANCE.test(sentence) && !/^\s*[-*+>:]/u.test(sentence) && !LAYOUT_LABEL.test(sentence);
}

/** Labels of a question-and-answer or myth-and-fact layout: the same writer answering, not another voice. */
const LAYOUT_LABEL = /^\s*(?:q|a|question|answer|myth|fact|claim|reality|truth|verdict|note|the myth|the fact|the claim|the truth|the answer|the science|the evidence)\s*:/iu;

function splitLines(sentences: Sentence[], whole: string, blockIndex: number, from: number, to: number): void {
  const text = whole.slice(0, to);
  let start = skipSpace(text, from);
  BOUNDARY.lastIndex = from;
  for (let match = BOUNDARY.exec(text); match !== null; match = BOUNDARY.exec(text)) {
    const stopAt = match.index + match[1]!.length + match[2]!.length;
    const next = match.index + match[0].length;
    if (stopAt <= start) continue;
    if (!endsSentence(text, match.index, match[1]!, match[3]!, next) && !endsLowerCaseSentence(text, start, match.index, match[1]!, next) && !endsAtLineBreak(text, match.index, match[1]!, match[2]!, match[3]!, next)) continue;
    push(sentences, text, blockIndex, start, stopAt);
    start = next;
  }
  push(sentences, text, blockIndex, start, text.length);
}

function endsSentence(text: string, dotAt: number, marks: string, space: string, next: number): boolean {
  if (next >= text.length) return true;
  if (EMOJI_END.test(marks)) return space.includes('\n');
  if (marks !== '.') return startsSentence(text.slice(next, next + 1));
  const word = /([\p{L}.]+)$/u.exec(text.slice(Math.max(0, dotAt - 12), dotAt))?.[1]?.toLowerCase() ?? '';
  // "about 9 °C.", "by 5 K." and "about 420 kyr." end with a unit symbol, not with "c." (circa), an
  // initial or an abbreviation: a unit symbol after a number takes no full stop of its own (NIST SP 811, 7.2).
  if (/(?:°|\d\s?)\p{L}{1,4}$/u.test(text.slice(Math.max(0, dotAt - 6), dotAt))) return startsSentence(text.slice(next, next + 1));
  const capital = /^\p{L}$/u.test(word) && /\p{Lu}/u.test(text.charAt(dotAt - 1));
  if (ABBREVIATIONS.has(word) && !capital) return false;
  // An initial ("J. R. Petit"), unless a word that opens sentences and names nobody follows: "Dome C. The ice...".
  if (capital) return OPENS_NOT_NAME.test(text.slice(next, next + 12));
  return startsSentence(text.slice(next, next + 1));
}

/**
 * A writer who opens sentences in lower case (chat logs, comment threads: "its antarctic temp tho.
 * the global number was smaller") ends one with a full stop before a lower-case word as well. The
 * sentence so far must open in lower case after its utterance label, and the word before the stop
 * must be a word of two letters or more that is no known abbreviation, so "c. 21,000", "e.g. the"
 * and "et al. found" stay joined, and a writer who capitalises keeps the ordinary rule.
 */
function endsLowerCaseSentence(text: string, start: number, dotAt: number, marks: string, next: number): boolean {
  if (marks !== '.' || !/^\p{Ll}/u.test(text.slice(next, next + 1))) return false;
  const word = /([\p{L}.]+)$/u.exec(text.slice(Math.max(0, dotAt - 12), dotAt))?.[1] ?? '';
  if (word.length < 2 || word.includes('.') || ABBREVIATIONS.has(word.toLowerCase())) return false;
  return opensInLowerCase(text.slice(start, dotAt));
}

/**
 * An end mark that ends its line ends the sentence when the next line opens in lower case: a writer
 * who breaks the line after a full stop, a question or an exclamation has ended a thought, whatever
 * case the line before opened in ("...the global stack mostly lagged co2.\nantarctica warmed early",
 * "...back in 76.\nthe orbit sets the timing"). Wrapped edited prose breaks a line inside a sentence
 * only after a word, so a mark there ends one; kept joined are a closing quote after the mark (a
 * quoted sentence inside the writer's own: '"CO2 rose."\nthen it fell'), an initial, a word with a
 * dot inside ("e.g.") and the abbreviations that stand before a lower-case word in a sentence
 * ("et al.", "cf.", "approx.").
 */
function endsAtLineBreak(text: string, dotAt: number, marks: string, closing: string, space: string, next: number): boolean {
  if (/["'”’]/u.test(closing) || !space.includes('\n') || !/^\p{Ll}/u.test(text.slice(next, next + 1))) return false;
  if (!/^(?:[.!?]|\.\.\.|…)$|^[!?]+$/u.test(marks)) return false;
  if (marks !== '.') return true;
  // The token before the stop: a figure or a word with a digit ("back in 76.", "lagged co2.") ends a
  // sentence as a word does.
  const token = /[^\s"'“‘([]+$/u.exec(text.slice(Math.max(0, dotAt - 24), dotAt))?.[0] ?? '';
  if (/\d/u.test(token)) return true;
  return token.length >= 2 && /^[\p{L}'’-]+$/u.test(token) && !RUNS_ON.has(token.toLowerCase());
}

/** Abbreviations after which a sentence runs on in lower case ("et al. found", "cf. the", "approx. the"). */
const RUNS_ON = new Set(['al', 'cf', 'ca', 'approx', 'vs', 'incl', 'resp', 'est', 'etc', 'viz', 'esp', 'fig', 'figs', 'eq', 'eqs', 'ref', 'refs', 'sect', 'ch', 'vol', 'pp', 'no', 'dr', 'prof', 'mr', 'mrs', 'ms', 'st']);

/** The sentence's first word, after a time stamp, a handle or a speaker label, is in lower case. */
function opensInLowerCase(sentence: string): boolean {
  const body = sentence.replace(UTTERANCE_PREFIX, '');
  return /^\p{Ll}/u.test(body);
}

/**
 * How long the utterance label that opens a sentence is: a time stamp, a handle, a reply arrow or
 * a speaker label ("[9 Nov, 19:13] Sinead: ", "dave.k: ", "@lin "), 0 when there is none. The
 * sentence's own words start after it.
 */
export function utteranceLabelLength(sentence: string): number {
  return UTTERANCE_PREFIX.exec(sentence)?.[0].length ?? 0;
}

/** A time stamp, a handle, a reply arrow or a speaker label that opens an utterance ("[19:13] oskarflint: "). */
const UTTERANCE_PREFIX = new RegExp(String.raw`^\s*(?:(?:\[[^\]\n]{1,24}\]|${CLOCK_TIME})\s*)?(?:[↳•▶►]\s*|>{1,8}\s+|:{1,8})?(?:@?[\p{L}\d_.'’-]{1,32}(?:\s\([^)\n]{1,40}\))?:\s+)?`, 'u');

/**
 * After a full stop, what may open a new sentence: anything but a lower-case letter or a mark that
 * continues one (a comma, a semicolon). Replies, handles, arrows and bullets in threads ("↳ @ana: ...",
 * "• ...", "— ...") open sentences as capitals do.
 */
function startsSentence(next: string): boolean {
  return next !== '' && !/^[\p{Ll},;:.)\]}]/u.test(next);
}

function push(into: Sentence[], text: string, blockIndex: number, start: number, end: number): void {
  let stop = end;
  while (stop > start && /\s/u.test(text.charAt(stop - 1))) stop -= 1;
  // "1. The EPICA core ...\n2. Its record covers ...": the number that opens a line of an ordered
  // list is the item's label, not a sentence; left out, the item reads on from the item before.
  if (LIST_LABEL.test(text.slice(start, stop)) && /(?:^|\n)[ \t]*$/u.test(text.slice(0, start))) return;
  if (stop > start) into.push({ text: text.slice(start, stop), blockIndex, start, end: stop });
}

/** The label of an ordered list's item, as CommonMark writes it (one to three digits, then "." or ")"). */
const LIST_LABEL = /^\d{1,3}[.)]$/u;

function skipSpace(text: string, from: number): number {
  let at = from;
  while (at < text.length && /\s/u.test(text.charAt(at))) at += 1;
  return at;
}
