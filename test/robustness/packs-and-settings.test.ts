/**
 * Rule packs, settings and the ledger as hostile input (ROBUSTNESS-REPORT R5, R7, R10, R12, R14):
 * user errors with the file named, never exit 3; ids such as `constructor` are plain ids; the
 * whole run has a budget for teams' pattern rules; settings read packs only inside the project.
 */
import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { Ajv2020 } from 'ajv/dist/2020.js';
import addFormats from 'ajv-formats';
import { readFileSync } from 'node:fs';
import { checkPatterns } from '../../src/checks/reasoning/check-patterns.js';
import { compilePacks } from '../../src/checks/reasoning/compile-packs.js';
import { FirnlineError } from '../../src/errors.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { expectNoCrash, expectUserError, folderWith, runCli } from './helpers.js';

const VOSTOK = 'The Vostok core spans 800,000 years of CO2 history.\n';
const HEAD = 'pack: house\nversion: "1"\nas_of: 2025-01-01\n';

/** The "billion laughs" shape: nine levels of nine aliases each (common practice in YAML parser hardening). */
function aliasBomb(head: string, last: string): string {
  const lines = [head.trimEnd(), 'x0: &a0 ["lol","lol","lol","lol","lol","lol","lol","lol","lol"]'];
  for (let i = 1; i < 10; i += 1) lines.push(`x${i}: &a${i} [${Array.from({ length: 9 }, () => `*a${i - 1}`).join(',')}]`);
  lines.push(`${last}: *a9`);
  return `${lines.join('\n')}\n`;
}

describe('YAML alias bombs (R5)', () => {
  it.each([
    ['a pack', 'bomb.yaml', aliasBomb(HEAD, 'description'), ['check', 'd.md', '--pack', 'bomb.yaml']],
    ['a settings file', 'bomb.yaml', aliasBomb('', 'extra'), ['check', 'd.md', '--config', 'bomb.yaml']],
    ['the ledger', 'firnline-signoffs.yaml', aliasBomb('', 'signoffs'), ['check', 'd.md', '--require-signoff']],
  ])('in %s: exit 2 "too many YAML aliases" at the first alias', async (_what, name, text, args) => {
    const dir = await folderWith({ 'd.md': VOSTOK, [name]: text, '.git': '' });
    expectUserError(await runCli(args, dir), new RegExp(`${name.replace('.', '\\.')}:\\d+:\\d+: too many YAML aliases`, 'u'));
  });
});

describe('ids that name Object.prototype properties (R7)', () => {
  it('`constructor` as a pattern, source and level id is an ordinary id everywhere', async () => {
    const pack = `${HEAD}sources:\n  - id: constructor\n    cite: c\n    how: read in the source\npatterns:\n  - id: house.constructor\n    reason: r\n    regex: 'Vostok'\n    sources: [constructor]\n`;
    const dir = await folderWith({ 'd.md': VOSTOK, 'p.yaml': pack, 'firnline.yaml': 'packs: [p.yaml]\nlevels:\n  value.vostok-record-span: note\n' });
    for (const format of ['text', 'json', 'junit', 'sarif']) {
      const run = await runCli(['check', 'd.md', '--format', format], dir);
      expectNoCrash(run);
      expect(run.stdout).not.toContain('[native code]');
    }
    const json = JSON.parse((await runCli(['check', 'd.md', '--format', 'json'], dir)).stdout) as { flags: { ruleId: string; level: string }[] };
    expect(json.flags.map((f) => [f.ruleId, f.level]).sort()).toEqual([['house.constructor', 'warning'], ['value.vostok-record-span', 'note']]);
  });

  it('a level override for `constructor` does not pick up an inherited property', async () => {
    // No rule has the id `constructor` (a pattern id needs a dot), so it is refused as an unknown
    // id in `levels` (issue 15: a misspelt id is never ignored silently), not read off Object.prototype.
    const dir = await folderWith({ 'd.md': VOSTOK, 'firnline.yaml': 'levels:\n  constructor: off\n' });
    const run = await runCli(['check', 'd.md', '--format', 'json'], dir);
    expectUserError(run, /^firnline\.yaml:2:3: unknown rule id `constructor` in `levels`; run `firnline refs` to list the ids$/u);
    expect(run.stdout).toBe('');
    const known = await folderWith({ 'd.md': VOSTOK, 'firnline.yaml': 'levels:\n  value.vostok-record-span: warning\n' });
    const json = JSON.parse((await runCli(['check', 'd.md', '--format', 'json'], known)).stdout) as { flags: { level: string }[] };
    expect(json.flags.map((f) => f.level)).toEqual(['warning']);
  });

  it('a reasoning check called `constructor` is not taken for a detector', async () => {
    const pack = `${HEAD}sources:\n  - id: s\n    cite: c\n    how: read in the source\nreasoning_checks:\n  - id: constructor\n    summary: s\n    reason: r\n    suggestion: s\n    sources: [s]\n`;
    const dir = await folderWith({ 'd.md': VOSTOK, 'p.yaml': pack });
    expectNoCrash(await runCli(['check', 'd.md', '--pack', 'p.yaml'], dir));
  });
});

describe('pack ids and the report schema agree (R14)', () => {
  it('a pattern id without a dot is refused when the pack loads, at its line and column', async () => {
    const dir = await folderWith({ 'd.md': VOSTOK, 'nodot.yaml': `${HEAD}patterns:\n  - id: nodot\n    reason: r\n    regex: Vostok\n` });
    expectUserError(await runCli(['check', 'd.md', '--pack', 'nodot.yaml'], dir), /nodot\.yaml:5:9: a pattern id is a rule id: lower-case and dotted/u);
  });

  it('the JSON report of a pack pattern validates against schemas/report.schema.json', async () => {
    const dir = await folderWith({ 'd.md': VOSTOK, 'p.yaml': `${HEAD}patterns:\n  - id: house.vostok\n    reason: r\n    regex: Vostok\n` });
    const run = await runCli(['check', 'd.md', '--pack', 'p.yaml', '--format', 'json'], dir);
    const ajv = new Ajv2020({ strict: false });
    addFormats.default(ajv);
    const validate = ajv.compile(JSON.parse(readFileSync(new URL('../../schemas/report.schema.json', import.meta.url), 'utf8')) as object);
    expect(validate(JSON.parse(run.stdout)), JSON.stringify(validate.errors)).toBe(true);
  });
});

describe('a whole-run budget for pattern rules (R10)', () => {
  it('a pattern under the per-sentence limit still stops the run once the budget is spent', async () => {
    const dir = await folderWith({ 'p.yaml': `${HEAD}patterns:\n  - id: house.slowish\n    reason: r\n    regex: '.*.*c'\n` });
    const packs = await loadPacks([join(dir, 'p.yaml')]);
    const compiled = compilePacks(packs);
    const sentence = `The CO2 record ${'a'.repeat(120)}b.`;
    let checked = 0;
    let stopped: unknown;
    try {
      // A budget of 1 ms: spent within a handful of sentences, whatever the machine's speed.
      for (; checked < 10_000; checked += 1) checkPatterns(sentence, compiled, () => { throw new Error('no compromise match in this pack'); }, 1);
    } catch (error) {
      stopped = error;
    }
    expect(stopped).toBeInstanceOf(FirnlineError);
    expect((stopped as FirnlineError).toLine()).toMatch(/p\.yaml: pattern rules ran for more than 0\.001 s in this run, most of it in house\.slowish/u);
    expect(checked).toBeLessThan(10_000);
  });
});

describe('settings read packs only inside the project (R12)', () => {
  it('a pack path outside the settings folder is refused, and the file is never read or echoed', async () => {
    const outside = await folderWith({ 'secret.txt': 'root:x:0:0:root:/root:/bin/bash\ntoken: hunter2\n' });
    const dir = await folderWith({ 'd.md': VOSTOK, 'firnline.yaml': `packs:\n  - ${join(outside, 'secret.txt')}\n  - ../${outside.split('/').pop() ?? ''}/secret.txt\n` });
    const run = await runCli(['check', 'd.md'], dir);
    expectUserError(run, /^.*firnline\.yaml:2:5: this pack is outside the project folder/u);
    expect(run.stderr).not.toMatch(/root:x|hunter2/u);
  });

  it('a file inside the project that is not a pack gets one line, without its content', async () => {
    const dir = await folderWith({ 'd.md': VOSTOK, 'notes.yaml': 'root: x:0:0:root:/root:/bin/bash\ntoken: hunter2\n', 'firnline.yaml': 'packs: [notes.yaml]\n' });
    const run = await runCli(['check', 'd.md'], dir);
    expectUserError(run, /notes\.yaml: this is not a rule pack \(no `pack:` key at the top level\)/u);
    expect(run.stderr).not.toMatch(/x:0:0|hunter2/u);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
  });

  it('--pack on the command line may name a pack anywhere (the user chose it)', async () => {
    const outside = await folderWith({ 'p.yaml': `${HEAD}patterns:\n  - id: house.vostok\n    reason: r\n    regex: Vostok\n` });
    const dir = await folderWith({ 'd.md': VOSTOK });
    await writeFile(join(dir, 'firnline.yaml'), 'packs: []\n');
    const run = await runCli(['check', 'd.md', '--pack', join(outside, 'p.yaml'), '--format', 'json'], dir);
    expect((JSON.parse(run.stdout) as { flags: { ruleId: string }[] }).flags.map((f) => f.ruleId)).toContain('house.vostok');
  });
});
