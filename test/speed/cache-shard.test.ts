import { mkdtempSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { checkPaths } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { cacheKeyOf, ResultCache } from '../../src/speed/cache.js';
import { inShard, parseShard } from '../../src/speed/shard.js';

const packs = await loadPacks([]);

describe('the result cache', () => {
  const dir = mkdtempSync(join(tmpdir(), 'firnline-cache-'));
  const key = cacheKeyOf({ version: '1.0.0', packs: 'p', path: 'a.md', projectPath: 'a.md', format: 'markdown', levels: {}, text: 'CO2' });
  const outcome = { claims: [], flags: [], skipped: 'no topic term' };

  it('keys on every input: text, path, packs, levels, version', () => {
    const base = { version: '1.0.0', packs: 'p', path: 'a.md', projectPath: 'a.md', format: 'markdown', levels: {}, text: 'CO2' };
    expect(cacheKeyOf(base)).toBe(key);
    for (const change of [{ text: 'CO2 ' }, { path: 'b.md' }, { packs: 'q' }, { version: '1.0.1' }, { levels: { 'value.x': 'off' as const } }, { projectPath: 'x/a.md' }]) {
      expect(cacheKeyOf({ ...base, ...change })).not.toBe(key);
    }
  });

  it('gives back what it stored, open interval ends included', async () => {
    const cache = new ResultCache(dir, '1.0.0');
    const claim = { quantities: [{ low: -Infinity, high: Infinity }] };
    await cache.set(key, { claims: [claim as never], flags: [] });
    expect(cache.get(key)?.claims).toEqual([claim]);
  });

  it('ignores an entry from another version, a corrupt entry and an entry under the wrong key', async () => {
    await new ResultCache(dir, '0.9.0').set(key, outcome);
    expect(new ResultCache(dir, '1.0.0').get(key)).toBeUndefined();
    const file = join(dir, key.slice(0, 2), `${key}.json`);
    writeFileSync(file, '{"format":"firnline-cache/1","version":"1.0.0","key":"' + key + '","outcome":{"claims":[');
    expect(new ResultCache(dir, '1.0.0').get(key)).toBeUndefined();
    writeFileSync(file, JSON.stringify({ format: 'firnline-cache/1', version: '1.0.0', key: 'f'.repeat(64), outcome }));
    expect(new ResultCache(dir, '1.0.0').get(key)).toBeUndefined();
    writeFileSync(file, JSON.stringify({ format: 'firnline-cache/1', version: '1.0.0', key, outcome: { claims: 'x', flags: [] } }));
    expect(new ResultCache(dir, '1.0.0').get(key)).toBeUndefined();
  });
});

describe('--shard K/N', () => {
  it('reads K/N and refuses anything else', () => {
    expect(parseShard('2/4')).toEqual({ index: 2, count: 4 });
    for (const bad of ['0/4', '5/4', '1/0', '2', 'a/b', '1/2/3']) expect(() => parseShard(bad)).toThrow(/--shard/u);
  });

  it('puts every path in exactly one shard, the same on every call', () => {
    const paths = Array.from({ length: 500 }, (_, i) => `docs/section-${i % 7}/page-${i}.md`);
    for (const count of [1, 2, 3, 8]) {
      const owners = paths.map((p) => Array.from({ length: count }, (_, k) => k + 1).filter((k) => inShard(p, { index: k, count })));
      expect(owners.every((o) => o.length === 1)).toBe(true);
      // A hash split is even enough for a matrix: no shard empty on 500 paths.
      for (let k = 1; k <= count; k += 1) expect(owners.filter((o) => o[0] === k).length).toBeGreaterThan(0);
    }
  });
});

describe('checkPaths with the cache and with shards: the same findings', () => {
  const root = mkdtempSync(join(tmpdir(), 'firnline-speed-'));
  mkdirSync(join(root, 'docs'));
  // Invented demo sentences: one value agreeing with the EPICA Dome C span (about 800,000 years,
  // Jouzel et al. 2007, Science 317, 793) and one far off it.
  for (let i = 0; i < 12; i += 1) {
    const body = i % 3 === 0 ? `EPICA Dome C reaches back about ${i % 2 === 0 ? '800,000' : '80,000'} years.\n\nThe shop opens at ten.\n` : 'The shop opens at ten.\n';
    writeFileSync(join(root, 'docs', `page-${i}.md`), body);
  }

  it('a warm cache gives the same result as no cache', async () => {
    const cache = new ResultCache(join(root, '.firnline-cache'), 'test');
    const plain = await checkPaths(['docs'], { cwd: root, packs, jobs: 1 });
    const cold = await checkPaths(['docs'], { cwd: root, packs, jobs: 1, cache });
    await new Promise((r) => setTimeout(r, 50));
    expect(readdirSync(join(root, '.firnline-cache')).length).toBeGreaterThan(0);
    const warm = await checkPaths(['docs'], { cwd: root, packs, jobs: 1, cache });
    expect(plain.flags.length).toBeGreaterThan(0);
    expect(JSON.stringify(cold)).toBe(JSON.stringify(plain));
    expect(JSON.stringify(warm)).toBe(JSON.stringify(plain));
  });

  it('the shards together hold exactly the whole run', async () => {
    const whole = await checkPaths(['docs'], { cwd: root, packs, jobs: 1 });
    const parts = await Promise.all([1, 2, 3].map((index) => checkPaths(['docs'], { cwd: root, packs, jobs: 1, shard: { index, count: 3 } })));
    expect(parts.flatMap((p) => p.files).sort()).toEqual(whole.files);
    expect(parts.flatMap((p) => p.claims.map((c) => c.id)).sort()).toEqual(whole.claims.map((c) => c.id).sort());
    expect(readFileSync(join(root, 'docs', 'page-0.md'), 'utf8')).toContain('800,000');
  });
});
