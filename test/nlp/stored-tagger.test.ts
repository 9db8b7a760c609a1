/**
 * The tagger the build stores (scripts/build-tagger.js, dist/generated/compromise-tagger.cjs and its
 * model, nlp/stored-tagger.ts) must be `compromise/two` with its model made ahead of time: the same
 * model as compromise's own sources make, the same terms, tags, roots and offsets on our prose, and
 * used only while it was made from the compromise installed here (common practice: compare a fast
 * path with the reference it replaces, on the inputs it will see, and check that stale generated
 * data is refused). These run after `npm run build` (as `npm test` does).
 */
import { copyFileSync, existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import type nlpType from 'compromise';
import { compromiseDigest, loadStoredTagger, modelText, sameModel, STORED_TAGGER_FORMAT, tagTerms, type StoredModelFile } from '../../src/nlp/stored-tagger.js';
import { corpusSentences } from './corpus-sentences.js';

type Nlp = typeof nlpType;

/** compromise's world model, which its types leave as `object`. */
const modelOf = (nlp: Nlp): unknown => (nlp.world() as { model: unknown }).model;

const root = fileURLToPath(new URL('../../', import.meta.url));
const generated = join(root, 'dist', 'generated');
const CODE = join(generated, 'compromise-tagger.cjs');
const MODEL = join(generated, 'compromise-tagger-model.json');
const require = createRequire(import.meta.url);
const two = require('compromise/two') as Nlp;

function stored(): Nlp {
  expect(existsSync(CODE), 'run `npm run build` first').toBe(true);
  const nlp = loadStoredTagger(require, CODE);
  expect(nlp, 'the stored tagger was made from another compromise: run `npm run build`').toBeDefined();
  return nlp!;
}

describe('the stored tagger (dist/generated/compromise-tagger.cjs)', () => {
  it('was made from the compromise installed here, and holds the model its sources make', async () => {
    const file = JSON.parse(readFileSync(MODEL, 'utf8')) as StoredModelFile;
    expect(file.format).toBe(STORED_TAGGER_FORMAT);
    expect(file.compromise).toBe(compromiseDigest(require));
    const src = join(dirname(require.resolve('compromise/two')), '..', '..', 'src', 'two.js');
    const { default: reference } = (await import(pathToFileURL(src).href)) as { default: Nlp };
    expect(sameModel(modelOf(stored()), modelOf(reference))).toBe(true);
    // And that model is also the one the package's own tagger build starts with.
    expect(sameModel(modelOf(stored()), modelOf(two))).toBe(true);
  });

  it('is what the built sentence readings parse with', async () => {
    const built = (await import(pathToFileURL(join(root, 'dist', 'nlp', 'compromise.js')).href)) as { compromiseTagger: () => Nlp };
    // The stored file is required with its code cache (speed/script-cache.ts), which runs it afresh for
    // each caller, so the built tagger is that file's, not the same instance as this test's.
    const cache = (await import(pathToFileURL(join(root, 'dist', 'speed', 'script-cache.js')).href)) as { scriptCacheUse: () => { file: string }[] };
    const nlp = built.compromiseTagger();
    expect(nlp).not.toBe(two);
    expect(cache.scriptCacheUse().map((u) => u.file)).toEqual([CODE]);
    expect(sameModel(modelOf(nlp), modelOf(stored()))).toBe(true);
  });

  // Every fifth sentence, as test/nlp/builds.test.ts does, to stay within some 20 s on our shared
  // machine; all of them (with 256 KB of the bench's prose) were compared when the tagger was made.
  it('reads the sentences of our prose as compromise/two does', () => {
    const nlp = stored();
    const sentences = corpusSentences(8).filter((_s, i) => i % 5 === 2);
    expect(sentences.length).toBeGreaterThan(1000);
    const differ = sentences.filter((text) => JSON.stringify(tagTerms(nlp, text)) !== JSON.stringify(tagTerms(two, text)));
    expect(differ).toEqual([]);
  }, 300_000);

  it('is refused when its model was made from another compromise, or is missing or damaged', () => {
    const dir = mkdtempSync(join(tmpdir(), 'firnline-tagger-'));
    const code = join(dir, 'compromise-tagger.cjs');
    copyFileSync(CODE, code);
    // Missing model: the code cannot load, so the stored tagger is refused.
    expect(loadStoredTagger(require, code)).toBeUndefined();
    const file = JSON.parse(readFileSync(MODEL, 'utf8')) as StoredModelFile;
    writeFileSync(join(dir, 'compromise-tagger-model.json'), JSON.stringify({ ...file, compromise: '0'.repeat(64) }));
    expect(loadStoredTagger(require, join(dir, 'compromise-tagger.cjs'))).toBeUndefined();

    const dir2 = mkdtempSync(join(tmpdir(), 'firnline-tagger-'));
    copyFileSync(CODE, join(dir2, 'compromise-tagger.cjs'));
    writeFileSync(join(dir2, 'compromise-tagger-model.json'), JSON.stringify({ ...file, format: 'firnline-compromise-model/0' }));
    expect(loadStoredTagger(require, join(dir2, 'compromise-tagger.cjs'))).toBeUndefined();

    const dir3 = mkdtempSync(join(tmpdir(), 'firnline-tagger-'));
    copyFileSync(CODE, join(dir3, 'compromise-tagger.cjs'));
    writeFileSync(join(dir3, 'compromise-tagger-model.json'), readFileSync(MODEL, 'utf8').slice(0, 5000));
    expect(loadStoredTagger(require, join(dir3, 'compromise-tagger.cjs'))).toBeUndefined();
  });
});

describe('the stored model file', () => {
  it('keeps what JSON alone would lose: expressions, undefined values in their place, shared objects', () => {
    const shared = ['Noun', 'Singular'];
    const model = { a: { x: /ab+c/giu, y: undefined, z: 1 }, lexicon: { one: shared, two: shared }, list: [null, 'w'] };
    const file = JSON.parse(modelText(model, 'digest')) as StoredModelFile;
    expect(file.regexps).toEqual([[['a', 'x'], 'ab+c', 'giu']]);
    expect(file.undefineds).toEqual([['a', 'y']]);
    expect(file.aliases).toEqual([[['lexicon', 'two'], ['lexicon', 'one']]]);
    // Key order is kept: an undefined value stays where it was (null in its place).
    expect(Object.keys((file.model as { a: object }).a)).toEqual(['x', 'y', 'z']);
  });

  it('refuses what it cannot carry exactly', () => {
    expect(() => modelText({ f: () => 1 }, 'd')).toThrow(/function at f/u);
    expect(() => modelText({ s: new Set([1]) }, 'd')).toThrow(/Set at s/u);
    expect(() => modelText({ n: Number.NaN }, 'd')).toThrow(/NaN at n/u);
  });

  it('compares models by kind, key order, values and sharing', () => {
    const shared = [1];
    expect(sameModel({ a: /x/u, b: [1, 2] }, { a: /x/u, b: [1, 2] })).toBe(true);
    expect(sameModel({ a: 1, b: 2 }, { b: 2, a: 1 })).toBe(false);
    expect(sameModel({ a: /x/u }, { a: /x/gu })).toBe(false);
    expect(sameModel({ a: undefined }, { a: null })).toBe(false);
    expect(sameModel({ a: shared, b: shared }, { a: [1], b: [1] })).toBe(false);
    expect(sameModel([1, 2], { 0: 1, 1: 2 })).toBe(false);
  });
});
