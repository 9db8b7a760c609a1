import { execFileSync } from 'node:child_process';
import { mkdir, mkdtemp, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { applyGate } from '../../src/cli/gate.js';
import { appendSignoffs } from '../../src/review/append-signoffs.js';
import { describeReview } from '../../src/review/describe-review.js';
import { planSignoffs } from '../../src/review/plan-signoffs.js';
import { reviewClaims } from '../../src/review/review-claims.js';
import type { CheckResult, Claim, Flag } from '../../src/types.js';
import { approve, makeClaim } from './make-claim.js';

// Sentences from an invented newsletter of the Brackwater Field Station (demo wording).
const F = 'drafts/letters.md';
function flagOn(claim: Claim): Flag {
  return { ruleId: 'logic.lag-rules-out-cause', level: 'error', file: claim.file, span: claim.span, excerpt: 'lag', sentence: claim.text, reason: 'A lag does not rule out a cause.', sources: [], claimId: claim.id };
}
const myth = makeClaim(F, 2, 'Some readers say the CO2 lag proves it cannot warm anything.');
myth.flags = [flagOn(myth)];
const level = makeClaim(F, 4, 'At the coldest point of the last ice age, CO2 stood near 190 ppm.');
const result: CheckResult = { files: [F], rules: [], claims: [myth, level], flags: [...myth.flags], skipped: [] };

async function folder(): Promise<string> {
  return mkdtemp(join(tmpdir(), 'firnline-gate-'));
}

describe('applyGate', () => {
  it('leaves a run alone when sign-off is not required', async () => {
    const cwd = await folder();
    const gate = await applyGate(result, { requireSignoff: false, ledgerFile: join(cwd, 'firnline-signoffs.yaml'), cwd });
    expect(gate).toMatchObject({ result, failingFlags: result.flags, failed: false, summary: [] });
  });

  it('fails while claims are open, and lists them', async () => {
    const cwd = await folder();
    const gate = await applyGate(result, { requireSignoff: true, ledgerFile: join(cwd, 'firnline-signoffs.yaml'), cwd });
    expect(gate.failed).toBe(true);
    expect(gate.summary.slice(0, 3)).toEqual([
      'Sign-off: 0 of 2 claims signed off; 2 claims open, 0 changed since sign-off, 0 marked needs change.',
      `open: ${F}:2:1 ${myth.id} ${myth.text}`,
      `open: ${F}:4:1 ${level.id} ${level.text}`,
    ]);
  });

  it('passes once every claim is signed off; a flag on a signed-off claim shows as signed off and does not fail', async () => {
    const cwd = await folder();
    const ledgerFile = join(cwd, 'firnline-signoffs.yaml');
    const waived = { ...approve(myth, 'J. Berg', '2025-03-01T08:00:00Z'), decision: 'waived' as const, reason: 'the next sentence answers it' };
    await appendSignoffs(ledgerFile, [waived, approve(level)]);
    const gate = await applyGate(result, { requireSignoff: true, ledgerFile, cwd });
    expect(gate.failed).toBe(false);
    expect(gate.failingFlags).toEqual([]);
    expect(gate.result.flags[0]).toMatchObject({ reason: 'A lag does not rule out a cause.', signoff: { reviewer: 'J. Berg', date: '2025-03-01T08:00:00Z', decision: 'waived' } });
    expect(gate.summary).toContain('1 flag on signed-off claims shown as signed off; they do not fail the run.');
  });

  it('reports an edited claim as changed since sign-off, old wording beside the new', async () => {
    const cwd = await folder();
    const ledgerFile = join(cwd, 'firnline-signoffs.yaml');
    await appendSignoffs(ledgerFile, [approve(myth), approve(level)]);
    const edited = makeClaim(F, 4, 'At the coldest point of the last ice age, CO2 stood near 180 ppm.');
    const gate = await applyGate({ ...result, claims: [myth, edited] }, { requireSignoff: true, ledgerFile, cwd });
    expect(gate.failed).toBe(true);
    expect(gate.summary.slice(0, 4)).toEqual([
      'Sign-off: 1 of 2 claims signed off; 0 claims open, 1 changed since sign-off, 0 marked needs change.',
      `changed since sign-off: ${F}:4:1 ${edited.id} (signed off by R. Okafor on 2025-02-11, approved)`,
      `  signed off: ${level.text}`,
      `  now:        ${edited.text}`,
    ]);
  });

  it('with --changed-since, checks only claims on changed lines', async () => {
    const cwd = await folder();
    const git = (...args: string[]) => execFileSync('git', args, { cwd, encoding: 'utf8' });
    git('init', '-q');
    git('config', 'user.email', 'desk@brackwater.example');
    git('config', 'user.name', 'Field station desk');
    await writeFile(join(cwd, 'placeholder.md'), 'x\n');
    git('add', '.');
    git('commit', '-q', '-m', 'start');
    // letters.md is new since HEAD (untracked), so all its lines changed; placeholder.md did not change.
    await mkdir(join(cwd, 'drafts'));
    await writeFile(join(cwd, F), `# Letters\n${myth.text}\n\n${level.text}\n`);
    const old = makeClaim('placeholder.md', 1, 'x');
    const gate = await applyGate({ ...result, claims: [old, myth, level] }, { requireSignoff: false, changedSince: 'HEAD', ledgerFile: join(cwd, 'l.yaml'), cwd });
    expect(gate.result.claims.map((c) => c.id)).toEqual([myth.id, level.id]);
    expect(gate.result.flags).toEqual(myth.flags);
    expect(gate.summary).toEqual(['Changed since HEAD: 2 of 3 claims are on changed lines.']);
  });
});

describe('planSignoffs', () => {
  const context = { reviewer: 'R. Okafor', date: '2025-02-11T10:00:00Z', packVersion: 'paleoclimate 1.0.0' };

  it('records the claim as it reads now, and skips a request the ledger already holds word for word', () => {
    const plan = planSignoffs([{ claimId: myth.id, decision: 'approved' }, { claimId: level.id, decision: 'approved' }], [myth, level], { file: 'l', signoffs: [approve(myth)] }, context);
    expect(plan).toEqual({ entries: [approve(level)], unchanged: 1 });
  });

  it.each([
    ['an id that is not in the drafts', { claimId: 'c0000000000', decision: 'approved' as const }, 'signoff-unknown-claim'],
    ['a waiver without a reason', { claimId: myth.id, decision: 'waived' as const }, 'signoff-no-reason'],
  ])('rejects %s', (_name, request, code) => {
    expect(() => planSignoffs([request], [myth], { file: 'l', signoffs: [] }, context)).toThrow(expect.objectContaining({ code }));
  });
});

describe('describeReview', () => {
  it('lists at most 20 open claims, then says how many more', () => {
    const many = Array.from({ length: 23 }, (_, i) => makeClaim(F, i + 1, `Panel ${i + 1} gives CO2 near 190 ppm.`));
    const lines = describeReview(reviewClaims(many, { file: 'l', signoffs: [] }));
    expect(lines.filter((l) => l.startsWith('open: '))).toHaveLength(20);
    expect(lines).toContain('... and 3 more open claims.');
  });
});
