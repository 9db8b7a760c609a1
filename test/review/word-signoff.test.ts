import { readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildDocx, heading, paragraph } from '../source/word/build-docx.js';
import { draftRepository, firnline, LGM, PREINDUSTRIAL, RECORD } from './workflow-helpers.js';

// The ice hall panels of workflow-helpers (accepted values, sources named there) as a Word draft.
const panels = (record: string) => buildDocx([heading('The long record'), paragraph([record]), heading('Carbon dioxide'), paragraph([LGM]), paragraph([PREINDUSTRIAL])].join(''));

describe('checklist and sign-off on a Word draft', () => {
  it('lists claims by paragraph, signs them off, survives a re-save, and goes stale on a changed number', async () => {
    const dir = await draftRepository('# Placeholder\n');
    await writeFile(join(dir, 'drafts', 'panels.docx'), panels(RECORD));
    expect((await firnline(dir, 'check', 'drafts/panels.docx', '--require-signoff')).code).toBe(1);

    expect((await firnline(dir, 'checklist', 'drafts/panels.docx', '-o', 'checklist.md')).code).toBe(0);
    const checklist = await readFile(join(dir, 'checklist.md'), 'utf8');
    expect(checklist).toMatch(/^- \[ \] \*\*c[0-9a-f]{10}\*\* paragraph 2: The EPICA Dome C ice core reaches back about 800,000 years\.$/mu);
    expect(checklist).toMatch(/^- \[ \] \*\*c[0-9a-f]{10}\*\* paragraph 4: At the Last Glacial Maximum/mu);
    await writeFile(join(dir, 'checklist.md'), checklist.replaceAll('- [ ] **', '- [x] **'));
    expect((await firnline(dir, 'signoff', '--from', 'checklist.md', '--by', 'R. Okafor')).code).toBe(0);
    expect((await firnline(dir, 'check', 'drafts/panels.docx', '--require-signoff')).code).toBe(0);

    // Saved again with the runs split differently: the words are the same, so the sign-offs hold.
    const resaved = buildDocx([heading('The long record'), paragraph(['The EPICA Dome C ', 'ice core reaches back about ', '800,000 years.']), heading('Carbon dioxide'), paragraph([LGM]), paragraph([PREINDUSTRIAL])].join(''));
    await writeFile(join(dir, 'drafts', 'panels.docx'), resaved);
    expect((await firnline(dir, 'check', 'drafts/panels.docx', '--require-signoff')).code).toBe(0);

    // A changed number is a changed claim.
    await writeFile(join(dir, 'drafts', 'panels.docx'), panels(RECORD.replace('800,000', '780,000')));
    const stale = await firnline(dir, 'check', 'drafts/panels.docx', '--require-signoff');
    expect(stale.code).toBe(1);
    expect(stale.out).toContain('drafts/panels.docx, paragraph 2 (under "The long record")');
  });
});

describe('--changed-since on a Word draft', () => {
  it('counts every claim of a changed or new Word draft as changed, since git cannot diff it by line', async () => {
    const { execFileSync } = await import('node:child_process');
    const dir = await draftRepository('# Placeholder\n');
    const git = (...args: string[]) => execFileSync('git', args, { cwd: dir, encoding: 'utf8' });
    await writeFile(join(dir, 'drafts', 'panels.docx'), panels(RECORD));
    // New (untracked): every claim is in scope, and none is signed off.
    const untracked = await firnline(dir, 'check', 'drafts', '--changed-since', 'HEAD', '--require-signoff');
    expect(untracked.code).toBe(1);
    expect(untracked.out).toMatch(/0 of 3 claims signed off/u);
    git('add', '.');
    git('commit', '-q', '-m', 'Word panels');
    expect((await firnline(dir, 'check', 'drafts', '--changed-since', 'HEAD', '--require-signoff')).code).toBe(0);
    // Changed (a binary diff): every claim of the file is in scope again.
    await writeFile(join(dir, 'drafts', 'panels.docx'), panels(RECORD.replace('800,000', '780,000')));
    const changed = await firnline(dir, 'check', 'drafts', '--changed-since', 'HEAD', '--require-signoff');
    expect(changed.code).toBe(1);
    expect(changed.out).toMatch(/0 of 3 claims signed off/u);
  });
});
