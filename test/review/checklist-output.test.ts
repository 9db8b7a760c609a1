import { readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { draftRepository, firnline, ICE_HALL } from './workflow-helpers.js';

// Nothing the user wrote is lost: `checklist -o` never replaces a file holding an expert's work.
describe('checklist -o protects what is already there', () => {
  it('refuses to replace a file that is not a Firnline checklist', async () => {
    const dir = await draftRepository(ICE_HALL);
    await writeFile(join(dir, 'notes.md'), 'My own notes.\n');
    const run = await firnline(dir, 'checklist', 'drafts', '-o', 'notes.md');
    expect(run).toEqual({ code: 2, out: 'notes.md: this file exists and is not a checklist Firnline wrote; choose another path, or pass --force to replace it\n' });
    expect(await readFile(join(dir, 'notes.md'), 'utf8')).toBe('My own notes.\n');
  });

  it('refuses to drop ticks that are not in the ledger yet, and allows it once they are', async () => {
    const dir = await draftRepository(ICE_HALL);
    await firnline(dir, 'checklist', 'drafts', '-o', 'checklist.md');
    const ticked = (await readFile(join(dir, 'checklist.md'), 'utf8')).replace('- [ ] **', '- [x] **');
    await writeFile(join(dir, 'checklist.md'), ticked);
    const tickLine = ticked.split('\n').findIndex((l) => l.startsWith('- [x] **')) + 1;

    const refused = await firnline(dir, 'checklist', 'drafts', '-o', 'checklist.md');
    expect(refused.code).toBe(2);
    expect(refused.out).toBe(
      `checklist.md:${tickLine}: this checklist has 1 ticked or commented box not yet in the ledger; run \`firnline signoff --from checklist.md --by NAME\` first, or pass --force to replace it\n`,
    );
    expect(await readFile(join(dir, 'checklist.md'), 'utf8')).toBe(ticked);

    expect((await firnline(dir, 'signoff', '--from', 'checklist.md', '--by', 'R. Okafor')).code).toBe(0);
    expect((await firnline(dir, 'checklist', 'drafts', '-o', 'checklist.md')).code).toBe(0);
  });

  it('refuses to drop a remark or a needs-change comment on an unticked box, and allows it once signoff recorded them', async () => {
    const dir = await draftRepository(ICE_HALL);
    await firnline(dir, 'checklist', 'drafts', '-o', 'checklist.md');
    const made = await readFile(join(dir, 'checklist.md'), 'utf8');
    const lines = made.split('\n');
    const boxes = lines.flatMap((l, i) => (l.startsWith('- [ ] **') ? [i] : []));
    expect(boxes.length).toBeGreaterThanOrEqual(2);
    // A remark typed after the sentence, with no bracketed mark (the issue's own example).
    lines[boxes[0] ?? 0] += ' wrong: check this against the source';
    const remarked = lines.join('\n');
    await writeFile(join(dir, 'checklist.md'), remarked);
    const refused = await firnline(dir, 'checklist', 'drafts', '-o', 'checklist.md');
    expect(refused).toEqual({
      code: 2,
      out: `checklist.md:${(boxes[0] ?? 0) + 1}: this checklist has 1 ticked or commented box not yet in the ledger; run \`firnline signoff --from checklist.md --by NAME\` first, or pass --force to replace it\n`,
    });
    expect(await readFile(join(dir, 'checklist.md'), 'utf8')).toBe(remarked);

    // A needs-change mark on another box: the reviewer's mark is named at its line until it is recorded.
    lines[boxes[1] ?? 0] += ' (needs change: say which core)';
    const commented = lines.join('\n');
    await writeFile(join(dir, 'checklist.md'), commented);
    const marked = await firnline(dir, 'checklist', 'drafts', '-o', 'checklist.md');
    expect(marked.code).toBe(2);
    expect(marked.out).toMatch(new RegExp(`^checklist\\.md:${(boxes[1] ?? 0) + 1}:1: this checklist holds a mark or text Firnline did not write`, 'u'));

    const signed = await firnline(dir, 'signoff', '--from', 'checklist.md', '--by', 'R. Okafor');
    expect(signed.code).toBe(0);
    expect(signed.out).toContain('Recorded 0 sign-offs and 2 needs-change comments by R. Okafor');
    expect((await firnline(dir, 'checklist', 'drafts', '-o', 'checklist.md')).code).toBe(0);
    const fresh = await readFile(join(dir, 'checklist.md'), 'utf8');
    expect(fresh).toContain('  - Needs change: R. Okafor on ');
    expect(fresh).toContain(': say which core');
  });

  it('guards a checklist written by check --format markdown -o the same way', async () => {
    const dir = await draftRepository(ICE_HALL);
    expect((await firnline(dir, 'check', 'drafts', '--format', 'markdown', '-o', 'checklist.md')).code).toBe(0);
    const ticked = (await readFile(join(dir, 'checklist.md'), 'utf8')).replace('- [ ] **', '- [x] **');
    await writeFile(join(dir, 'checklist.md'), ticked);
    const refused = await firnline(dir, 'check', 'drafts', '--format', 'markdown', '-o', 'checklist.md');
    expect(refused.code).toBe(2);
    expect(refused.out).toContain('this checklist has 1 ticked or commented box not yet in the ledger');
    expect(await readFile(join(dir, 'checklist.md'), 'utf8')).toBe(ticked);
    expect((await firnline(dir, 'check', 'drafts', '--format', 'markdown', '-o', 'checklist.md', '--force')).code).toBe(0);
    // Any other file may be replaced by a report, as before.
    await writeFile(join(dir, 'notes.md'), 'My own notes.\n');
    expect((await firnline(dir, 'check', 'drafts', '--format', 'markdown', '-o', 'notes.md')).code).toBe(0);
  });

  it('replaces anything with --force', async () => {
    const dir = await draftRepository(ICE_HALL);
    await writeFile(join(dir, 'notes.md'), 'My own notes.\n');
    expect((await firnline(dir, 'checklist', 'drafts', '-o', 'notes.md', '--force')).code).toBe(0);
    expect(await readFile(join(dir, 'notes.md'), 'utf8')).toContain('# Sign-off checklist');
  });
});
