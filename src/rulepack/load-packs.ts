/**
 * Loading rule packs: the built-in pack, a user's pack files, and all of them merged. Every mistake
 * in every file is collected and thrown together; nothing is returned from a half-loaded pack.
 */
import { isAbsolute, relative, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import { FirnlineError, FirnlineErrors } from '../errors.js';
import type { Source } from '../types.js';
import { resolvePack, type KnownIds } from './resolve-pack.js';
import type { Lexicon, LoadedPacks, RulePack } from './types.js';
import { byPlace, schemaErrors } from './validate-schema.js';
import { MAX_PACK_BYTES, packLimitProblems } from './pack-limits.js';
import { readYamlFile } from './yaml-file.js';
import { readCompiledPack, type PackInputPaths } from './compiled-pack.js';

/** Where the built-in pack lives, from both src/ and dist/. */
export const BUILTIN_PACK_FILE = fileURLToPath(new URL('../../rules/paleoclimate.yaml', import.meta.url));

/** The built-in pack as the build compiled it (compiled-pack.ts), and what it must have been made from. */
const COMPILED_BUILTIN = fileURLToPath(new URL('../generated/builtin-pack.json', import.meta.url));
const BUILTIN_INPUTS: PackInputPaths = {
  yaml: BUILTIN_PACK_FILE,
  schema: fileURLToPath(new URL('../../schemas/rulepack.schema.json', import.meta.url)),
  packageJson: fileURLToPath(new URL('../../package.json', import.meta.url)),
  codeRoot: fileURLToPath(new URL('..', import.meta.url)),
};

const NOTHING_KNOWN: KnownIds = { sources: new Map(), terms: new Set(), defined: new Map() };

/**
 * Loads one pack file; messages name the file as given. `known` holds what packs loaded before it define (a user pack may cite the
 * built-in pack's sources and terms by id). Throws FirnlineErrors listing every mistake.
 */
export async function loadRulePack(file: string, known: KnownIds = NOTHING_KNOWN, validated = false): Promise<RulePack> {
  const absolute = resolve(file);
  const yaml = await readYamlFile(absolute, shownPath(file), MAX_PACK_BYTES);
  // A file that is not a pack at all gets one line, and never an echo of its content.
  const data = yaml.data;
  if (data === null || typeof data !== 'object' || Array.isArray(data) || !Object.hasOwn(data, 'pack')) {
    throw new FirnlineErrors([new FirnlineError('pack-not-a-pack', 'this is not a rule pack (no `pack:` key at the top level); see docs/rule-packs.md', { file: shownPath(file) })]);
  }
  // Size first: a pack of any size is refused in bounded time (pack-limits.ts).
  const tooLarge = packLimitProblems(yaml);
  if (tooLarge.length > 0) throw new FirnlineErrors(tooLarge);
  // `validated`: the same file passed the schema in this run already (a worker of the pool); the
  // schema only reports, it never changes the data, so skipping it gives the same pack.
  const problems = validated ? [] : schemaErrors(yaml, 'rulepack');
  if (problems.length > 0) throw new FirnlineErrors(problems);
  const pack = resolvePack(yaml, absolute, known);
  if (Array.isArray(pack)) throw new FirnlineErrors(pack.sort(byPlace));
  return pack;
}

/** Loads the built-in pack, rules/paleoclimate.yaml. */
export async function loadBuiltinPack(): Promise<RulePack> {
  return readCompiledPack(COMPILED_BUILTIN, BUILTIN_INPUTS) ?? loadRulePack(BUILTIN_PACK_FILE);
}

/**
 * Loads the built-in pack (unless `builtin: false`) and the extra packs in order, and merges them.
 * An id defined in two packs is an error, reported at the later definition.
 */
export async function loadPacks(extraPackFiles: string[], options: { builtin?: boolean; validated?: boolean } = {}): Promise<LoadedPacks> {
  const packs: RulePack[] = [];
  const errors: FirnlineError[] = [];
  const files = [...(options.builtin === false ? [] : [BUILTIN_PACK_FILE]), ...extraPackFiles];
  for (const [i, file] of files.entries()) {
    // The built-in pack from its compiled form when that is current; a team's pack always from its YAML.
    const compiled = i === 0 && options.builtin !== false ? readCompiledPack(COMPILED_BUILTIN, BUILTIN_INPUTS) : undefined;
    if (compiled !== undefined) {
      packs.push(compiled);
      continue;
    }
    try {
      packs.push(await loadRulePack(file, knownIn(packs), options.validated === true));
    } catch (error) {
      if (error instanceof FirnlineErrors) errors.push(...error.errors);
      else if (error instanceof FirnlineError) errors.push(error);
      else throw error;
    }
  }
  if (errors.length > 0) throw new FirnlineErrors(errors);
  return mergePacks(packs);
}

/** Joins loaded packs into one lookup. */
export function mergePacks(packs: RulePack[]): LoadedPacks {
  const all = <T>(pick: (p: RulePack) => T[]): T[] => packs.flatMap(pick);
  const references = all((p) => p.references);
  const terms = all((p) => p.terms);
  const byRef = new Map(references.map((r) => [r.id, r]));
  const byTerm = new Map(terms.map((t) => [t.id, t]));
  return {
    packs, references, terms,
    directions: all((p) => p.directions),
    reasoning: all((p) => p.reasoning),
    patterns: all((p) => p.patterns),
    sources: all((p) => p.sources),
    lexicon: joinLexicons(packs.map((p) => p.lexicon)),
    // A bare figure ("1990", "66%") qualifies a value's setting (the year an assessment was published)
    // but never puts a sentence on the subject: "open from 1990 to 2000" is about a gallery.
    topicWords: [...new Set(terms.flatMap((t) => t.words.map((w) => w.toLowerCase())).filter((w) => /\p{L}/u.test(w)))],
    reference: (id) => byRef.get(id),
    term: (id) => byTerm.get(id),
  };
}

/** Lexicons joined class by class and key by key, in pack order. */
function joinLexicons(lexicons: Lexicon[]): Lexicon {
  const out: Lexicon = {};
  for (const lexicon of lexicons) {
    for (const [cls, keys] of Object.entries(lexicon)) {
      const into = (out[cls] ??= {});
      for (const [key, words] of Object.entries(keys)) into[key] = [...(into[key] ?? []), ...words];
    }
  }
  return out;
}

function knownIn(packs: RulePack[]): KnownIds {
  const defined = new Map<string, string>();
  for (const pack of packs) {
    for (const [section, pick] of SECTIONS) for (const item of pick(pack)) defined.set(`${section}:${item.id}`, pack.id);
  }
  return {
    sources: new Map<string, Source>(packs.flatMap((p) => p.sources.map((s) => [s.id, s] as const))),
    terms: new Set(packs.flatMap((p) => p.terms.map((t) => t.id))),
    defined,
  };
}

const SECTIONS = [
  ['sources', (p: RulePack) => p.sources],
  ['terms', (p: RulePack) => p.terms],
  ['reference_values', (p: RulePack) => p.references],
  ['direction_facts', (p: RulePack) => p.directions],
  ['patterns', (p: RulePack) => p.patterns],
  ['reasoning_checks', (p: RulePack) => p.reasoning],
] as const;

/** A pack path as messages show it: as given, or relative to the working folder when inside it. */
function shownPath(file: string): string {
  if (!isAbsolute(file)) return file;
  const rel = relative(process.cwd(), file);
  return rel === '' || rel.startsWith('..') || isAbsolute(rel) ? file : rel.split(sep).join('/');
}
