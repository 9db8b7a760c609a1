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

  it('replaces anything with --force', async () => {
    const dir = await draftRepository(ICE_HALL);
    await writeFile(join(dir, 'notes.md'), 'My own notes.\n');
    expect((await firnline(dir, 'checklist', 'drafts', '-o', 'notes.md', '--force')).code).toBe(0);
    expect(await readFile(join(dir, 'notes.md'), 'utf8')).toContain('# Sign-off checklist');
  });
});
