/**
 * compromise's tagger with its model made at build time (docs/speed.md, Start-up). Loading
 * `compromise/two` computes the library's model on every run: it unpacks the lexicon, conjugates
 * and inflects its words, builds the conjugation models and merges some 100,000 words into the
 * world one at a time, the same answers each time. scripts/build-tagger.js loads compromise's own
 * sources once and writes to dist/generated/ the world's model (before any parse) as JSON and the
 * same sources bundled with the pre-tagger's model module emptied; that bundle puts the stored model
 * in place of the one its plugins made. The model carries the SHA-256 of compromise's package.json and
 * of its `compromise/two` build: a run takes the stored tagger only while the installed package hashes
 * the same, else it loads `compromise/two` as before. The build checks the new tagger's model against
 * the sources' own and its reading of sample sentences against `compromise/two`;
 * test/nlp/stored-tagger.test.ts compares the two on every fifth sentence of our prose.
 */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import type nlpType from 'compromise';
import { requireCached } from '../speed/script-cache.js';

type Nlp = typeof nlpType;

/** The `format` of the stored model; a model of another format is refused by the code that reads it. */
export const STORED_TAGGER_FORMAT = 'firnline-compromise-model/1';

/** The stored file: the model with each regular expression set to null and listed by its path. */
export interface StoredModelFile {
  format: typeof STORED_TAGGER_FORMAT;
  /** compromiseDigest() of the package the model was made from. */
  compromise: string;
  regexps: [path: (string | number)[], source: string, flags: string][];
  /** An object the model reaches again (its lexicon shares tag lists): null there, then the first place's object. */
  aliases: [path: (string | number)[], first: (string | number)[]][];
  /** Where the model holds undefined (a key JSON would drop): null in `model`, in its place. */
  undefineds: (string | number)[][];
  model: unknown;
}

/** SHA-256 of the installed compromise's package.json and `compromise/two` build; undefined when unreadable. */
export function compromiseDigest(require: NodeJS.Require): string | undefined {
  try {
    const two = require.resolve('compromise/two');
    return createHash('sha256')
      .update(readFileSync(join(dirname(two), '..', '..', 'package.json')))
      .update('\0')
      .update(readFileSync(two))
      .digest('hex');
  } catch {
    return undefined;
  }
}

function isPlainObject(value: object): boolean {
  const proto = Object.getPrototypeOf(value) as unknown;
  return proto === Object.prototype || proto === null;
}

/**
 * The stored file's text for compromise's `model`. Throws when the model holds what JSON cannot
 * carry exactly (a function, a Set or Map, a number JSON changes); an undefined value, a regular
 * expression and an object reached a second time are stored as null in their place and listed by path.
 */
export function modelText(model: unknown, compromise: string): string {
  const regexps: StoredModelFile['regexps'] = [];
  const undefineds: StoredModelFile['undefineds'] = [];
  const aliases: StoredModelFile['aliases'] = [];
  const seen = new Map<object, (string | number)[]>();
  const path: (string | number)[] = [];
  const copy = (value: unknown): unknown => {
    if (value === null || typeof value === 'string' || typeof value === 'boolean') return value;
    if (value === undefined && path.length > 0) {
      undefineds.push([...path]);
      return null;
    }
    if (typeof value === 'number') {
      if (!Number.isFinite(value) || Object.is(value, -0)) throw new Error(`the model holds ${value} at ${path.join('.')}`);
      return value;
    }
    if (typeof value !== 'object') throw new Error(`the model holds a ${typeof value} at ${path.join('.')}`);
    const first = seen.get(value);
    if (first !== undefined) {
      aliases.push([[...path], first]);
      return null;
    }
    seen.set(value, [...path]);
    if (value instanceof RegExp) {
      if (value.lastIndex !== 0) throw new Error(`the model holds a used expression at ${path.join('.')}`);
      regexps.push([[...path], value.source, value.flags]);
      return null;
    }
    if (Array.isArray(value)) {
      return value.map((item, i) => {
        path.push(i);
        const out = copy(item);
        path.pop();
        return out;
      });
    }
    if (!isPlainObject(value)) throw new Error(`the model holds a ${value.constructor?.name ?? 'special object'} at ${path.join('.')}`);
    const out: Record<string, unknown> = {};
    for (const key of Object.keys(value)) {
      path.push(key);
      Object.defineProperty(out, key, { value: copy((value as Record<string, unknown>)[key]), enumerable: true, writable: true, configurable: true });
      path.pop();
    }
    return out;
  };
  const stored: StoredModelFile = { format: STORED_TAGGER_FORMAT, compromise, regexps: [], aliases: [], undefineds: [], model: copy(model) };
  stored.aliases = aliases;
  stored.regexps = regexps;
  stored.undefineds = undefineds;
  return `${JSON.stringify(stored)}\n`;
}

/** Whether two models are the same data: kinds, keys in order, values, expressions and shared objects. */
export function sameModel(a: unknown, b: unknown, pairs = new Map<object, unknown>()): boolean {
  if (Object.is(a, b)) return true;
  if (typeof a === 'object' && a !== null) {
    if (pairs.has(a)) return pairs.get(a) === b;
    pairs.set(a, b);
  }
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  if (a instanceof RegExp || b instanceof RegExp) {
    return a instanceof RegExp && b instanceof RegExp && a.source === b.source && a.flags === b.flags && a.lastIndex === b.lastIndex;
  }
  if (Array.isArray(a) !== Array.isArray(b) || isPlainObject(a) !== isPlainObject(b)) return false;
  if (!Array.isArray(a) && !isPlainObject(a)) return false;
  const ka = Object.keys(a);
  const kb = Object.keys(b);
  if (ka.length !== kb.length || ka.some((k, i) => k !== kb[i])) return false;
  return ka.every((k) => sameModel((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], pairs));
}

/** One term as the sentence readings keep it (nlp/sentence-terms.ts). */
export interface TaggedTerm {
  text: string;
  tags: readonly string[];
  root?: string;
  start: number;
  length: number;
}

/** A term of a compromise document, as `doc.docs` holds it once its offsets are computed. */
interface CompromiseTerm {
  text: string;
  tags?: Set<string>;
  root?: unknown;
  offset?: { start: number; length: number };
}

/** `text` parsed by `nlp`: its terms with tags, roots and offsets, in order (termsOf's reading). */
export function tagTerms(nlp: Nlp, text: string): TaggedTerm[] {
  const doc = nlp(text);
  doc.compute('root');
  // The offsets `doc.json({ offset: true, terms: { offset: true } })` reports, without the json:
  // that call copied every term and rendered each sentence's text, normal and offset besides, about
  // a quarter of compromise's time per sentence here. Its terms are the document's own terms
  // (text, tags as an array, root, offset), read here directly.
  doc.compute('offset');
  const terms: TaggedTerm[] = [];
  for (const sentence of (doc as unknown as { docs: CompromiseTerm[][] }).docs) {
    for (const t of sentence) {
      if (t.offset === undefined) continue;
      terms.push({ text: t.text, tags: Object.freeze([...(t.tags ?? [])]), ...(typeof t.root === 'string' ? { root: t.root } : {}), start: t.offset.start, length: t.offset.length });
    }
  }
  return terms;
}

/** The build script's name for tagTerms: a sample's reading, compared between two taggers. */
export const sampleReading = tagTerms;

/**
 * The stored tagger at `code` (dist/generated/compromise-tagger.cjs) when its model was made from
 * the compromise installed here; else undefined (missing, damaged, or made from another package).
 */
export function loadStoredTagger(require: NodeJS.Require, code: string): Nlp | undefined {
  const digest = compromiseDigest(require);
  if (digest === undefined) return undefined;
  try {
    // Compiled with the code cache the build made for it (speed/script-cache.ts), else from its text.
    const stored = requireCached(code) as { nlp?: Nlp; compromiseDigest?: unknown };
    if (typeof stored.nlp !== 'function' || stored.compromiseDigest !== digest) return undefined;
    return stored.nlp;
  } catch {
    return undefined;
  }
}
