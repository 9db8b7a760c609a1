/**
 * Output hygiene and write guards (ROBUSTNESS-REPORT B17, B19, B22, O7, L21, L22, and the SARIF base
 * URI): control characters reach no terminal raw, the checklist Markdown keeps draft text as text,
 * file names survive every format, a closed pipe ends quietly, and `-o` never replaces a draft, a
 * link, a pipe or a device.
 */
import { execFileSync } from 'node:child_process';
import { lstat, readFile, symlink, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { isChecklistText } from '../../src/report/checklist-lines.js';
import { parseTickedChecklist } from '../../src/report/checklist-ticks.js';
import { expectNoCrash, expectUserError, folderWith, runBin, runCli } from './helpers.js';

const VOSTOK = 'The Vostok core spans 800,000 years of CO2 history.';
// ECMA-48 control functions: ESC [ ... m (SGR), ESC [ 2 K (erase line), ESC ] 0 ; ... BEL (OSC window title).
  // eslint-disable-next-line no-control-regex -- finding control characters is the point
const RAW_CONTROLS = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/u;

describe('control characters are shown, never sent (B17)', () => {
  it('in the text report, the sign-off gate lines and file names', async () => {
    const name = '\u001b]0;TITLE\u0007\u001b[31mred.md';
    const dir = await folderWith({
      [name]: 'The Vostok record shows that the whole planet\u001b[31m cooled by about 9 \u00b0C in the last ice age.\n\nThe Vostok core spans 800,000\u001b[2K years of CO2 history.\n',
    });
    const run = await runCli(['check', '.', '--require-signoff'], dir);
    expectNoCrash(run);
    expect(run.stdout).not.toMatch(RAW_CONTROLS);
    expect(run.stdout).toContain('\u241b]0;TITLE\u2407\u241b[31mred.md:');
    expect(run.stdout).toContain('800,000\u241b[2K years');
  });

  it('in error lines that name a file', async () => {
    const run = await runCli(['check', 'nonexist\u001b[31m.md'], await folderWith({}));
    expectUserError(run, /^nonexist\u241b\[31m\.md: no such file or folder/u);
  });
});

describe('the checklist Markdown keeps draft text as text (B19, B22, L16)', () => {
  it('entity-escaped HTML in a draft stays inert, and "(waived: ...)" in a sentence is not a decision', async () => {
    const dir = await folderWith({ 'd.md': `${VOSTOK.slice(0, -1)} &lt;img src=x onerror=alert(1)&gt; too (waived: by the board).\n` });
    const run = await runCli(['checklist', 'd.md'], dir);
    const box = run.stdout.split('\n').find((l) => l.startsWith('- [ ]')) ?? '';
    expect(box).toContain('\\<img src=x onerror=alert\\(1\\)\\> too \\(waived: by the board\\)');
    expect(box).not.toMatch(/(?<!\\)<img/u);
    expect(isChecklistText(run.stdout)).toBe(true);
    const ticked = parseTickedChecklist(run.stdout.replace('- [ ]', '- [x]'), 'cl.md');
    expect(ticked.map((t) => t.decision)).toEqual(['approved']);
  });

  it('a file name with a newline keeps one heading, and the sign-off round trip works', async () => {
    const dir = await folderWith({ 'new\nline.md': `${VOSTOK}\n`, '.git': '' });
    const text = await runCli(['check', '.'], dir);
    expect(text.stdout.split('\n')[0]).toBe('new\u240aline.md:1:23 · error · value.vostok-record-span');
    const made = await runCli(['checklist', '.'], dir);
    expect(made.stdout).toContain('## File "new\\nline.md"');
    await writeFile(join(dir, '..', `${dir.split('/').pop() ?? ''}-cl.md`), made.stdout.replace('- [ ]', '- [x]'));
    const signed = await runCli(['signoff', '--from', `../${dir.split('/').pop() ?? ''}-cl.md`, '--by', 'Tester'], dir);
    expectNoCrash(signed);
    expect(signed.code).toBe(0);
    expect(signed.stdout).toMatch(/^Recorded 1 sign-off by Tester/u);
  });
});

describe('a closed pipe ends the run quietly (O7)', () => {
  it('`check | head -1` prints no stack trace', async () => {
    const many = Array.from({ length: 3000 }, (_, i) => `The Vostok core spans 800,000 years of CO2 history number ${i}.`).join('\n\n');
    const dir = await folderWith({ 'many.md': many });
    const run = await runBin([], dir, { shell: 'FL check many.md 2>err.txt | head -1 >/dev/null; cat err.txt' });
    expect(run.stdout).toBe('');
  });
});

describe('reports carry relative paths (SARIF base URI)', () => {
  it('SARIF has no absolute base URI unless --absolute-paths is given', async () => {
    const dir = await folderWith({ 'd.md': `${VOSTOK}\n` });
    const plain = (await runCli(['check', 'd.md', '--format', 'sarif'], dir)).stdout;
    expect(plain).not.toContain(dir);
    expect(plain).not.toContain('file://');
    const asked = (await runCli(['check', 'd.md', '--format', 'sarif', '--absolute-paths'], dir)).stdout;
    expect(asked).toContain('file://');
  });
});

describe('write guards on -o (L21, L22)', () => {
  it('L22: check -o onto a draft being checked is refused and the draft kept', async () => {
    const dir = await folderWith({ 'd.md': `${VOSTOK}\n` });
    expectUserError(await runCli(['check', '.', '--format', 'json', '-o', 'd.md'], dir), /^d\.md: this is one of the drafts being checked/u);
    expect(await readFile(join(dir, 'd.md'), 'utf8')).toBe(`${VOSTOK}\n`);
  });

  it('L21: a symbolic link is refused and stays a link', async () => {
    const dir = await folderWith({ 'd.md': `${VOSTOK}\n`, 'target.json': 'keep' });
    await symlink(join(dir, 'target.json'), join(dir, 'link.json'));
    expectUserError(await runCli(['check', 'd.md', '--format', 'json', '-o', 'link.json'], dir), /^link\.json: this is a symbolic link/u);
    expect((await lstat(join(dir, 'link.json'))).isSymbolicLink()).toBe(true);
    expect(await readFile(join(dir, 'target.json'), 'utf8')).toBe('keep');
  });

  it('L21: a FIFO is refused and stays a FIFO', async () => {
    const dir = await folderWith({ 'd.md': `${VOSTOK}\n` });
    execFileSync('mkfifo', [join(dir, 'pipe')]);
    expectUserError(await runCli(['check', 'd.md', '-o', 'pipe'], dir), /^pipe: this is not a regular file/u);
    expect((await lstat(join(dir, 'pipe'))).isFIFO()).toBe(true);
  });

  it.each(['-', '/dev/stdout'])('L21: -o %s writes the report to standard output', async (target) => {
    const dir = await folderWith({ 'd.md': `${VOSTOK}\n` });
    const run = await runCli(['check', 'd.md', '--format', 'json', '-o', target], dir);
    expect(run.code).toBe(1);
    expect((JSON.parse(run.stdout) as { flags: unknown[] }).flags).toHaveLength(1);
  });

  it('L21: -o /dev/stdout from a real process writes through the pipe, as any user', async () => {
    const dir = await folderWith({ 'd.md': `${VOSTOK}\n` });
    const run = await runBin(['check', 'd.md', '--format', 'json', '-o', '/dev/stdout'], dir);
    expect(run.code).toBe(1);
    expect((JSON.parse(run.stdout) as { flags: unknown[] }).flags).toHaveLength(1);
  });
});
