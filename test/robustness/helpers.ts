/**
 * Shared helpers of the bad-input corpus: temporary folders, the CLI in memory or as a real
 * process (for FIFOs, devices and pipes), and the assertions every case makes about a refusal.
 */
import { execFile } from 'node:child_process';
import { mkdtemp, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { expect } from 'vitest';
import { runCli, type CliRun } from '../cli/run-cli.js';

export { runCli, type CliRun };

const BIN = fileURLToPath(new URL('../../bin/firnline.js', import.meta.url));

/** A temporary folder holding `files` (text or bytes). */
export async function folderWith(files: Record<string, string | Uint8Array>): Promise<string> {
  const dir = await mkdtemp(join(tmpdir(), 'firnline-robust-'));
  for (const [name, content] of Object.entries(files)) await writeFile(join(dir, name), content);
  return dir;
}

/** Runs the built command line (`bin/firnline.js`) as a child process, killed after `killAfterMs`. */
export function runBin(args: string[], cwd: string, options: { shell?: string; killAfterMs?: number } = {}): Promise<CliRun & { signal: string | null }> {
  return new Promise((done) => {
    const command = options.shell === undefined ? process.execPath : 'sh';
    const argv = options.shell === undefined ? [BIN, ...args] : ['-c', options.shell.replaceAll('FL', `"${process.execPath}" "${BIN}"`)];
    execFile(command, argv, { cwd, timeout: options.killAfterMs ?? 25_000, env: { ...process.env, NO_COLOR: '1' }, maxBuffer: 64 * 1024 * 1024 }, (error, stdout, stderr) => {
      const e = error as (Error & { code?: number | string; signal?: string | null }) | null;
      done({ code: e === null ? 0 : typeof e.code === 'number' ? e.code : -1, stdout, stderr, signal: e?.signal ?? null });
    });
  });
}

/** No stack trace, no "internal error": what every run of the corpus must show. */
export function expectNoCrash(run: CliRun): void {
  expect(run.code).not.toBe(3);
  expect(run.stderr).not.toMatch(/\n\s+at .+[:(]\d+/u);
  expect(run.stderr).not.toMatch(/internal error|This is a bug/u);
}

/**
 * A refusal the user must fix: exit 2, and a line on stderr that matches `line` (which names the
 * file, and line:column where there is one). Every stderr line is a single plain line.
 */
export function expectUserError(run: CliRun, line: RegExp): void {
  expectNoCrash(run);
  expect(run.code).toBe(2);
  const lines = run.stderr.split('\n').filter((l) => l !== '');
  expect(lines.some((l) => line.test(l)), run.stderr).toBe(true);
  // eslint-disable-next-line no-control-regex -- finding control characters is the point
  expect(run.stderr).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f]/u);
}
