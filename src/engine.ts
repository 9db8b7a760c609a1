import { bindQuantities } from './claims/bind.js';
import { checkArithmetic } from './checks/arithmetic.js';
import { checkReasoning, judgeByStance, paragraphReader, type ParagraphContext } from './checks/reasoning/index.js';
import { checkReferences } from './checks/reference.js';
import { checkUnits } from './checks/units.js';
import { FirnlineError } from './errors.js';
import { relative, resolve, sep } from 'node:path';
import { CHECKLIST_MARKER } from './report/checklist-markdown.js';
import { createTopicMatcher, splitSentences, topicPattern, topicWordsOf, type TopicMatcher } from './prose/index.js';
import { parseQuantities } from './quantities/index.js';
import { claimIdOf, foldClaimText } from './review/claim-id.js';
import { describeRule, loadPacks } from './rulepack/index.js';
import type { LoadedPacks } from './rulepack/types.js';
import { blockRange, createLineIndex, draftAroundHits, draftFormat, findDrafts } from './source/index.js';
import { runFiles, type FileTask } from './speed/run-files.js';
import type { ResultCache } from './speed/cache.js';
import { inShard, type Shard } from './speed/shard.js';
import type { Binding, CheckResult, Claim, Draft, Flag, FlagDraft, Level, Quantity, RuleInfo, Sentence, Verdict } from './types.js';

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
}

/** Per-draft settings of `checkDraft`. */
export interface DraftOptions {
  topic?: TopicMatcher;
  /** The subject matcher (topicWordsOf) with the `g` flag: which parts of a file to analyse. */
  subjects?: RegExp | undefined;
  levels?: Record<string, Level | 'off'>;
  /** The draft's path relative to the project root, for claim ids (default: the draft's path). */
  projectPath?: string;
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
  const subjects = subjectPattern(packs);
  const fromDisk = paths.filter((p) => p !== '-');
  const { files } =
    fromDisk.length > 0 ? await findDrafts(fromDisk, options.cwd, pickDefined(options)) : { files: [] as string[] };
  const result: CheckResult = { files: [], rules: [], claims: [], flags: [], skipped: [] };

  const levels = options.levels ?? {};
  if (paths.includes('-') && (options.shard === undefined || options.shard.index === 1)) {
    if (options.readStdin === undefined) throw new FirnlineError('stdin-unavailable', 'standard input cannot be read here');
    addText(result, { path: '-', text: await options.readStdin(), format: 'markdown' }, packs, { topic, subjects, levels });
  }
  const tasks: FileTask[] = [];
  for (const file of files) {
    const projectPath = toPosix(relative(options.projectRoot ?? options.cwd, resolve(options.cwd, file)));
    if (options.shard !== undefined && !inShard(projectPath, options.shard)) continue;
    tasks.push({ path: file, projectPath, format: draftFormat(file) });
  }
  const outcomes = await runFiles(tasks, { cwd: options.cwd, packs, levels, subjects, topic, ...pickRun(options) });
  tasks.forEach((task, i) => {
    const outcome = outcomes[i];
    if (outcome === undefined) return;
    if (outcome.skipped === 'binary file') {
      result.skipped.push({ file: task.path, reason: outcome.skipped });
      return;
    }
    result.files.push(task.path);
    if (outcome.skipped !== undefined) result.skipped.push({ file: task.path, reason: outcome.skipped });
    result.claims.push(...outcome.claims);
    result.flags.push(...outcome.flags);
  });
  result.rules = describeFlaggedRules(result.flags, packs);
  result.packs = packs.packs.map(({ id, version, asOf }) => ({ id, version, asOf }));
  return result;
}

/** Checks one text in memory: the library entry point (`import { checkText } from 'firnline'`). */
export async function checkText(
  text: string,
  options: { path?: string; format?: 'markdown' | 'text'; packs?: LoadedPacks; levels?: Record<string, Level | 'off'> } = {},
): Promise<CheckResult> {
  const packs = options.packs ?? (await loadPacks([]));
  const result: CheckResult = { files: [], rules: [], claims: [], flags: [], skipped: [] };
  const path = options.path ?? '-';
  const draft = { path, text, format: options.format ?? draftFormat(path) };
  addText(result, draft, packs, { topic: createTopicMatcher(packs.topicWords), subjects: subjectPattern(packs), levels: options.levels ?? {} });
  result.rules = describeFlaggedRules(result.flags, packs);
  result.packs = packs.packs.map(({ id, version, asOf }) => ({ id, version, asOf }));
  return result;
}

/** Adds one draft's findings (see checkFileText). */
function addText(result: CheckResult, raw: Pick<Draft, 'path' | 'text' | 'format'>, packs: LoadedPacks, options: DraftOptions): void {
  result.files.push(raw.path);
  const { claims, flags, skipped } = checkFileText(raw, packs, options);
  if (skipped !== undefined) result.skipped.push({ file: raw.path, reason: skipped });
  result.claims.push(...claims);
  result.flags.push(...flags);
}

/**
 * One file's findings. A text that names no subject of the packs (a CO2 term, an ice core, an ice
 * age, the orbit, a period: `lexicon.subjects`, see prose/topicWordsOf) is skipped before it is even
 * parsed, and so is a sign-off checklist that Firnline wrote (it quotes every claim, and is not a
 * draft); otherwise only the blocks around the subject's mentions are parsed and checked
 * (source/windows.ts).
 */
export function checkFileText(
  raw: Pick<Draft, 'path' | 'text' | 'format'>,
  packs: LoadedPacks,
  options: DraftOptions,
): DraftResult & { skipped?: string } {
  const { path, text, format } = raw;
  if (text.trimStart().startsWith(CHECKLIST_MARKER)) return { claims: [], flags: [], skipped: 'sign-off checklist' };
  const subjects = options.subjects ?? subjectPattern(packs);
  const draft = subjects === undefined ? undefined : draftAroundHits(path, text, format, subjects);
  if (draft === undefined) return { claims: [], flags: [], skipped: NO_SUBJECT };
  return checkDraft(draft, packs, options);
}

/** Why a file that names no subject of the packs was passed over. */
export const NO_SUBJECT = 'names no subject of the packs';

/** The compiled subject matcher of the packs, global (it finds every mention). */
export function subjectPattern(packs: LoadedPacks): RegExp | undefined {
  return topicPattern(topicWordsOf(packs), 'giu');
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
  draft.blocks.forEach((block, blockIndex) => {
    const sentences = splitSentences(block.text, blockIndex);
    const paragraph = sentences.map((s) => s.text);
    const context: ParagraphContext = { blockKind: block.kind, heading: block.heading, ...(block.marked === true ? { marked: true } : {}) };
    sentences.forEach((sentence, index) => {
      const onTopic = topic.test(sentence.text) || subjectMatcherOf(packs).test(sentence.text);
      const found = examineSentence(paragraph, index, packs, onTopic, context);
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
      const flags = applyLevels(drafts, levels).map((d) => resolveFlag(d, draft, sentence, id, toSpan));
      claims.push({
        id,
        file: draft.path,
        ...(projectPath === draft.path ? {} : { projectPath }),
        span: toSpan(0, sentence.text.length),
        text: sentence.text,
        heading: block.heading,
        quantities,
        bindings,
        verdict: verdictOf(verdicts),
        flags,
        ...(block.marked === true ? { marked: true as const } : {}),
      });
    });
  });
  return { claims, flags: claims.flatMap((c) => c.flags) };
}

/** What the stages found in one sentence, before positions are resolved. */
interface SentenceFindings {
  quantities: Quantity[];
  bindings: Binding[];
  verdicts: Verdict[];
  drafts: FlagDraft[];
}

/** Two numerals apart: the least a sentence needs for its own arithmetic or a restated unit. */
const TWO_NUMBERS = /\d[^\d]+\d/u;

/**
 * Runs the stages on `paragraph[index]`. A sentence with a topic word gets every check; one without
 * (in a draft that is on topic) gets only the draft's own arithmetic and unit checks, and only
 * counts as a claim when they flag it: "from 12,900 to 11,700 years ago: a cold spell of some 2,000
 * years" is wrong whatever its subject. Undefined when the sentence holds no claim.
 */
function examineSentence(paragraph: string[], index: number, packs: LoadedPacks, onTopic: boolean, context: ParagraphContext): SentenceFindings | undefined {
  const text = paragraph[index] ?? '';
  const before = paragraph.slice(0, index);
  if (!onTopic) {
    if (!TWO_NUMBERS.test(text)) return undefined;
    const quantities = parseQuantities(text);
    const drafts = [...checkArithmetic(text, quantities, before), ...checkUnits(text, quantities, before)];
    return drafts.length === 0 ? undefined : { quantities, bindings: [], verdicts: [], drafts };
  }
  const quantities = parseQuantities(text);
  // The previous sentence of the paragraph may name the subject of a number ("They drilled down 2,000 m").
  const { bindings } = bindQuantities(text, quantities, packs, paragraph[index - 1]);
  const reference = checkReferences(text, quantities, bindings, packs);
  const reading = paragraphReader(paragraph, packs, context)(index);
  const own = preferSpecific([...reference.flags, ...checkArithmetic(text, quantities, before), ...checkUnits(text, quantities, before)]);
  const drafts = [...(reading === undefined ? own : judgeByStance(own, reading.stance)), ...checkReasoning(paragraph, index, packs, context)];
  const p = reading?.props;
  // A causal or order statement is a claim to sign off even without a number.
  const asserts = p !== undefined && p.causes.length + p.orders.length + p.relations.length + p.comparisons.length + p.evidence.length > 0;
  // A number is a claim when its sentence (or the one before: "It reaches down 3,270 m.") names a subject.
  const subjects = subjectMatcherOf(packs);
  const measured = quantities.some((q) => q.dimension !== 'number') && (subjects.test(text) || subjects.test(paragraph[index - 1] ?? ''));
  if (!measured && bindings.length === 0 && drafts.length === 0 && !asserts) return undefined;
  return { quantities, bindings, verdicts: reference.verdicts, drafts };
}

/**
 * One number, one explanation: when the draft's own arithmetic or a unit slip explains a number,
 * a reference-value flag on the same words is dropped ("0.4 percent" is a ppm/percent slip, and
 * "a rise of 50 ppm" between two stated levels is a subtraction error, before either is a value
 * out of range). The arithmetic or unit flag carries the corrected number.
 */
function preferSpecific(drafts: FlagDraft[]): FlagDraft[] {
  const specific = drafts.filter((d) => d.ruleId.startsWith('arith.') || d.ruleId.startsWith('unit.'));
  if (specific.length === 0) return drafts;
  return drafts.filter((d) => !d.ruleId.startsWith('value.') || !specific.some((s) => s.start < d.end && d.start < s.end));
}

const subjectMatchers = new WeakMap<LoadedPacks, TopicMatcher>();

/** The matcher for the words that put a draft on topic (compiled once per packs). */
function subjectMatcherOf(packs: LoadedPacks): TopicMatcher {
  let matcher = subjectMatchers.get(packs);
  if (matcher === undefined) {
    matcher = createTopicMatcher(topicWordsOf(packs));
    subjectMatchers.set(packs, matcher);
  }
  return matcher;
}

function verdictOf(verdicts: Verdict[]): Verdict {
  if (verdicts.includes('conflicts')) return 'conflicts';
  if (verdicts.includes('agrees')) return 'agrees';
  return 'no reference';
}

function applyLevels(drafts: FlagDraft[], levels: Record<string, Level | 'off'>): FlagDraft[] {
  const kept: FlagDraft[] = [];
  for (const d of drafts) {
    const level = levels[d.ruleId];
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
  return [...rules.values()].sort((a, b) => a.id.localeCompare(b.id));
}

/** Rules that live in code (arith.*, unit.*) describe themselves through their first flag. */
function describeFromFlag(flag: Flag): RuleInfo {
  return { id: flag.ruleId, summary: flag.reason, description: flag.reason, defaultLevel: flag.level, sources: flag.sources };
}

function pickRun(options: CheckOptions): Pick<CheckOptions, 'jobs' | 'cache' | 'onProgress'> {
  const picked: Pick<CheckOptions, 'jobs' | 'cache' | 'onProgress'> = {};
  if (options.jobs !== undefined) picked.jobs = options.jobs;
  if (options.cache !== undefined) picked.cache = options.cache;
  if (options.onProgress !== undefined) picked.onProgress = options.onProgress;
  return picked;
}

function pickDefined(options: CheckOptions): { include?: string[]; exclude?: string[] } {
  const picked: { include?: string[]; exclude?: string[] } = {};
  if (options.include !== undefined) picked.include = options.include;
  if (options.exclude !== undefined) picked.exclude = options.exclude;
  return picked;
}

function toPosix(path: string): string {
  return sep === '/' ? path : path.split(sep).join('/');
}
