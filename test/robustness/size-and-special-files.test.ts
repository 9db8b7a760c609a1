/**
 * Size, nesting and special files (ROBUSTNESS-REPORT B8, B9, B11, B12, B13, P7, P8, P9): every
 * refusal comes before the input is read or parsed, and long paragraphs are checked in bounded
 * windows, so work grows linearly with the draft. Bounds are asserted by size and count, never by
 * time (speed lives in `npm run bench`).
 */
import { execFileSync } from 'node:child_process';
import { truncate, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { MAX_INPUT_BYTES } from '../../src/guard/read-regular-file.js';
import { paragraphWindows, WINDOW_CONTEXT, WINDOW_SENTENCES } from '../../src/prose/paragraph-windows.js';
import { MAX_NESTING_DEPTH } from '../../src/source/nesting-depth.js';
import { expectUserError, folderWith, runBin, runCli } from './helpers.js';

const VOSTOK = 'The Vostok core spans 800,000 years of CO2 history.';

describe('size and nesting limits', () => {
  it('B8, P9: a file over the size limit is refused from its size alone (a sparse file is never read)', async () => {
    const dir = await folderWith({ 'big.md': '' });
    await truncate(join(dir, 'big.md'), MAX_INPUT_BYTES + 1);
    expectUserError(await runCli(['check', 'big.md'], dir), /^big\.md: larger than 16 MiB, the most Firnline reads from one file/u);
  });

  it.each([
    ['B12: block quotes', '>'.repeat(10_000)],
    ['B13: list levels', '- '.repeat(10_000)],
    ['mixed quotes and lists', '> - '.repeat(5_000)],
  ])('%s nested 10,000 deep: one line with the place, exit 2, the other drafts still checked', async (_what, prefix) => {
    const dir = await folderWith({ 'deep.md': `${prefix} ${VOSTOK}\n`, 'ok.md': `${VOSTOK}\n` });
    const run = await runCli(['check', '.', '--format', 'json'], dir);
    expectUserError(run, new RegExp(`^deep\\.md:1:1: block quotes or lists nested more than ${MAX_NESTING_DEPTH} levels deep`, 'u'));
    expect((JSON.parse(run.stdout) as { files: string[] }).files).toEqual(['ok.md']);
  });

  it('keeps a draft nested as deep as real drafts go', async () => {
    const result = await checkText(`${'> '.repeat(20)}${VOSTOK}\n`, { path: 'd.md' });
    expect(result.flags.map((f) => f.ruleId)).toEqual(['value.vostok-record-span']);
  });
});

describe('long paragraphs (B9, B11)', () => {
  it('every sentence of a paragraph of any length sees a bounded window, and every sentence is in one', () => {
    const paragraph = Array.from({ length: 10_000 }, (_, i) => `Sentence ${i}.`);
    const windowOf = paragraphWindows(paragraph);
    let largest = 0;
    for (let i = 0; i < paragraph.length; i += 1) {
      const { window, at } = windowOf(i);
      expect(window[at]).toBe(paragraph[i]);
      largest = Math.max(largest, window.length);
    }
    expect(largest).toBe(WINDOW_SENTENCES + 2 * WINDOW_CONTEXT);
  });

  it('a short paragraph is seen whole, as before', () => {
    const paragraph = ['One.', 'Two.', 'Three.'];
    expect(paragraphWindows(paragraph)(2)).toEqual({ window: paragraph, at: 2 });
  });

  it('a 200-sentence paragraph without blank lines gets the same flags as the same sentences apart', async () => {
    const sentences = Array.from({ length: 200 }, (_, i) => (i % 50 === 0 ? VOSTOK : `Line ${i} of the volunteer rota was updated.`));
    const joined = await checkText(`${sentences.join(' ')}\n`, { path: 'one.txt' });
    const apart = await checkText(`${sentences.join('\n\n')}\n`, { path: 'apart.txt' });
    expect(joined.flags.map((f) => f.ruleId)).toEqual(apart.flags.map((f) => f.ruleId));
    expect(joined.flags).toHaveLength(4);
  });
});

describe('special files are refused, never opened for reading (P7, P8)', () => {

  it.each([
    ['a draft', (f: string) => ['check', f]],
    ['a rule pack', (f: string) => ['check', 'd.md', '--pack', f]],
    ['a settings file', (f: string) => ['check', 'd.md', '--config', f]],
    ['a checklist', (f: string) => ['signoff', '--from', f, '--by', 'X']],
  ])('P7: a FIFO named as %s: exit 2 "not a regular file", no hang', async (_what, args) => {
    const dir = await folderWith({ 'd.md': `${VOSTOK}\n` });
    execFileSync('mkfifo', [join(dir, 'fifo.yaml')]);
    const run = await runBin(args('fifo.yaml'), dir);
    expect(run.signal).toBeNull();
    expectUserError(run, /^(?:\/.*\/)?fifo\.yaml: not a regular file \(a named pipe\)/u);
  });

  it('P7: a FIFO as the ledger', async () => {
    const dir = await folderWith({ 'd.md': `${VOSTOK}\n`, 'cfg.yaml': 'ledger: ./ledfifo\n' });
    execFileSync('mkfifo', [join(dir, 'ledfifo')]);
    const run = await runBin(['check', 'd.md', '--config', 'cfg.yaml', '--require-signoff'], dir);
    expect(run.signal).toBeNull();
    expectUserError(run, /ledfifo: not a regular file \(a named pipe\)/u);
  });

  it('P8: /dev/zero is refused before a byte is read', async () => {
    const run = await runCli(['check', '/dev/zero'], await folderWith({}));
    expectUserError(run, /dev\/zero: not a regular file \(a device\)/u);
  });

  it('a folder walk still passes FIFOs over (P6)', async () => {
    const dir = await folderWith({ 'd.md': `${VOSTOK}\n` });
    execFileSync('mkfifo', [join(dir, 'pipe.md')]);
    await writeFile(join(dir, 'e.md'), `${VOSTOK}\n`);
    const run = await runBin(['check', '.', '--format', 'json'], dir);
    expect((JSON.parse(run.stdout) as { files: string[] }).files).toEqual(['d.md', 'e.md']);
  });
});

describe('links out of the folder (P5)', () => {
  it('a walked link to a file outside the working folder is not followed, and fails the run by name', async () => {
    const { symlink, mkdir } = await import('node:fs/promises');
    const outside = await folderWith({ 'secret.txt': `${VOSTOK} Staff password: hunter2.\n` });
    const dir = await folderWith({ 'ok.md': `${VOSTOK}\n` });
    await mkdir(join(dir, 'drafts'));
    await symlink(join(outside, 'secret.txt'), join(dir, 'drafts', 'leak.md'));
    await symlink(join(dir, 'ok.md'), join(dir, 'drafts', 'inside.md'));
    const run = await runCli(['check', '.', '--format', 'json'], dir);
    expectUserError(run, /^drafts\/leak\.md: a link to a file outside the folder being checked, not followed/u);
    expect(run.stdout).not.toContain('hunter2');
    expect((JSON.parse(run.stdout) as { files: string[] }).files).toEqual(['drafts/inside.md', 'ok.md']);
  });
});
