import { topicalThroughout } from './prose/topical-throughout.js';
import { bindQuantities, findTerms } from './claims/bind.js';
import { readAnnualRates } from './claims/annual-rates.js';
import { readPartitiveCounts } from './claims/partitive-counts.js';
import { restoreElidedUnits } from './claims/elided-units.js';
import { restoreTermUnits } from './claims/term-units.js';
import { asksForFigure, checkArithmetic } from './checks/arithmetic.js';
import { checkRanks } from './checks/rank/index.js';
import { checkReasoning, judgeByStance, paragraphReader, type ParagraphContext } from './checks/reasoning/index.js';
import { checkReferences } from './checks/reference.js';
import { reboundSlips } from './checks/rebound-slips.js';
import { unboundSlips } from './checks/unbound-slips.js';
import { checkUnits } from './checks/units.js';
import { hasNumeral, hasTwoNumerals } from './quantities/two-numerals.js';
import { FirnlineError } from './errors.js';
import { relative, resolve, sep } from 'node:path';
import { CHECKLIST_MARKER } from './report/checklist-markdown.js';
import { isChecklistText } from './report/checklist-lines.js';
import { sortById } from './report/sort.js';
import { createTopicMatcher, isVoicedQuote, quotesEarlierLine, splitSentences, type TopicMatcher } from './prose/index.js';
import { topicPattern } from './prose/topic-matcher.js';
import { paragraphWindows } from './prose/paragraph-windows.js';
import { draftLineWidth } from './prose/line-width.js';
import { introOf, leadInOf } from './prose/lead-in.js';
import { classWordsOf, entityWordsOf, subjectWordsOf } from './propositions/index.js';
import { tokenizeSentence } from './claims/frames-tokens.js';
import { parseQuantities } from './quantities/index.js';
import { claimIdOf, foldClaimText } from './review/claim-id.js';
import { describeRule, loadPacks } from './rulepack/index.js';
import type { FactForm, LoadedPacks } from './rulepack/types.js';
import { blockRange, createLineIndex, draftFormat, draftFromText, findDrafts, loadHtmlReader } from './source/index.js';
import { runFiles, type FileOutcome, type FileTask } from './speed/run-files.js';
import type { ResultCache } from './speed/cache.js';
import { inShard, type Shard } from './speed/shard.js';
import { sparseMarkdownDraft } from './speed/sparse-markdown.js';
import { cachedFindings } from './speed/sentence-cache.js';
import type { Binding, CheckResult, Claim, Draft, Flag, FlagDraft, Level, ProseBlock, Quantity, RuleInfo, Sentence, Verdict } from './types.js';

/** How a run is set up. Only `cwd` is required; packs default to the built-in pack. */
export interface CheckOptions {
  cwd: string;
  /** Packs already loaded (the CLI loads them once); otherwise loaded from `packFiles` + built-in. */
  packs?: LoadedPacks;
  packFiles?: string[];
  include?: string[];
  exclude?: string[];
  /** Per rule id: a new level, or `off` to drop the rule's flags. */
  levels?: Record<string, Level | 'off'>;
  /** Reads standard input for the path `-`. */
  readStdin?: () => Promise<string>;
  /** Claim ids and the ledger use paths relative to this folder (default: `cwd`). */
  projectRoot?: string;
  /** Worker threads for a run over many files (default: the machine's cores); 1 runs in this thread. */
  jobs?: number;
  /** A result cache (src/speed/cache.ts); none by default. */
  cache?: ResultCache;
  /** Only the files of this shard (split by project path). */
  shard?: Shard;
  /** Called as files are done: how many of how many. */
  onProgress?: (done: number, total: number) => void;
  /** Called once a run's pool workers are running (speed/run-files.ts); the command line sets its V8 flags again there. */
  onWorkersStarted?: () => void;
  /** Called once when the run's on-topic text reaches speed/run-files.ts LARGE_RUN_BYTES; the command line bounds its heap's growth there. */
  onLargeRun?: () => void;
  /** The folder `include`/`exclude` patterns are relative to (default: `cwd`). */
  filterRoot?: string;
}

/** Per-draft settings of `checkDraft`. */
export interface DraftOptions {
  topic?: TopicMatcher;
  levels?: Record<string, Level | 'off'>;
  /** The draft's path relative to the project root, for claim ids (default: the draft's path). */
  projectPath?: string;
  /**
   * Per block of the draft, whether a block beside it names a subject (`subjectBeside`); given
   * when `blocks` are some of a larger draft's (the editor re-checks only changed blocks).
   */
  subjectBeside?: readonly boolean[];
  /**
   * Per block, its lead-in (prose/lead-in.ts: the sentences of the blocks just before it that the
   * arithmetic and unit checks read on from); given with `subjectBeside` for some of a draft's blocks.
   */
  leadIns?: readonly (readonly string[])[];
  /**
   * Keep each sentence's findings for a later check of the same paragraph window (the editor's
   * re-check after an edit; speed/sentence-cache.ts). Default true; a run over files
   * (speed/run-files.ts) turns it off: there a window seldom comes twice (none of 3,044 on 256 KB
   * of the bench's topical prose, 80 of 2,340 on its docs pages) and each kept finding is a copy.
   */
  reuseSentences?: boolean;
}

/** The part of a run that concerns one draft. */
export interface DraftResult {
  claims: Claim[];
  flags: Flag[];
}

/** Checks files and folders (folders recurse over drafts); `-` reads standard input as Markdown. */
export async function checkPaths(paths: string[], options: CheckOptions): Promise<CheckResult> {
  const packs = options.packs ?? (await loadPacks(options.packFiles ?? []));
  const topic = createTopicMatcher(packs.topicWords);
  const fromDisk = paths.filter((p) => p !== '-');
  const { files, outside = [] } =
    fromDisk.length > 0 ? await findDrafts(fromDisk, options.cwd, pickDefined(options)) : { files: [] as string[] };
  const result: CheckResult = { files: [], rules: [], claims: [], flags: [], skipped: [] };
  // Like standard input below, links out of the folder are reported by the first shard only.
  for (const file of options.shard === undefined || options.shard.index === 1 ? outside : []) {
    addUnchecked(result, new FirnlineError('draft-link-outside', 'a link to a file outside the folder being checked, not followed; name the file itself to check it, or exclude the link', { file }), file);
  }

  const levels = options.levels ?? {};
  if (files.some((file) => draftFormat(file) === 'html')) await loadHtmlReader();
  // Standard input belongs to the first shard, so merged shards hold it once.
  if (paths.includes('-') && (options.shard === undefined || options.shard.index === 1)) {
    if (options.readStdin === undefined) throw new FirnlineError('stdin-unavailable', 'standard input cannot be read here');
    addText(result, draftFromText('-', await options.readStdin(), 'markdown'), packs, { topic, levels });
  }
  const tasks: FileTask[] = [];
  for (const file of files) {
    const projectPath = toPosix(relative(options.projectRoot ?? options.cwd, resolve(options.cwd, file)));
    if (options.shard !== undefined && !inShard(projectPath, options.shard)) continue;
    tasks.push({ path: file, projectPath, format: draftFormat(file) });
  }
  const outcomes = await runFiles(tasks, { cwd: options.cwd, packs, levels, topic, ...pickRun(options) });
  // Outcomes come back in file order whatever ran them (pool, cache or this thread).
  tasks.forEach((task, i) => {
    const outcome = outcomes[i];
    if (outcome !== undefined) addOutcome(result, task.path, outcome);
  });
  result.rules = describeFlaggedRules(result.flags, packs);
  result.packs = packs.packs.map(({ id, version, asOf }) => ({ id, version, asOf }));
  return result;
}

/** Checks one text in memory: the library entry point (`import { checkText } from 'firnline'`). */
export async function checkText(
  text: string,
  options: { path?: string; format?: 'markdown' | 'text' | 'html'; packs?: LoadedPacks; levels?: Record<string, Level | 'off'> } = {},
): Promise<CheckResult> {
  const packs = options.packs ?? (await loadPacks([]));
  const result: CheckResult = { files: [], rules: [], claims: [], flags: [], skipped: [] };
  const path = options.path ?? '-';
  const format = options.format ?? draftFormat(path);
  if (format === 'docx') throw new FirnlineError('not-text', 'a Word draft is not text: check the file with checkPaths', { file: path });
  if (format === 'html') await loadHtmlReader();
  const draft = { path, text, format };
  addText(result, draft, packs, { topic: createTopicMatcher(packs.topicWords), levels: options.levels ?? {} });
  result.rules = describeFlaggedRules(result.flags, packs);
  result.packs = packs.packs.map(({ id, version, asOf }) => ({ id, version, asOf }));
  return result;
}

/** Adds one draft's findings (see checkFileText). */
function addText(result: CheckResult, raw: Pick<Draft, 'path' | 'text' | 'format'> | Draft, packs: LoadedPacks, options: DraftOptions): void {
  addOutcome(result, raw.path, checkFileText(raw, packs, options));
}

/** Adds what one file's check found, in the order a run reports it. */
function addOutcome(result: CheckResult, path: string, outcome: FileOutcome): void {
  if (outcome.unchecked !== undefined) {
    // A draft that could not be checked is not counted as checked; it fails the run.
    const { reason, line, column } = outcome.unchecked;
    result.skipped.push({ file: path, reason, unchecked: true, ...(line === undefined ? {} : { line }), ...(column === undefined ? {} : { column }) });
    return;
  }
  result.files.push(path);
  if (outcome.skipped !== undefined) result.skipped.push({ file: path, reason: outcome.skipped });
  result.claims.push(...outcome.claims);
  result.flags.push(...outcome.flags);
}

/**
 * One file's findings. A text that names no subject of the packs (a CO2 term, an ice core, an ice
 * age, the orbit, a period: `lexicon.subjects`) is skipped before it is even parsed, and so is a
 * sign-off checklist that Firnline wrote (it quotes every claim, and is not a draft). A draft too
 * deeply nested to read comes back as not checked (`unchecked`), which fails the run while the
 * other drafts go on. Runs the same in a worker of the pool (speed/pool-worker.ts).
 */
export function checkFileText(raw: Pick<Draft, 'path' | 'text' | 'format'> | Draft, packs: LoadedPacks, options: DraftOptions): FileOutcome {
  const { path, text, format } = raw;
  const passed = passOver(text, packs);
  if (passed !== undefined) return passed;
  let draft: Draft;
  let beside: boolean[] | undefined;
  try {
    // A Markdown draft is parsed only around its subjects and its sentences with two numbers
    // (speed/sparse-markdown.ts): the same claims as a parse of the whole.
    const sparse = 'blocks' in raw || format !== 'markdown' ? undefined : sparseMarkdownDraft(path, text, (t) => namesSubject(t, packs));
    draft = 'blocks' in raw ? raw : sparse?.draft ?? draftFromText(path, text, format === 'docx' ? 'text' : format);
    // A draft about the subject throughout is read whole (its blocks are a whole parse's): every block
    // may take its subject from it, as subjectNearby decides.
    beside = sparse?.throughout === true ? undefined : sparse?.subjectBeside;
  } catch (error) {
    if (error instanceof FirnlineError) return { claims: [], flags: [], unchecked: uncheckedOf(error) };
    throw error;
  }
  return checkDraft(draft, packs, beside === undefined ? options : { ...options, subjectBeside: beside });
}

/** Why a file that names no subject of the packs was passed over. */
export const NO_SUBJECT = 'names no subject of the packs';

/** A draft that could not be checked, as a report entry: the one-line message and its place. */
export function uncheckedOf(problem: FirnlineError): NonNullable<FileOutcome['unchecked']> {
  const { line, column } = problem.where ?? {};
  return { reason: problem.message, ...(line === undefined ? {} : { line }), ...(column === undefined ? {} : { column }) };
}

/**
 * The cheap first look at a file's raw text, before any parse: a sign-off checklist, or a text in
 * which the compiled subject matcher finds nothing, is done here. Undefined when the file needs
 * the full check.
 */
export function passOver(text: string, packs: LoadedPacks): FileOutcome | undefined {
  if (text.trimStart().startsWith(CHECKLIST_MARKER) && isChecklistText(text)) return { claims: [], flags: [], skipped: 'sign-off checklist' };
  if (!namesSubject(text, packs)) return { claims: [], flags: [], skipped: NO_SUBJECT };
  return undefined;
}

/** True when `text` names a subject of the packs (`lexicon.subjects`): what puts a draft on topic. */
export function namesSubject(text: string, packs: LoadedPacks): boolean {
  return subjectMatcherOf(packs).test(text);
}

/** Records a draft that was named or walked but could not be checked; it fails the run. */
function addUnchecked(result: CheckResult, problem: FirnlineError, file: string): void {
  addOutcome(result, file, { claims: [], flags: [], unchecked: uncheckedOf(problem) });
}

/**
 * Runs every stage on one draft: sentences per block, the topic prefilter, quantities, bindings,
 * then the checks; flag offsets are mapped back to the original file at the very end.
 */
export function checkDraft(draft: Draft, packs: LoadedPacks, options: DraftOptions = {}): DraftResult {
  const topic = options.topic ?? createTopicMatcher(packs.topicWords);
  const levels = options.levels ?? {};
  const projectPath = options.projectPath ?? draft.path;
  const lines = createLineIndex(draft.text);
  const claims: Claim[] = [];
  const seen = new Map<string, number>();
  const subjects = subjectMatcherOf(packs);
  const beside = options.subjectBeside ?? subjectNearby(draft.blocks, packs);
  draft.blocks.forEach((block, blockIndex) => {
    // A block with no subject in it or beside it holds at most the draft's own arithmetic and unit
    // slips, which need two numbers in one sentence (sentences are pieces of their block): without
    // them it is not even split.
    const nextTo = beside[blockIndex] === true;
    if (!TWO_NUMBERS.test(block.text) && !nextTo && !subjects.test(block.text) && !hasTwoNumerals(block.text)) return;
    const sentences = splitSentences(block.text, blockIndex, draftLineWidth(draft.text));
    const paragraph = sentences.map((s) => s.text);
    // What each sentence asserts, its opening title or label lines blanked (offsets kept): the
    // figure checks read a label as the sentence's own words (it names the subject or the date of
    // the text under it), the reasoning checks and the stance reader read only what it asserts.
    const asserted = sentences.map((s) => (s.label === undefined ? s.text : s.text.slice(0, s.label).replace(/\S/gu, ' ') + s.text.slice(s.label)));
    const assertedWindowOf = paragraphWindows(asserted);
    // A block quote that is a post under its byline or a passage of its own is a voice of the draft;
    // one of a single sentence, or one repeating earlier words of the draft, quotes what it holds.
    const voiced = isVoicedQuote(draft.text, draft.blocks, blockIndex, sentences.length);
    // "> so the core goes back 800,000 yrs" in a plain-text thread, under the post that said it: a quotation.
    const quotedLines = block.kind === 'text' ? asserted.filter((_t, i) => quotesEarlierLine(draft.text, block.offsets[sentences[i]?.start ?? 0] ?? 0)) : [];
    const context: ParagraphContext = { blockKind: block.kind, heading: block.heading, ...(block.marked === true ? { marked: true } : {}), ...(voiced ? { voiced } : {}), ...(quotedLines.length > 0 ? { quotedLines } : {}) };
    // The period the blocks just before named sets the scene of this block's opening sentences.
    const scene = sceneBefore(draft.blocks, blockIndex, packs);
    const opening: ParagraphContext = scene === undefined ? context : { ...context, scene };
    const windowOf = paragraphWindows(paragraph);
    let leadIn: readonly string[] | undefined;
    const leadInHere = (): readonly string[] => (leadIn ??= options.leadIns?.[blockIndex] ?? leadInOf(draft.text, draft.blocks, blockIndex, (t) => subjects.test(t)));
    const named = subjectsNamed(paragraph, subjects);
    sentences.forEach((sentence, index) => {
      const { window, at } = windowOf(index);
      // A generic topic word ("percent", "record"), or a word for what a direction fact is about
      // ("the air in the bubbles", "seawater"), counts only where the sentence's window, or a block
      // beside its block, names a subject.
      const inWindow = nextTo || named(index - at, window.length);
      // The first sentences of a block read on from the blocks just before it (its lead-in).
      const lead = at === index && index < CONTEXT_SENTENCES && (DIGIT.test(sentence.text) || hasTwoNumerals(sentence.text)) ? leadInHere() : [];
      const asked = (): string | undefined => (at > 0 ? window[at - 1] : index === 0 ? leadInHere().at(-1) : undefined);
      const onTopic =
        named.at(index) ||
        (inWindow && (topic.test(sentence.text) || factMatcherOf(packs).test(sentence.text) || standsAloneAsFrame(sentence.text, packs))) ||
        answersQuestion(sentence.text, asked, index === 0 && lead.length > 0, subjects, topic);
      // A block's first sentence reads on from the blocks just before it in the reasoning checks too.
      const here = at === index ? (index === 0 ? withLeadIn(opening, leadInHere()) : opening) : context;
      // A block's first sentence reads on from a sentence that introduces it with a colon as from
      // the sentence before it in its own paragraph (a list after its lead-in sentence).
      // So does an answer from the question above it that asks for a figure (a quiz's "How far below
      // today was sea level ...?" over "About 120 metres.").
      const previousOnTopic = (): boolean => inWindow && topic.test(window[at - 1] ?? (index === 0 ? (introOf(lead, block.kind === 'list-item') ?? questionOf(lead)) : undefined) ?? '');
      const reading = assertedWindowOf(index).window;
      const found = options.reuseSentences === false ? examineSentence(window, at, packs, onTopic, here, previousOnTopic, lead, reading) : examineCached(window, at, packs, onTopic, here, previousOnTopic, lead, reading);
      if (found === undefined) return;
      const { quantities, bindings, verdicts, drafts } = found;

      const folded = foldClaimText(sentence.text);
      const occurrence = (seen.get(folded) ?? 0) + 1;
      seen.set(folded, occurrence);
      const id = claimIdOf(projectPath, sentence.text, occurrence);
      const toSpan = (start: number, end: number): Flag['span'] => {
        const range = blockRange(draft.text, block, sentence.start + start, sentence.start + end);
        return lines.toSpan(range.start, range.end);
      };
      const span = toSpan(0, sentence.text.length);
      // A Word draft's line N is its paragraph N (source/word/word-draft.ts).
      const place = draft.format === 'docx' ? { paragraph: { number: span.start.line, heading: block.heading } } : {};
      const flags = applyLevels(drafts, levels).map((d) => ({ ...resolveFlag(d, draft, sentence, id, toSpan), ...place }));
      claims.push({
        id,
        file: draft.path,
        ...(projectPath === draft.path ? {} : { projectPath }),
        span,
        ...place,
        text: sentence.text,
        heading: block.heading,
        // Copies: the checks keep what they read from a quantity object or list for as long as it lives
        // (reference-slips.ts readingsKept, arithmetic-reader/relations.ts memo), some 1.2 MiB per 128 KB
        // of on-topic prose that a run would otherwise hold to its report. The copies hold the same data.
        quantities: quantities.map((q) => ({ ...q })),
        bindings,
        verdict: verdictOf(verdicts),
        flags,
        ...(block.marked === true ? { marked: true as const } : {}),
      });
    });
  });
  return { claims, flags: claims.flatMap((c) => c.flags) };
}

/**
 * Per block, whether the block just before or just after it names a subject of the packs
 * (`lexicon.subjects`). A generic topic word ("percent", "record", "temperature") makes a sentence
 * a candidate claim only where its paragraph window or a block beside it names a subject: a draft
 * is on topic because it names the subject, and a sentence may take its subject from its paragraph
 * or from the block beside it (a list item after its lead-in, a post in a thread). Elsewhere a
 * sentence is a claim only through the draft's own arithmetic or unit slip.
 */
export function subjectBeside(blocks: readonly ProseBlock[], packs: LoadedPacks): boolean[] {
  const subjects = subjectMatcherOf(packs);
  const named = blocks.map((b) => subjects.test(b.text));
  return named.map((_hit, i) => named[i - 1] === true || named[i + 1] === true);
}

/**
 * Per block, whether it may take its subject from the draft: from a block beside it
 * (`subjectBeside`), or from anywhere when the draft names its subject throughout
 * (prose/topical-throughout.ts: a thread whose reply names only a region and a temperature).
 */
export function subjectNearby(blocks: readonly ProseBlock[], packs: LoadedPacks): boolean[] {
  const subjects = subjectMatcherOf(packs);
  if (topicalThroughout(blocks.map((b) => subjects.test(b.text)))) return blocks.map(() => true);
  return subjectBeside(blocks, packs);
}

/**
 * examineSentence through the per-sentence cache (speed/sentence-cache.ts): what a sentence holds
 * depends only on its paragraph window, its place in it, the paragraph's kind, heading and marker,
 * the packs and its topic tests, so an editor's re-check after a one-word edit re-reads only the
 * paragraph that changed.
 */
function examineCached(
  paragraph: string[],
  index: number,
  packs: LoadedPacks,
  onTopic: boolean,
  context: ParagraphContext,
  previousOnTopic: () => boolean,
  leadIn: readonly string[],
  asserted: string[] = paragraph,
): SentenceFindings | undefined {
  const previous = previousOnTopic();
  return cachedFindings(packs, paragraph, index, [onTopic, previous, context.blockKind ?? '', context.heading ?? '', context.marked === true, context.voiced === true, context.quotedLines ?? [], context.scene ?? '', leadIn, context.leadIn ?? [], asserted.some((t, i) => t !== paragraph[i]) ? asserted : []], () =>
    examineSentence(paragraph, index, packs, onTopic, context, () => previous, leadIn, asserted),
  );
}

/** What the stages found in one sentence, before positions are resolved. */
interface SentenceFindings {
  quantities: Quantity[];
  bindings: Binding[];
  verdicts: Verdict[];
  drafts: FlagDraft[];
}

/** The most words a bare answer holds ("Older.", "Younger, by far."). */
const ANSWER_WORDS = 4;

/**
 * An answer right under a question is on the question's topic, though it names no subject itself:
 * a short one ("Q: Is the trapped air older or younger than the ice? A: Older.") under a question
 * that names a subject, and a block that opens with a figure ("When did the Pleistocene begin?"
 * then "About 1.8 million years ago.") under one that names a subject or a topic word. `question`
 * gives the sentence before (the block's lead-in for a block's first sentence).
 */
function answersQuestion(text: string, question: () => string | undefined, opensWithFigure: boolean, subjects: { test(text: string): boolean }, topic: { test(text: string): boolean }): boolean {
  const short = text.split(/\s+/u).filter((w) => /\p{L}/u.test(w)).length <= ANSWER_WORDS;
  const asked = question();
  if (asked === undefined || !QUESTION.test(asked)) return false;
  // A question that offers a choice ("Was CO2 a driver, or a passenger?") is answered at any length:
  // "The evidence already points firmly to passenger." takes up its subject.
  if (subjects.test(asked) && OFFERS_CHOICE.test(asked)) return true;
  if (!short && !opensWithFigure) return false;
  return subjects.test(asked) || (opensWithFigure && topic.test(asked));
}

/** A question that offers alternatives: an "or" between them. */
const OFFERS_CHOICE = /\bor\b/iu;

/** `context` with the lead-in the reasoning checks read a block's first sentence with, when there is one. */
function withLeadIn(context: ParagraphContext, leadIn: readonly string[]): ParagraphContext {
  return leadIn.length === 0 ? context : { ...context, leadIn };
}

/** `context` without a lead-in: the block's own sentences, as the stance of its numbers is read. */
function ownBlock({ leadIn: _leadIn, ...context }: ParagraphContext): ParagraphContext {
  return context;
}

/** How many earlier sentences of a paragraph the arithmetic and unit checks see. */
const CONTEXT_SENTENCES = 4;

/** Two numerals apart: the least a sentence needs for its own arithmetic or a restated unit. */
const TWO_NUMBERS = /\d[^\d]+\d/u;

/**
 * Runs the stages on `paragraph[index]`. A sentence with a topic word gets every check; one without
 * (in a draft that is on topic) gets only the draft's own arithmetic and unit checks, and only
 * counts as a claim when they flag it: "from 12,900 to 11,700 years ago: a cold spell of some 2,000
 * years" is wrong whatever its subject. Undefined when the sentence holds no claim.
 */
function examineSentence(
  paragraph: string[],
  index: number,
  packs: LoadedPacks,
  onTopic: boolean,
  context: ParagraphContext,
  previousOnTopic: () => boolean,
  leadIn: readonly string[] = [],
  asserted: string[] = paragraph,
): SentenceFindings | undefined {
  const text = paragraph[index] ?? '';
  // Only the last few sentences are context (the checks read the one before): copying every
  // earlier sentence would make a long paragraph quadratic. A block's first sentences read on
  // from its lead-in.
  const before = [...leadIn, ...paragraph.slice(Math.max(0, index - CONTEXT_SENTENCES), index)].slice(-CONTEXT_SENTENCES);
  // The sentence a number may take its subject from ("### What was the Younger Dryas?" / "It lasted ...").
  const previous = sentenceBefore(paragraph, index, leadIn, context, packs);
  if (!onTopic) {
    // A block's first sentence with no word of the subject carries one from the sentence that
    // introduces it or from its section's heading (never from a block before it that does not
    // introduce it: "I've been doing these threads for 3 years" after a post on the deglaciation is
    // no claim about it).
    const carries = previousOnTopic() || (index === 0 && leadIn.length === 0 && previous !== undefined);
    const carried = DIGIT.test(text) && carries ? carriedSubject(text, previous, packs, before, historyOf(before, previous, context, packs)) : undefined;
    if (carried !== undefined) return carried;
    // One number reads on from the sentences before only in the unit checks: "2. Its record covers
    // about 800 million years" after an item naming the core is a thousand-for-million slip.
    // One figure may also be the result of a worked sum whose inputs stand in the sentences before
    // ("... from about 18,000 to 11,500 years ago. That is a period of 9,500 years."; "About 1,800
    // years." under its question): it reaches the arithmetic checks when they hold figures, and
    // those checks flag only a figure drawn from them (arithmetic-solver.ts, arithmetic-reader/).
    const single = !TWO_NUMBERS.test(text) && !hasTwoNumerals(text);
    if (single && (before.length === 0 || !DIGIT.test(text))) return undefined;
    const quantities = parseQuantities(text);
    const worked = !single || before.some((s) => hasNumeral(s));
    const slips = worked ? [...checkArithmetic(text, quantities, before), ...checkUnits(text, quantities, before)] : checkUnits(text, quantities, before);
    if (slips.length === 0) return undefined;
    // A slip in a quotation or a marked passage is the quoted writer's, not the draft's.
    const reading = paragraphReader(asserted, packs, ownBlock(context))(index);
    const drafts = reading === undefined ? slips : judgeByStance(slips, reading.stance);
    return { quantities, bindings: [], verdicts: [], drafts };
  }
  // "four cycles and EPICA Dome C eight": a number whose unit a neighbour states takes that unit;
  // "CO2 was around 350": a bare number after a term the pack gives one unit takes that unit.
  const read = restoreTermUnits(text, restoreElidedUnits(text, parseQuantities(text)), packs);
  // "it rose 1.2 ppm between 2023 and 2024": a change told over one year binds as that year's rate;
  // "one of those cycles lasted ...": a partitive naming members counts no total. The arithmetic and
  // unit checks read the figures as written.
  const quantities = readAnnualRates(text, readPartitiveCounts(text, read), packs);
  // The previous sentence of the paragraph may name the subject of a number ("They drilled down 2,000 m").
  // The texts a description of a kind ("that core", "the cold snap") may take its subject from, oldest first.
  const history = historyOf(before, previous, context, packs);
  const { bindings } = bindQuantities(text, quantities, packs, previous, history);
  const reference = checkReferences(text, quantities, bindings, packs, before);
  // "today's air carries some 420 parts per billion": a figure that binds only in the unit it was meant in.
  const rebound = reboundSlips(text, quantities, bindings, packs, (again) => bindQuantities(text, again, packs, previous, history).bindings, before);
  // "The Vostok hole went down 3,623 ft": a figure that binds nothing but fits, read in metres, the one value its passage names.
  const unbound = unboundSlips(text, quantities, bindings, rebound, packs, before);
  const reading = paragraphReader(asserted, packs, ownBlock(context))(index);
  const own = preferSpecific([...reference.flags, ...rebound, ...unbound, ...checkArithmetic(text, read, before), ...checkUnits(text, read, before), ...checkRanks(text, packs)]);
  const drafts = [...(reading === undefined ? own : judgeByStance(own, reading.stance)), ...checkReasoning(asserted, index, packs, context)];
  const p = reading?.props;
  // A causal or order statement is a claim to sign off even without a number.
  const asserts = p !== undefined && p.causes.length + p.orders.length + p.relations.length + p.comparisons.length + p.evidence.length > 0;
  // A number is a claim when its sentence (or the one before: "It reaches down 3,270 m.") names a subject.
  const subjects = subjectMatcherOf(packs);
  const measured = quantities.some((q) => q.dimension !== 'number') && (subjects.test(text) || subjects.test(previous ?? ''));
  if (!measured && bindings.length === 0 && drafts.length === 0 && !asserts) return undefined;
  return { quantities, bindings, verdicts: reference.verdicts, drafts };
}

const DIGIT = /\d/u;

/** A sentence that ends as a question, past closing quotes, brackets and emphasis marks. */
const QUESTION = /\?[\s"'”’)\]*_]*$/u;

/**
 * The question a block answers: the last sentence of its lead-in when it asks for a figure ("How
 * far below today was sea level at the height of the last ice age?" over "About 120 metres."). The
 * answer reads on from it as a list item reads on from the sentence ending in a colon above it.
 */
function questionOf(leadIn: readonly string[]): string | undefined {
  const last = leadIn.at(-1);
  return last !== undefined && QUESTION.test(last) && asksForFigure(last) ? last : undefined;
}

/**
 * The sentence a sentence reads on from: the one before it in its paragraph; for a block's first
 * sentence, the lead-in sentence that introduces the block with a colon (prose/lead-in.ts introOf),
 * else the last sentence of its lead-in (a list item after the item before, a post after the post
 * before), else the subjects its section heading names.
 */
function sentenceBefore(paragraph: readonly string[], index: number, leadIn: readonly string[], context: ParagraphContext, packs: LoadedPacks): string | undefined {
  if (index > 0) return paragraph[index - 1];
  // An answer reads on from its whole question: "At Mauna Loa, CO2 peaks each May. What was the May
  // 2024 average?" sets the place in the sentence before the one that asks.
  const last = leadIn.at(-1);
  if (last !== undefined && QUESTION.test(last) && leadIn.length > 1) return leadIn.slice(-2).join(' ');
  return introOf(leadIn, context.blockKind === 'list-item') ?? last ?? headingSubjects(context.heading, packs);
}

/**
 * What a sentence's back-references may reach, oldest first: its section heading's subjects, the
 * block's lead-in (the item or post before, the sentence introducing it) and the sentences before it
 * in its block, ending with the sentence it reads on from.
 */
function historyOf(before: readonly string[], previous: string | undefined, context: ParagraphContext, packs: LoadedPacks): string[] {
  const heading = headingSubjects(context.heading, packs);
  const texts = [...(heading === undefined ? [] : [heading]), ...before];
  return previous === undefined || texts.at(-1) === previous ? texts : [...texts, previous];
}

/**
 * The subjects a section heading names ("### What was the Younger Dryas?" → "Younger Dryas"), as
 * the sentence a block's first number may take its subject from. Only the subject words: a heading
 * that states something ("Myth 2: CO2 was as high then as now") lends its subject, never its claim.
 */
function headingSubjects(heading: string | undefined, packs: LoadedPacks): string | undefined {
  if (heading === undefined || heading === '') return undefined;
  const subjects = subjectMatcherOf(packs);
  const named = [...findTerms(heading, packs).values()]
    .flat()
    .sort((a, b) => a[0] - b[0])
    .map(([start, end]) => heading.slice(start, end))
    .filter((words) => subjects.test(words));
  return named.length === 0 ? undefined : [...new Set(named)].join(', ');
}

/** Which sentences of a paragraph name a subject, and whether a window of it (from, length) names one. */
interface SubjectsNamed {
  (from: number, length: number): boolean;
  at(index: number): boolean;
}

function subjectsNamed(paragraph: string[], subjects: TopicMatcher): SubjectsNamed {
  const hits = paragraph.map((s) => subjects.test(s));
  // Sentences before each index that name a subject, so a window's answer is one subtraction.
  const before = [0];
  hits.forEach((hit, i) => before.push((before[i] ?? 0) + (hit ? 1 : 0)));
  const named = (from: number, length: number): boolean => (before[from + length] ?? 0) - (before[from] ?? 0) > 0;
  return Object.assign(named, { at: (index: number) => hits[index] === true });
}

/**
 * A sentence with no topic word whose number takes its subject from the sentence before ("The EPICA
 * Dome C core was drilled by ten nations. It reaches down 3,270 metres."): a claim when that number
 * binds, checked like any other; undefined otherwise.
 */
function carriedSubject(text: string, previous: string | undefined, packs: LoadedPacks, before: readonly string[], history: readonly string[]): SentenceFindings | undefined {
  const read = restoreElidedUnits(text, parseQuantities(text));
  const quantities = readAnnualRates(text, readPartitiveCounts(text, read), packs);
  // "[19:13] Sinead: my section is the younger dryas. it started 12,900 years ago" / "it lasted about
  // 3,000 years": a pronoun takes up the subject the sentence before took up, as in an on-topic sentence.
  const { bindings } = bindQuantities(text, quantities, packs, previous, history);
  if (bindings.length === 0) return undefined;
  const reference = checkReferences(text, quantities, bindings, packs, before);
  const drafts = preferSpecific([...reference.flags, ...checkArithmetic(text, read, before), ...checkUnits(text, read, before)]);
  return { quantities, bindings, verdicts: reference.verdicts, drafts };
}

/** The unit table's slip rules for a figure that binds nothing, which a bound figure's unit slip replaces. */
const SLIP_SUBSUMES: readonly string[] = ['unit.ppb-ppm', 'unit.percent-ppm'];

/**
 * One number, one explanation: when the draft's own arithmetic or a unit slip explains a number,
 * a reference-value flag on the same words is dropped ("0.4 percent" is a ppm/percent slip, and
 * "a rise of 50 ppm" between two stated levels is a subtraction error, before either is a value
 * out of range). The arithmetic or unit flag carries the corrected number.
 */
function preferSpecific(all: FlagDraft[]): FlagDraft[] {
  // A figure that binds a value and fits it in another unit gets the reference check's unit slip,
  // with the value's sources; the unit checks' own slips of a figure alone (ppb for ppm,
  // a CO2 share in percent) speak only for a figure that binds none. The thousand-for-million rule
  // (unit.age-scale) reads the subject's ceiling and keeps its flag, as a restatement does. A restatement the draft makes itself ("6 °C, or 42.8 °F")
  // is checked against its own first figure, which says more than a reference: it keeps its flag.
  const overlaps = (a: FlagDraft, b: FlagDraft) => a.start < b.end && b.start < a.end;
  const scaled = all.filter((d) => d.ruleId === 'unit.scale-slip');
  const restated = all.filter((d) => d.ruleId.startsWith('unit.') && d.ruleId !== 'unit.scale-slip' && !SLIP_SUBSUMES.includes(d.ruleId));
  const drafts = scaled.length === 0
    ? all
    : all.filter((d) => (SLIP_SUBSUMES.includes(d.ruleId) ? !scaled.some((s) => overlaps(s, d)) : d.ruleId !== 'unit.scale-slip' || !restated.some((s) => overlaps(s, d))));
  // A figure that the draft's own numbers explain ("76 ppm over 6,000 years, roughly 1 ppm per
  // decade") is an arithmetic slip before it is a unit slip: a reference read in another unit gives
  // way to the sum the sentence itself makes, whose correction the editor can check on the page.
  const arithmetic = drafts.filter((d) => d.ruleId.startsWith('arith.'));
  const own = arithmetic.length === 0 ? drafts : drafts.filter((d) => d.ruleId !== 'unit.scale-slip' || !arithmetic.some((a) => overlaps(a, d)));
  const specific = own.filter((d) => d.ruleId.startsWith('arith.') || d.ruleId.startsWith('unit.'));
  if (specific.length === 0) return own;
  return own.filter((d) => !d.ruleId.startsWith('value.') || !specific.some((s) => s.start < d.end && d.start < s.end));
}

const subjectMatchers = new WeakMap<LoadedPacks, TopicMatcher>();

/** The matcher for the words that put a draft on topic (compiled once per packs). */
function subjectMatcherOf(packs: LoadedPacks): TopicMatcher {
  let matcher = subjectMatchers.get(packs);
  if (matcher === undefined) {
    matcher = createTopicMatcher(subjectWordsOf(packs.lexicon));
    subjectMatchers.set(packs, matcher);
  }
  return matcher;
}

const periodFinders = new WeakMap<LoadedPacks, [string, RegExp][]>();

/**
 * The period (lexicon `periods` key, the deglaciation aside: it is a process, not a scene) named
 * last in the nearest of the two blocks before `index` that names one, under the same heading.
 */
function sceneBefore(blocks: readonly ProseBlock[], index: number, packs: LoadedPacks): string | undefined {
  let finders = periodFinders.get(packs);
  if (finders === undefined) {
    const periods = Object.entries(packs.lexicon['periods'] ?? {}).filter(([key]) => key !== 'deglaciation');
    finders = periods.flatMap(([key, phrases]) => {
      const pattern = topicPattern(phrases, 'giu');
      return pattern === undefined ? [] : [[key, pattern] as [string, RegExp]];
    });
    periodFinders.set(packs, finders);
  }
  const heading = blocks[index]?.heading;
  for (const block of [blocks[index - 1], blocks[index - 2]]) {
    if (block === undefined || block.heading !== heading) return undefined;
    let best: { key: string; at: number } | undefined;
    for (const [key, re] of finders) {
      for (const m of block.text.matchAll(re)) if (best === undefined || m.index > best.at) best = { key, at: m.index };
    }
    if (best !== undefined) return best.key;
  }
  return undefined;
}

const factMatchers = new WeakMap<LoadedPacks, TopicMatcher>();

/**
 * The matcher for the things the packs' direction facts are about ("the air in the bubbles", "the
 * ice", "seawater"): in a draft on topic, a sentence that names one may state a fact the wrong way
 * round without a number or a subject word ("The air in the bubbles is older than the ice.").
 */
function factMatcherOf(packs: LoadedPacks): TopicMatcher {
  let matcher = factMatchers.get(packs);
  if (matcher === undefined) {
    const keys = packs.directions.flatMap((fact) => fact.says.flatMap(factKeys));
    matcher = createTopicMatcher(entityWordsOf(packs.lexicon, [...new Set(keys)]));
    factMatchers.set(packs, matcher);
  }
  return matcher;
}

const frameMatchers = new WeakMap<LoadedPacks, { either: TopicMatcher; condition: TopicMatcher; later: TopicMatcher; correlation: TopicMatcher; proof: TopicMatcher; causeNoun: TopicMatcher; effectNoun: TopicMatcher }>();

/**
 * The frames of a reasoning check that stand as a sentence of their own in a thread, with no subject
 * word: the either/or frame ("It can't be both.", "cant be both, pick one": lexicon
 * `causes.either-or`), the lag put as a condition ("If the effect comes after, it cannot be the
 * cause": `stance.condition` with `order.after`) and a co-variation called proof ("the correlation
 * itself is the proof": `correlation` with `proof.all`) and a thing's two parts set against each other
 * ("It's an effect, not a cause.", "it's either the driver or the passenger": a part noun of each side,
 * `causes.nouns` and `causes.effects`, its subject a pronoun the sentences before resolve). Read in the words as the tokenizer cuts them, so "can't" and "cant" are
 * "can not" as the lexicon writes it; only where the sentence's window names a subject.
 */
function standsAloneAsFrame(text: string, packs: LoadedPacks): boolean {
  let matchers = frameMatchers.get(packs);
  if (matchers === undefined) {
    matchers = {
      either: createTopicMatcher(classWordsOf(packs.lexicon, 'causes', ['either-or'])),
      condition: createTopicMatcher(classWordsOf(packs.lexicon, 'stance', ['condition'])),
      later: createTopicMatcher(classWordsOf(packs.lexicon, 'order', ['after'])),
      correlation: createTopicMatcher(classWordsOf(packs.lexicon, 'correlation', ['all'])),
      proof: createTopicMatcher(classWordsOf(packs.lexicon, 'proof', ['all'])),
      causeNoun: createTopicMatcher(classWordsOf(packs.lexicon, 'causes', ['nouns'])),
      effectNoun: createTopicMatcher(classWordsOf(packs.lexicon, 'causes', ['effects'])),
    };
    frameMatchers.set(packs, matchers);
  }
  const tokens = tokenizeSentence(text, [], null);
  const words = tokens.words.map((i) => tokens.tokens[i]?.text ?? '').join(' ');
  // "If it comes afterwards, it isn't driving anything": the lag put as a condition (lexicon
  // `stance.condition` with `order.after`), its latecomer left to the sentences before.
  // "..., the correlation itself is the proof": a co-variation called proof (lexicon `correlation`
  // with `proof.all`), the causal claim it proves left to the passage.
  // "It was an effect, not a cause.": both parts of a thing named, what it is and what it is not.
  return (
    matchers.either.test(words) ||
    (matchers.condition.test(words) && matchers.later.test(words)) ||
    (matchers.correlation.test(words) && matchers.proof.test(words)) ||
    (matchers.causeNoun.test(words) && matchers.effectNoun.test(words))
  );
}

/** The lexicon entity keys a direction fact's form names. */
function factKeys(form: FactForm): string[] {
  switch (form.kind) {
    case 'relation':
      return [form.x.key, form.y.key];
    case 'comparison':
      return [...form.a, ...form.b];
    case 'order':
      return [form.first, form.then];
    case 'change':
      return form.of;
  }
}

function verdictOf(verdicts: Verdict[]): Verdict {
  if (verdicts.includes('conflicts')) return 'conflicts';
  if (verdicts.includes('agrees')) return 'agrees';
  return 'no reference';
}

function applyLevels(drafts: FlagDraft[], levels: Record<string, Level | 'off'>): FlagDraft[] {
  const kept: FlagDraft[] = [];
  for (const d of drafts) {
    // An own property only: a rule id such as `constructor` must not find Object.prototype's.
    const level = Object.hasOwn(levels, d.ruleId) ? levels[d.ruleId] : undefined;
    if (level === 'off') continue;
    kept.push(level === undefined ? d : { ...d, level });
  }
  return kept;
}

function resolveFlag(
  d: FlagDraft,
  draft: Draft,
  sentence: Sentence,
  claimId: string,
  toSpan: (start: number, end: number) => Flag['span'],
): Flag {
  const { start, end, ...rest } = d;
  return { ...rest, file: draft.path, span: toSpan(start, end), excerpt: sentence.text.slice(start, end), sentence: sentence.text, claimId };
}

function describeFlaggedRules(flags: Flag[], packs: LoadedPacks): RuleInfo[] {
  const rules = new Map<string, RuleInfo>();
  for (const flag of flags) {
    if (rules.has(flag.ruleId)) continue;
    rules.set(flag.ruleId, describeRule(packs, flag.ruleId) ?? describeFromFlag(flag));
  }
  return sortById([...rules.values()]);
}

/** Rules that live in code (arith.*, unit.*) describe themselves through their first flag. */
function describeFromFlag(flag: Flag): RuleInfo {
  return { id: flag.ruleId, summary: flag.reason, description: flag.reason, defaultLevel: flag.level, sources: flag.sources };
}

function pickRun(options: CheckOptions): Pick<CheckOptions, 'jobs' | 'cache' | 'onProgress' | 'onWorkersStarted' | 'onLargeRun'> {
  const picked: Pick<CheckOptions, 'jobs' | 'cache' | 'onProgress' | 'onWorkersStarted' | 'onLargeRun'> = {};
  if (options.onWorkersStarted !== undefined) picked.onWorkersStarted = options.onWorkersStarted;
  if (options.onLargeRun !== undefined) picked.onLargeRun = options.onLargeRun;
  if (options.jobs !== undefined) picked.jobs = options.jobs;
  if (options.cache !== undefined) picked.cache = options.cache;
  if (options.onProgress !== undefined) picked.onProgress = options.onProgress;
  return picked;
}

function pickDefined(options: CheckOptions): { include?: string[]; exclude?: string[]; root?: string } {
  const picked: { include?: string[]; exclude?: string[]; root?: string } = {};
  if (options.filterRoot !== undefined) picked.root = options.filterRoot;
  if (options.include !== undefined) picked.include = options.include;
  if (options.exclude !== undefined) picked.exclude = options.exclude;
  return picked;
}

function toPosix(path: string): string {
  return sep === '/' ? path : path.split(sep).join('/');
}
