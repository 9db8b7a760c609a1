/**
 * The per-sentence cache of the engine: what the stages found in one sentence, keyed by everything
 * that finding depends on (the sentence's paragraph window and its place in it, the paragraph's
 * kind, heading and reported-claim marker, its topic tests) and kept per loaded packs. Re-checking a
 * draft after a small edit (the editor case) or a paragraph repeated across files then costs a
 * lookup instead of the NLP library, the binder and the checks. Entries are deep copies on the way
 * in and out, so no caller can change what another gets, except the packs' own source entries that
 * flags cite (`sources`), which stay shared as they are without the cache. Bounded: the least
 * recently used entry goes first.
 */
import type { LoadedPacks } from '../rulepack/types.js';

/** Sentences kept per packs: several long drafts' worth. */
export const SENTENCE_CACHE_SIZE = 8192;

const NOTHING = Symbol('no claim');
const caches = new WeakMap<LoadedPacks, Map<string, unknown>>();

const prefixes = new WeakMap<readonly string[], string>();

/**
 * `examine()`'s result for sentence `index` of `paragraph` (the window its checks see) with the
 * rest of its `key`, computed once per distinct key and packs.
 */
export function cachedFindings<T extends object>(
  packs: LoadedPacks,
  paragraph: readonly string[],
  index: number,
  key: readonly unknown[],
  examine: () => T | undefined,
): T | undefined {
  let cache = caches.get(packs);
  if (cache === undefined) {
    cache = new Map();
    caches.set(packs, cache);
  }
  // The window is one array per paragraph window (prose/paragraph-windows.ts): its part of the key is made once.
  let prefix = prefixes.get(paragraph);
  if (prefix === undefined) {
    prefix = JSON.stringify(paragraph);
    prefixes.set(paragraph, prefix);
  }
  const text = `${prefix}\u0000${index}\u0000${JSON.stringify(key)}`;
  const hit = cache.get(text);
  if (hit !== undefined) {
    cache.delete(text);
    cache.set(text, hit);
    return hit === NOTHING ? undefined : (copyOf(hit) as T);
  }
  const found = examine();
  cache.set(text, found === undefined ? NOTHING : copyOf(found));
  if (cache.size > SENTENCE_CACHE_SIZE) cache.delete(cache.keys().next().value as string);
  return found;
}

/** A deep copy of plain data (arrays and plain objects, keys in order); a `sources` array is copied, its entries shared. */
function copyOf(value: unknown, key = ''): unknown {
  if (value === null || typeof value !== 'object') return value;
  if (Array.isArray(value)) return key === 'sources' ? [...value] : value.map((v) => copyOf(v));
  if (Object.getPrototypeOf(value) !== Object.prototype) return structuredClone(value);
  const copy: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(value)) copy[k] = copyOf(v, k);
  return copy;
}
