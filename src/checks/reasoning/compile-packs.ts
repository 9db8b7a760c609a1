/**
 * The loaded packs compiled once for the reasoning checks: cue words into phrases, each check's
 * cheap prefilter, direction facts and pattern rules into regular expressions. Cached per
 * LoadedPacks object, so every sentence of a run shares one compilation.
 */
import { FirnlineError } from '../../errors.js';
import { regexProblem } from '../../rulepack/regex-problem.js';
import type { DirectionFact, LoadedPacks, PatternRule, ReasoningCheck } from '../../rulepack/types.js';
import { compileSlots, keyNames, LEXICON_KEY, type DetectorEntry, type Slots } from './detector.js';
import { DETECTORS } from './registry.js';
import { MAX_PATTERN_LENGTH } from './time-limit.js';

/** A reasoning check ready to run. */
export interface CompiledCheck {
  check: ReasoningCheck;
  entry: DetectorEntry;
  words: Slots;
  /** One regex per key of cue lists (any of its lists' words); the detector runs only when all of them match. */
  prefilter: RegExp[];
}

/** Everything the reasoning stage runs. */
export interface CompiledPacks {
  checks: CompiledCheck[];
  directions: { fact: DirectionFact; wrong: RegExp[]; right: RegExp[]; file: string }[];
  patterns: { rule: PatternRule; regex?: RegExp; file: string }[];
}

const cache = new WeakMap<LoadedPacks, CompiledPacks>();

/** Compiles (once per packs object). Throws FirnlineError for a pattern that is unsafe to run. */
export function compilePacks(packs: LoadedPacks): CompiledPacks {
  const hit = cache.get(packs);
  if (hit !== undefined) return hit;
  const fileOf = (has: (p: LoadedPacks['packs'][number]) => boolean) => packs.packs.find(has)?.file ?? '(rule pack)';
  const compiled: CompiledPacks = {
    checks: packs.reasoning.flatMap((check) => {
      const entry = Object.hasOwn(DETECTORS, check.id) ? DETECTORS[check.id] : undefined;
      if (entry === undefined || !check.enabled) return [];
      const words = compileSlots(check.words);
      // A key with a lexicon class among its names has no cue words to test the text for.
      const keys = entry.keys.map(keyNames).filter((names) => !names.some((n) => n.startsWith(LEXICON_KEY)));
      return [{ check, entry, words, prefilter: keys.map((names) => prefilterFor(names.flatMap((n) => check.words[n] ?? []))) }];
    }),
    directions: packs.directions.filter((fact) => fact.wrong.length > 0).map((fact) => {
      const file = fileOf((p) => p.directions.includes(fact));
      const compile = (source: string) => safeRegex(source, `direction fact ${fact.id}`, file);
      return { fact, wrong: fact.wrong.map(compile), right: (fact.right ?? []).map(compile), file };
    }),
    patterns: packs.patterns.map((rule) => {
      const file = fileOf((p) => p.patterns.includes(rule));
      if (rule.match !== undefined && rule.match.length > MAX_PATTERN_LENGTH) {
        throw new FirnlineError('pack-pattern', `pattern ${rule.id}: match is longer than ${MAX_PATTERN_LENGTH} characters`, { file });
      }
      return { rule, file, ...(rule.regex === undefined ? {} : { regex: safeRegex(rule.regex, `pattern ${rule.id}`, file) }) };
    }),
  };
  cache.set(packs, compiled);
  return compiled;
}

/** Check ids in the packs that no detector implements (for the loader or `explain` to report). */
export function unknownReasoningChecks(packs: LoadedPacks): string[] {
  return packs.reasoning.filter((c) => !Object.hasOwn(DETECTORS, c.id)).map((c) => c.id);
}

function safeRegex(source: string, what: string, file: string): RegExp {
  const problem = source.length > MAX_PATTERN_LENGTH ? `longer than ${MAX_PATTERN_LENGTH} characters` : regexProblem(source);
  if (problem !== undefined) throw new FirnlineError('pack-regex', `${what}: ${problem}`, { file });
  return new RegExp(source, 'iu');
}

// The first word of each phrase, cut to four letters so inflections still pass ("lagged" → "lagg").
/** Words that begin many cue phrases and say nothing about whether a phrase can match. */
const ARTICLES = new Set(['the', 'a', 'an']);

function prefilterFor(phrases: readonly string[]): RegExp {
  const stems = phrases.map((p) => {
    const words = p.toLowerCase().replace(/-/gu, ' ').trim().split(/\s+/u);
    // A leading article matches almost every sentence; the word after it must be there as well.
    const lead = ARTICLES.has(words[0] ?? '') && words.length > 1 && words[1] !== '...' ? words[1] : words[0];
    const first = lead?.replace(/\*$/u, '') ?? '';
    return [...first].slice(0, 4).join('').replace(/[.*+?^${}()|[\]\\]/gu, '\\$&');
  });
  const body = [...new Set(stems.filter((s) => s.length > 0 && s !== '...'))].join('|');
  // A stem may follow a number it is written onto ("800kyr"), never a letter.
  return body.length === 0 ? /(?!)/u : new RegExp(`(?<!\\p{L})(?:${body})`, 'iu');
}
