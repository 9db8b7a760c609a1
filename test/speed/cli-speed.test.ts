import { execFile } from 'node:child_process';
import { mkdtempSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
import { buildDocx, heading, paragraph } from '../source/word/build-docx.js';

// The built command line (npm test builds first): the worker pool runs compiled workers only.
const BIN = fileURLToPath(new URL('../../bin/firnline.js', import.meta.url));
const run = promisify(execFile);

async function firnline(cwd: string, ...args: string[]): Promise<string> {
  try {
    return (await run(process.execPath, [BIN, ...args], { cwd, env: { ...process.env, NO_COLOR: '1', CI: '1' }, maxBuffer: 64 << 20 })).stdout;
  } catch (error) {
    const e = error as { code?: number; stdout?: string; stderr?: string };
    // 1: flags at the fail level; 2: a draft that could not be checked (the report still lists it).
    if ((e.code === 1 || e.code === 2) && e.stdout !== undefined) return e.stdout;
    throw new Error(`firnline ${args.join(" ")} failed (${e.code}): ${e.stderr}`, { cause: error });
  }
}

describe('firnline check over many files: pool, cache and shards change nothing', () => {
  const root = mkdtempSync(join(tmpdir(), 'firnline-cli-speed-'));
  mkdirSync(join(root, 'docs'));
  // Invented demo drafts, enough on-topic files (40) for the pool to start. The values are set
  // against the built-in pack: the Last Glacial Maximum CO2 level of about 190 ppm (Monnin et al.
  // 2001, Science 291, 112) and the pre-industrial 280 ppm (IPCC AR6 WG1, ch. 2), right and wrong.
  for (let i = 0; i < 60; i += 1) {
    const topical = i % 3 !== 2;
    const body = topical
      ? `# Panel ${i}\n\nAt the Last Glacial Maximum, CO2 stood near ${i % 2 === 0 ? 190 : 290} ppm.\n\nBefore the industrial era, CO2 was about 280 ppm.\n`
      : `# Notice ${i}\n\nThe café closes early on Thursday.\n`;
    writeFileSync(join(root, 'docs', `page-${String(i).padStart(2, '0')}.md`), body);
  }
  // Every kind of draft main reads, mixed in with them: HTML, Word, and two that cannot be checked
  // (invalid UTF-8, and a NUL byte), which the report lists as not checked wherever they fall.
  writeFileSync(join(root, 'docs', 'page-05b.html'), '<html><body><h1>Panel</h1><p>At the Last Glacial Maximum, CO2 stood near 290 ppm.</p></body></html>\n');
  writeFileSync(join(root, 'docs', 'page-07b.docx'), buildDocx(heading('Panel') + paragraph(['At the Last Glacial Maximum, CO2 stood near 290 ppm.'])));
  writeFileSync(join(root, 'docs', 'page-09b.md'), Buffer.concat([Buffer.from('CO2 stood near 290 ppm '), Buffer.from([0xff, 0xfe, 0x41]), Buffer.from('.\n')]));
  writeFileSync(join(root, 'docs', 'page-11b.txt'), 'CO2 stood near 290 ppm\u0000.\n');
  writeFileSync(join(root, 'firnline.yaml'), 'include: []\n');

  it('gives byte-identical JSON with and without the pool and the cache', async () => {
    const single = await firnline(root, 'check', 'docs', '--format', 'json', '--jobs', '1', '--no-cache');
    const pooled = await firnline(root, 'check', 'docs', '--format', 'json', '--jobs', '2', '--no-cache');
    const cold = await firnline(root, 'check', 'docs', '--format', 'json', '--jobs', '2');
    const warm = await firnline(root, 'check', 'docs', '--format', 'json', '--jobs', '2');
    const report = JSON.parse(single) as { flags: { file: string }[]; skipped: { file: string; unchecked?: boolean }[] };
    expect(report.flags.length).toBeGreaterThan(10);
    expect(report.flags.map((f) => f.file)).toEqual(expect.arrayContaining(['docs/page-05b.html', 'docs/page-07b.docx']));
    expect(report.skipped.filter((s) => s.unchecked === true).map((s) => s.file)).toEqual(['docs/page-09b.md', 'docs/page-11b.txt']);
    expect(pooled).toBe(single);
    expect(cold).toBe(single);
    expect(warm).toBe(single);
    // Written to a file, the report is made and written piece by piece: the same bytes.
    await firnline(root, 'check', 'docs', '--format', 'json', '--jobs', '2', '--no-cache', '-o', join(root, 'pooled.json'));
    expect(readFileSync(join(root, 'pooled.json'), 'utf8')).toBe(single);
  }, 180_000);

  it('merges shard reports (JSON and SARIF 2.1.0) into the whole run, byte for byte', async () => {
    for (const format of ['json', 'sarif']) {
      const whole = await firnline(root, 'check', 'docs', '--format', format, '--no-cache', '--jobs', '1');
      const files: string[] = [];
      for (const k of [1, 2, 3]) {
        const file = join(root, `shard-${k}.${format}`);
        await firnline(root, 'check', 'docs', '--format', format, '--shard', `${k}/3`, '--jobs', '1', '-o', file);
        files.push(file);
      }
      expect(await firnline(root, 'merge', ...files.reverse())).toBe(whole);
    }
    // SARIF 2.1.0 (OASIS): one run whose results point into the rules array by ruleIndex.
    const sarif = JSON.parse(readFileSync(join(root, 'shard-1.sarif'), 'utf8')) as { version: string };
    expect(sarif.version).toBe('2.1.0');
  }, 180_000);

  it('refuses a bad --shard or --jobs with one line and exit status 2', async () => {
    for (const args of [['--shard', '4/3'], ['--jobs', '0']]) {
      const failed = await run(process.execPath, [BIN, 'check', 'docs', ...args], { cwd: root }).catch((e: { code: number; stderr: string }) => e);
      expect(failed).toMatchObject({ code: 2 });
      expect((failed as { stderr: string }).stderr.trim().split('\n')).toHaveLength(1);
    }
  }, 120_000);
});
