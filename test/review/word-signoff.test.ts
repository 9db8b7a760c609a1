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
