import { mkdtemp, writeFile, mkdir } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCli } from './run-cli.js';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));

async function tempFolder(files: Record<string, string | Uint8Array>): Promise<string> {
  const dir = await mkdtemp(join(tmpdir(), 'firnline-cli-'));
  for (const [name, body] of Object.entries(files)) {
    await mkdir(join(dir, name, '..'), { recursive: true });
    await writeFile(join(dir, name), body);
  }
  return dir;
}

describe('firnline check', () => {
  it('flags the bundled newsletter and exits 1, passing the clean gallery panels', async () => {
    const run = await runCli(['check', 'examples', '--format', 'json'], ROOT);
    expect(run.code).toBe(1);
    const report = JSON.parse(run.stdout) as { flags: { file: string; ruleId: string }[] };
    const files = new Set(report.flags.map((f) => f.file));
    expect(files).toContain('examples/winter-newsletter.md');
    expect(files).not.toContain('examples/gallery-panels.md');
  });

  it('reports a wrong span at its exact line and column in the original Markdown', async () => {
    // Vostok's record spans about 420,000 years, not 800,000 (Petit et al. 1999, Nature 399, 429-436,
    // doi 10.1038/20859). The claim sits under front matter, a heading and emphasis.
    const text = ['---', 'title: t', '---', '', '# Cores', '', 'The *Vostok* core holds a record of **800,000 years** of climate.', ''].join('\n');
    const dir = await tempFolder({ 'draft.md': text });
    const run = await runCli(['check', 'draft.md', '--format', 'json'], dir);
    const report = JSON.parse(run.stdout) as { flags: { ruleId: string; span: { start: { line: number; column: number } } }[] };
    const flag = report.flags.find((f) => f.ruleId === 'value.vostok-record-span');
    expect(flag?.span.start).toMatchObject({ line: 7, column: 39 });
    expect(run.code).toBe(1);
  });

  it('exits 2 with one line and no stack trace for a missing path', async () => {
    const dir = await tempFolder({});
    const run = await runCli(['check', 'nowhere.md'], dir);
    expect(run.code).toBe(2);
    expect(run.stderr.trim().split('\n')).toHaveLength(1);
    expect(run.stderr).toMatch(/^nowhere\.md: /u);
    expect(run.stderr).not.toMatch(/\bat .+:\d+:\d+\)/u);
  });

  it('reports a binary file it could not check, still checks the rest, and fails the run', async () => {
    const dir = await tempFolder({ 'a.md': 'Nothing here.\n', 'b.txt': new Uint8Array([0x43, 0x4f, 0x32, 0x00, 0xff]) });
    const run = await runCli(['check', '.', '--format', 'json'], dir);
    const report = JSON.parse(run.stdout) as { files: string[]; skipped: { file: string; reason: string; unchecked?: boolean }[] };
    expect(report.files).toContain('a.md');
    expect(report.skipped).toContainEqual(expect.objectContaining({ file: 'b.txt', unchecked: true }));
    expect(run.stderr).toMatch(/^b\.txt:1:5: not valid UTF-8 \(byte 0xFF\)/u);
    expect(run.code).toBe(2);
  });

  it('reads standard input for the path -', async () => {
    // EPICA Dome C spans about 800,000 years (Jouzel et al. 2007, Science 317, 793-796, doi 10.1126/science.1141038).
    const run = await runCli(['check', '-', '--format', 'json'], ROOT, 'The EPICA Dome C record covers 400,000 years.\n');
    const report = JSON.parse(run.stdout) as { flags: { ruleId: string; file: string }[] };
    expect(report.flags.map((f) => [f.file, f.ruleId])).toContainEqual(['-', 'value.edc-record-span']);
  });

  it('honours --fail-on: warnings fail only when asked', async () => {
    const dir = await tempFolder({
      'lag.md': 'Ice cores show that CO2 rose about 800 years after the warming began, so CO2 cannot have caused the warming.\n',
    });
    const never = await runCli(['check', 'lag.md', '--fail-on', 'never'], dir);
    expect(never.code).toBe(0);
    const note = await runCli(['check', 'lag.md', '--fail-on', 'note'], dir);
    expect(note.code).toBe(1);
    expect(note.stdout).toContain('logic.lag-rules-out-cause');
  });

  it('exits 2 on an unknown option value', async () => {
    const run = await runCli(['check', '.', '--format', 'pdf'], ROOT);
    expect(run.code).toBe(2);
  });

  it('shows the cautions in --help', async () => {
    const run = await runCli(['--help'], ROOT);
    expect(run.code).toBe(0);
    expect(run.stdout).toContain('does not replace, expert review');
    expect(run.stdout).toMatch(/uncertainty\s+and dates/u);
  });
});
