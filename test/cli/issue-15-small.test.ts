/**
 * Issue 15's smaller items, each with a test: include relative to the settings file, a misspelt
 * rule id in `levels`, `checklist -o` into a new folder, `refs --reasoning` and unquoted queries,
 * `explain` suggestions, a per-rule and per-file summary for large runs, the strict preset, waived
 * flags in a plain `check`, and the task-sized checklists (--open, --changed-since, --per-file).
 */
import { execFileSync } from 'node:child_process';
import { mkdir, mkdtemp, readdir, readFile, writeFile } from 'node:fs/promises';
import { readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CODE_RULE_IDS } from '../../src/rulepack/known-rule-ids.js';
import { runCli } from './run-cli.js';

// Invented drafts of a regional science newsletter (demo wording). Values: LGM CO2 ~185 ppm
// (Monnin et al. 2001, Science 291, 112-114); Vostok ~420,000 years (Petit et al. 1999, Nature 399,
// 429-436). The wrong ones are wrong on purpose.
const WRONG = 'At the Last Glacial Maximum, atmospheric CO2 stood near 100 ppm.\n';
const RIGHT = 'At the Last Glacial Maximum, atmospheric CO2 stood near 185 ppm.\n';
// Antarctic-as-global (Shakun et al. 2012, Nature 484, 49-54: global temperature lagged CO2).
const SCOPE = 'Antarctic ice cores show that global temperature rose before CO2 at the end of every ice age.\n';

async function project(files: Record<string, string>): Promise<string> {
  const dir = await mkdtemp(join(tmpdir(), 'firnline-i15-'));
  for (const [name, text] of Object.entries(files)) {
    await mkdir(join(dir, name, '..'), { recursive: true });
    await writeFile(join(dir, name), text);
  }
  return dir;
}

describe('settings', () => {
  it('matches include patterns from the settings file, whatever folder the command runs in', async () => {
    const dir = await project({ 'firnline.yaml': 'include: ["drafts/**/*.md"]\n', 'drafts/a.md': WRONG, 'notes/b.md': WRONG });
    const fromRoot = await runCli(['check', '--format', 'json'], dir);
    expect((JSON.parse(fromRoot.stdout) as { files: string[] }).files).toEqual(['drafts/a.md']);
    const inside = await runCli(['check', '.', '--format', 'json'], join(dir, 'drafts'));
    expect((JSON.parse(inside.stdout) as { files: string[] }).files).toEqual(['a.md']);
  });

  it('rejects a misspelt rule id in levels with file:line:column and the close id', async () => {
    const dir = await project({ 'firnline.yaml': 'levels:\n  value.co2-lgn: error\n', 'a.md': WRONG });
    const run = await runCli(['check', 'a.md'], dir);
    expect(run.code).toBe(2);
    expect(run.stderr).toBe('firnline.yaml:2:3: unknown rule id `value.co2-lgn` in `levels`; did you mean `value.co2-lgm`?\n');
  });

  it('lists every rule id written in code, so levels can name them', () => {
    const ids = new Set<string>();
    // Every module of src/checks, so a module added later (reference-slips.ts) cannot slip past the list.
    const modules = readdirSync(new URL('../../src/checks/', import.meta.url)).filter((f) => f.endsWith('.ts'));
    expect(modules).toEqual(expect.arrayContaining(['arithmetic.ts', 'units.ts', 'reference-slips.ts']));
    for (const file of modules) {
      const text = readFileSync(new URL(`../../src/checks/${file}`, import.meta.url), 'utf8');
      for (const m of text.matchAll(/'((?:arith|unit)\.[a-z0-9-]+)'/gu)) ids.add(m[1] ?? '');
    }
    expect([...ids].filter((id) => !CODE_RULE_IDS.includes(id))).toEqual([]);
  });
});

describe('commands', () => {
  it('never passes a Word file it could not read, even under --require-signoff', async () => {
    // A legacy .doc starts with the OLE compound file signature D0 CF 11 E0 A1 B1 1A E1 ([MS-CFB]
    // section 2.2); a .docx is a zip package (ECMA-376 Part 2), and one that is not is refused.
    const ole = new Uint8Array([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1, 0, 0, 0, 0, 0x3e, 0, 3, 0]);
    const dir = await project({ 'a.md': WRONG });
    await writeFile(join(dir, 'panels.doc'), ole);
    await writeFile(join(dir, 'broken.docx'), 'not a zip package');
    const legacy = await runCli(['check', 'panels.doc', '--require-signoff'], dir);
    expect(legacy.code).toBe(2);
    expect(legacy.stderr).toBe('panels.doc: a Word 97-2003 document (or another OLE compound file), which Firnline does not read; save it as .docx or as UTF-8 text, then check it again (not checked)\n');
    const broken = await runCli(['check', 'broken.docx', 'a.md', '--require-signoff'], dir);
    expect(broken.code).toBe(2);
    expect(broken.stderr).toMatch(/^broken\.docx: not a Word document/mu);
  });

  it('checklist -o creates the folder it writes into', async () => {
    const dir = await project({ 'a.md': WRONG });
    const run = await runCli(['checklist', 'a.md', '-o', 'review/2026/list.md'], dir);
    expect(run.code).toBe(0);
    expect(await readFile(join(dir, 'review/2026/list.md'), 'utf8')).toContain('stood near 100 ppm');
  });

  it('refs lists the reasoning rules, and takes a query of several words without quotes', async () => {
    const dir = await project({});
    const reasoning = await runCli(['refs', '--reasoning', 'lag'], dir);
    expect(reasoning.stdout).toContain('logic.lag-rules-out-cause (reasoning check,');
    const values = await runCli(['refs', 'EPICA', 'Dome', 'C', '--format', 'json'], dir);
    expect((JSON.parse(values.stdout) as { id: string }[]).map((r) => r.id)).toContain('edc-record-span');
  });

  it('explain suggests close ids for an unknown one', async () => {
    const run = await runCli(['explain', 'value.co2-lgn'], await project({}));
    expect(run.code).toBe(2);
    expect(run.stderr).toContain('did you mean `value.co2-lgm`');
  });

  it('adds a per-rule and per-file summary to a large run, and --summary prints only the counts', async () => {
    const files: Record<string, string> = {};
    for (let i = 1; i <= 20; i += 1) files[`d${String(i).padStart(2, '0')}.md`] = WRONG;
    const dir = await project(files);
    const full = await runCli(['check', '.'], dir);
    expect(full.stdout).toContain('Flags by rule (1 rule):\n  value.co2-lgm');
    expect(full.stdout).toContain('Flags by file (20 files with flags; most first):');
    const short = await runCli(['check', '.', '--summary'], dir);
    expect(short.stdout.split('\n').length).toBeLessThan(30);
    expect(short.stdout).toContain('Checked 20 files: 20 claims found, 20 flags (20 errors, 0 warnings, 0 notes), 0 files skipped.');
    expect(short.code).toBe(1);
  });
});

describe('the gate and the strict preset', () => {
  it('fails on every reasoning error under the strict preset, in the exit status and JUnit alike', async () => {
    const dir = await project({ 'a.md': SCOPE });
    expect((await runCli(['check', 'a.md'], dir)).code).toBe(0);
    const strict = await runCli(['check', 'a.md', '--strict', '--format', 'junit'], dir);
    expect(strict.code).toBe(1);
    expect(strict.stdout).toMatch(/<testsuites name="firnline" tests="1" failures="1"/u);
    await writeFile(join(dir, 'firnline.yaml'), 'fail_on: strict\n');
    expect((await runCli(['check', 'a.md'], dir)).code).toBe(1);
  });

  it('does not fail a plain check on a waived flag, and fails it on a needs-change comment', async () => {
    const dir = await project({ 'a.md': WRONG });
    const id = (JSON.parse((await runCli(['checklist', 'a.md', '--format', 'json'], dir)).stdout) as { claims: { id: string }[] }).claims[0]?.id ?? '';
    await runCli(['signoff', id, '--by', 'J. Berg', '--decision', 'waived', '--reason', 'a quoted reader letter, answered below'], dir);
    const waived = await runCli(['check', 'a.md'], dir);
    expect(waived.code).toBe(0);
    expect(waived.stdout).toContain('signed off  by J. Berg');
    await runCli(['signoff', id, '--by', 'J. Berg', '--decision', 'needs-change', '--reason', 'LGM CO2 was about 185 ppm'], dir);
    const comment = await runCli(['check', 'a.md'], dir);
    expect(comment.code).toBe(1);
    expect(comment.stdout).toContain('marked this claim as needing a change: LGM CO2 was about 185 ppm');
  });

  it('writes checklists for the task at hand: open claims, claims changed since a revision, one per file', async () => {
    const dir = await project({ 'drafts/a.md': RIGHT, 'drafts/b.md': WRONG });
    const git = (...args: string[]) => execFileSync('git', args, { cwd: dir, encoding: 'utf8' });
    git('init', '-q');
    git('config', 'user.email', 'desk@example.org');
    git('config', 'user.name', 'Desk');
    git('add', '.');
    git('commit', '-qm', 'drafts');
    const all = JSON.parse((await runCli(['checklist', 'drafts', '--format', 'json'], dir)).stdout) as { claims: { id: string; file: string }[] };
    await runCli(['signoff', all.claims.find((c) => c.file === 'drafts/a.md')?.id ?? '', '--by', 'J. Berg'], dir);
    const open = await runCli(['checklist', 'drafts', '--open'], dir);
    expect(open.stdout).toContain('drafts/b.md');
    expect(open.stdout).not.toContain('## File `drafts/a.md`');
    const ticked = await runCli(['checklist', 'drafts'], dir);
    expect(ticked.stdout).toMatch(/- \[x\] \*\*c[0-9a-f]{10}\*\* line 1: At the Last Glacial Maximum, atmospheric CO2 stood near 185 ppm\.\n(?: +- .*\n)*? {2}- Signed off: by J\. Berg on \d{4}-\d\d-\d\d, approved/u);
    await writeFile(join(dir, 'drafts/a.md'), `${RIGHT}\nThe Vostok record spans about 420,000 years.\n`);
    const changed = JSON.parse((await runCli(['checklist', 'drafts', '--changed-since', 'HEAD', '--format', 'json'], dir)).stdout) as { claims: { sentence: string }[] };
    expect(changed.claims.map((c) => c.sentence)).toEqual(['The Vostok record spans about 420,000 years.']);
    const perFile = await runCli(['checklist', 'drafts', '--per-file', '-o', 'review'], dir);
    expect(perFile.code).toBe(0);
    expect((await readdir(join(dir, 'review', 'drafts'))).sort()).toEqual(['a.md.checklist.md', 'b.md.checklist.md']);
  });
});
