/**
 * The sign-off ledger and checklist under concurrency and odd edits (ROBUSTNESS-REPORT L6, L8, L9,
 * L10, L11, L13, L15, L18, L20): a live run's lock is never taken, a dead run's lock is cleared at
 * once, one decision is written once, the file keeps its mode and line endings, and no tick or
 * note a reviewer typed is lost or silently ignored. Invented sign-offs (demo data).
 */
import { spawn } from 'node:child_process';
import { chmod, mkdtemp, readFile, stat, utimes, writeFile } from 'node:fs/promises';
import { hostname, tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { FirnlineError } from '../../src/errors.js';
import { parseTickedChecklist } from '../../src/report/checklist-ticks.js';
import { appendSignoffs } from '../../src/review/append-signoffs.js';
import { readLedger } from '../../src/review/read-ledger.js';
import type { SignoffEntry } from '../../src/review/signoff-entry.js';
import { withFileLock } from '../../src/review/with-file-lock.js';
import { expectUserError, folderWith, runCli } from './helpers.js';

const entry = (n: number, extra: Partial<SignoffEntry> = {}): SignoffEntry => ({
  claim: `c${String(n).padStart(10, '0')}`,
  file: 'drafts/winter-gallery.md',
  text: `Panel ${n}: the Dome C core reaches back about 800,000 years.`,
  decision: 'approved',
  reviewer: 'R. Okafor',
  date: '2025-02-11T10:00:00Z',
  packVersion: 'paleoclimate 1.0.0',
  ...extra,
});

async function ledgerFile(text?: string): Promise<string> {
  const file = join(await mkdtemp(join(tmpdir(), 'firnline-robust-ledger-')), 'firnline-signoffs.yaml');
  if (text !== undefined) await writeFile(file, text);
  return file;
}

/** A process that stays alive until killed, and one that has exited (its PID is free). */
function liveProcess(): { pid: number; stop: () => void } {
  const child = spawn(process.execPath, ['-e', 'setTimeout(() => {}, 60000)'], { stdio: 'ignore' });
  return { pid: child.pid ?? 0, stop: () => child.kill('SIGKILL') };
}
async function deadPid(): Promise<number> {
  const child = spawn(process.execPath, ['-e', '0'], { stdio: 'ignore' });
  await new Promise((done) => child.on('exit', done));
  return child.pid ?? 0;
}

const hourAgo = () => new Date(Date.now() - 3_600_000);

describe('the ledger lock', () => {
  it('L10: a lock held by a live run is never taken, however old it is', async () => {
    const file = await ledgerFile();
    const holder = liveProcess();
    try {
      await writeFile(`${file}.lock`, `${holder.pid} ${hostname()} abcdef0123456789 2025-01-01T00:00:00Z\n`);
      await utimes(`${file}.lock`, hourAgo(), hourAgo());
      let ran = false;
      const error = await withFileLock(file, async () => { ran = true; }, { timeoutMs: 200, staleAfterMs: 10 }).catch((e: unknown) => e);
      expect(ran).toBe(false);
      expect((error as FirnlineError).toLine()).toContain(`another run (process ${holder.pid} on ${hostname()}) holds this lock and is still running`);
    } finally {
      holder.stop();
    }
  });

  it('L10: a run whose lock was replaced sees that before its final write, and leaves the new lock alone', async () => {
    const file = await ledgerFile();
    const seen = await withFileLock(file, async (lock) => {
      const before = await lock.stillHeld();
      await writeFile(`${file}.lock`, `1 ${hostname()} someoneelse 2025-01-01T00:00:00Z\n`);
      return [before, await lock.stillHeld()];
    });
    expect(seen).toEqual([true, false]);
    expect(await readFile(`${file}.lock`, 'utf8')).toContain('someoneelse');
  });

  it.each([
    ['L9: a lock whose holder has died', async () => `${await deadPid()} ${hostname()} abcdef0123456789 2025-01-01T00:00:00Z\n`],
    ['L20: an empty lock left by a run that died while creating it', async () => ''],
  ])('%s is cleared at once, without waiting for it to go stale', async (_what, content) => {
    const file = await ledgerFile();
    await writeFile(`${file}.lock`, await content());
    await utimes(`${file}.lock`, new Date(Date.now() - 10_000), new Date(Date.now() - 10_000));
    // staleAfterMs of an hour: only the dead-holder rule can clear it within the 2 s timeout.
    expect(await withFileLock(file, async () => 'ran', { timeoutMs: 2_000, staleAfterMs: 3_600_000 })).toBe('ran');
  });
});

describe('writing the ledger', () => {
  it('L8: eight concurrent sign-offs of the same decision write it once', async () => {
    const file = await ledgerFile();
    const written = await Promise.all(Array.from({ length: 8 }, () => appendSignoffs(file, [entry(1)])));
    expect(written.reduce((a, b) => a + b, 0)).toBe(1);
    expect((await readLedger(file)).signoffs).toHaveLength(1);
  });

  it('L8: eight concurrent sign-offs of different claims all land', async () => {
    const file = await ledgerFile();
    await Promise.all(Array.from({ length: 8 }, (_, i) => appendSignoffs(file, [entry(i)])));
    expect((await readLedger(file)).signoffs.map((s) => s.claim).sort()).toEqual(Array.from({ length: 8 }, (_, i) => entry(i).claim));
  });

  it('L6: a CRLF ledger stays CRLF', async () => {
    const file = await ledgerFile('# ledger\r\nsignoffs:\r\n  - claim: c0000000001\r\n    file: a.md\r\n    text: t\r\n    decision: approved\r\n    reviewer: R\r\n    date: 2025-01-01\r\n    pack_version: p 1\r\n');
    await appendSignoffs(file, [entry(2)]);
    const text = await readFile(file, 'utf8');
    expect(text.split('\n').slice(0, -1).every((line) => line.endsWith('\r'))).toBe(true);
    expect((await readLedger(file)).signoffs).toHaveLength(2);
  });

  it('keeps the ledger\'s file mode', async () => {
    const file = await ledgerFile('signoffs:\n');
    await chmod(file, 0o640);
    await appendSignoffs(file, [entry(1)]);
    expect((await stat(file)).mode & 0o777).toBe(0o640);
  });

  it('L11: a read-only ledger is refused, not replaced', async () => {
    const file = await ledgerFile('signoffs:\n');
    await chmod(file, 0o444);
    const error = await appendSignoffs(file, [entry(1)]).catch((e: unknown) => e);
    expect((error as FirnlineError).code).toBe('ledger-read-only');
    expect((await stat(file)).mode & 0o777).toBe(0o444);
    expect(await readFile(file, 'utf8')).toBe('signoffs:\n');
  });
});

describe('reading a ticked checklist', () => {
  const box = (tick: string, n: number, extra = '') => `${tick} **c${String(n).padStart(10, '0')}** line ${n}: Panel ${n}.${extra}`;

  it.each(['- [x ]', '- [ x]', '- [✓]', '- [*]', '-[x]'])('L13: a box ticked as "%s" is an error at its line, not silently ignored', (tick) => {
    const text = ['## File `a.md`', '', box('- [x]', 1), box(tick, 2)].join('\n');
    const error = (() => { try { parseTickedChecklist(text, 'cl.md'); return undefined; } catch (e) { return e; } })();
    expect((error as FirnlineError).toLine()).toMatch(/^cl\.md:4:\d+: this box reads \[.{1,3}\], which is not a tick Firnline reads/u);
  });

  it('L15: one claim ticked twice with different decisions is an error, not a silent drop', () => {
    const text = ['## File `a.md`', box('- [x]', 1), box('- [x]', 1, ' (waived: dup)')].join('\n');
    expect(() => parseTickedChecklist(text, 'cl.md')).toThrow(/claim c0000000001 is ticked twice with different decisions/u);
  });

  it('L18: checklist -o will not overwrite a reviewer\'s odd ticks or notes', async () => {
    const dir = await folderWith({ 'd.md': 'The Vostok core spans 800,000 years of CO2 history.\n\nAt the Last Glacial Maximum, CO2 stood near 185 ppm.\n', '.git': '' });
    expect((await runCli(['checklist', 'd.md', '-o', 'cl.md'], dir)).code).toBe(0);
    const made = await readFile(join(dir, 'cl.md'), 'utf8');
    for (const edit of [
      (t: string) => t.replace('- [ ]', '- [x ]'),
      (t: string) => t.replace('- [ ]', '- [✓]'),
      (t: string) => t.replace(/(- \[ \] .*)/u, '$1 (note: checked against Petit 1999 table 2, needs a second look)'),
      (t: string) => `${t}\nReviewer: the second claim needs a source.\n`,
    ]) {
      await writeFile(join(dir, 'cl.md'), edit(made));
      expectUserError(await runCli(['checklist', 'd.md', '-o', 'cl.md'], dir), /^cl\.md:\d+:\d+: (?:this checklist holds a mark or text Firnline did not write|this box reads)/u);
      expect(await readFile(join(dir, 'cl.md'), 'utf8')).toBe(edit(made));
    }
    await writeFile(join(dir, 'cl.md'), made);
    expect((await runCli(['checklist', 'd.md', '-o', 'cl.md'], dir)).code).toBe(0);
  });
});
