/**
 * The built-in pack compiled at build time (scripts/build-generated.js writes
 * dist/generated/builtin-pack.json): rules/paleoclimate.yaml as `loadRulePack` returns it, validated
 * and resolved, with every citation already rendered, so a run neither parses the YAML, nor compiles
 * the schema, nor starts the citation processor for it.
 *
 * It is used only when everything it was made from hashes as it did at build time: the YAML's text,
 * the pack schema, Firnline's version and pinned dependencies (package.json), and every module of the
 * loader (the modules `rulepack/load-packs.js` imports, followed through relative imports). Anything
 * else (a changed YAML, a build of the code without this step, running from src/) finds no match,
 * and the YAML is loaded as before, with the same messages. Teams' own packs always take that path.
 */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Source } from '../types.js';
import type { RulePack } from './types.js';

/** The `format` of a compiled pack file; a file of another format is ignored. */
export const COMPILED_PACK_FORMAT = 'firnline-compiled-pack/1';

/** Where a compiled pack's inputs are read from. */
export interface PackInputPaths {
  /** The pack's YAML file. */
  yaml: string;
  /** schemas/rulepack.schema.json */
  schema: string;
  /** package.json of Firnline. */
  packageJson: string;
  /** The folder of the running build (dist/), against which `modules` are read. */
  codeRoot: string;
}

/** What a compiled pack was made from: the SHA-256 of each input. */
export interface PackInputs {
  yaml: string;
  schema: string;
  package: string;
  /** The loader's modules, paths relative to the code root, in a fixed order. */
  modules: string[];
  code: string;
}

/** A section item that cites sources, stored with source ids in place of the source entries. */
type WithSourceIds<T> = Omit<T, 'sources'> & { sources: string[] };

/** The pack as stored: `file` is left out (it is where the YAML is at run time), sources are cited by id. */
export interface StoredPack extends Omit<RulePack, 'file' | 'references' | 'directions' | 'reasoning' | 'patterns'> {
  references: WithSourceIds<RulePack['references'][number]>[];
  directions: WithSourceIds<RulePack['directions'][number]>[];
  reasoning: WithSourceIds<RulePack['reasoning'][number]>[];
  patterns: WithSourceIds<RulePack['patterns'][number]>[];
}

/** The compiled pack file. */
export interface CompiledPackFile {
  format: typeof COMPILED_PACK_FORMAT;
  inputs: PackInputs;
  pack: StoredPack;
}

const sha256 = (data: string | Buffer): string => createHash('sha256').update(data).digest('hex');

/** The SHA-256 of the modules, each named by its path and read from `codeRoot`; undefined when one is missing. */
function codeDigest(codeRoot: string, modules: readonly string[]): string | undefined {
  const hash = createHash('sha256');
  for (const module of modules) {
    let text: Buffer;
    try {
      text = readFileSync(join(codeRoot, module));
    } catch {
      return undefined;
    }
    hash.update(module).update('\0').update(text).update('\0');
  }
  return hash.digest('hex');
}

/** The inputs' digests as they are now; undefined when one cannot be read. */
export function currentInputs(paths: PackInputPaths, modules: readonly string[]): PackInputs | undefined {
  try {
    const code = codeDigest(paths.codeRoot, modules);
    if (code === undefined) return undefined;
    return {
      yaml: sha256(readFileSync(paths.yaml)),
      schema: sha256(readFileSync(paths.schema)),
      package: sha256(readFileSync(paths.packageJson)),
      modules: [...modules],
      code,
    };
  } catch {
    return undefined;
  }
}

/**
 * The compiled pack file's text for a loaded pack. Every citation is read here, so the file holds
 * the rendered full and short references, in the key order the loaded sources have.
 */
export function compiledPackText(pack: RulePack, inputs: PackInputs): string {
  for (const source of pack.sources) {
    void source.cite;
    void source.short;
  }
  const ids = <T extends { sources: Source[] }>(items: T[]): WithSourceIds<T>[] =>
    items.map((item) => ({ ...item, sources: item.sources.map((s) => s.id) }));
  const { file: _file, references, directions, reasoning, patterns, ...rest } = pack;
  const stored: StoredPack = { ...rest, references: ids(references), directions: ids(directions), reasoning: ids(reasoning), patterns: ids(patterns) };
  const out: CompiledPackFile = { format: COMPILED_PACK_FORMAT, inputs, pack: stored };
  return `${JSON.stringify(out)}\n`;
}

/**
 * The compiled pack at `compiledFile` as a loaded pack whose `file` is `paths.yaml`, when its inputs
 * are those of `paths` now; else undefined (and the caller loads the YAML). Sources are shared
 * between a pack's sections as the YAML loader shares them.
 */
export function readCompiledPack(compiledFile: string, paths: PackInputPaths): RulePack | undefined {
  let compiled: CompiledPackFile;
  try {
    compiled = JSON.parse(readFileSync(compiledFile, 'utf8')) as CompiledPackFile;
  } catch {
    return undefined;
  }
  if (compiled.format !== COMPILED_PACK_FORMAT || !Array.isArray(compiled.inputs?.modules)) return undefined;
  const now = currentInputs(paths, compiled.inputs.modules);
  const was = compiled.inputs;
  if (now === undefined || now.yaml !== was.yaml || now.schema !== was.schema || now.package !== was.package || now.code !== was.code) return undefined;
  const stored = compiled.pack;
  const byId = new Map(stored.sources.map((s) => [s.id, s]));
  let missing = false;
  const sources = <T>(items: WithSourceIds<T>[]): (Omit<T, 'sources'> & { sources: Source[] })[] =>
    items.map((item) => ({
      ...item,
      sources: item.sources.map((id) => {
        const source = byId.get(id);
        if (source === undefined) missing = true;
        return source as Source;
      }),
    }));
  const { references, directions, reasoning, patterns, ...rest } = stored;
  const pack = {
    ...rest, file: paths.yaml,
    references: sources(references), directions: sources(directions), reasoning: sources(reasoning), patterns: sources(patterns),
  } as RulePack;
  return missing ? undefined : reorder(pack);
}

/** The pack's keys in the order the YAML loader writes them (reports built by spreading a pack keep it). */
function reorder(pack: RulePack): RulePack {
  const { id, version, asOf, file, sources, terms, references, directions, reasoning, patterns, lexicon } = pack;
  return { id, version, asOf, file, sources, terms, references, directions, reasoning, patterns, lexicon };
}
