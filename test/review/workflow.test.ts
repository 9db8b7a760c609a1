import { readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Checklist } from '../../src/report/checklist-json.js';
import { readLedger } from '../../src/review/read-ledger.js';
import { draftRepository, firnline, ICE_HALL, LGM, PREINDUSTRIAL, RECORD } from './workflow-helpers.js';

// The checklist is written beside the drafts folder, not in it: a checklist is Markdown full of the
// drafts' sentences, so a run over its folder would read it as one more draft.
describe('the sign-off workflow in a fresh git repository (issue 6, "Done when")', () => {
  it('fails, is signed off from a ticked checklist, survives moves, goes stale on a changed number, and passes again', async () => {
    const dir = await draftRepository(ICE_HALL);
    const ledgerFile = join(dir, 'firnline-signoffs.yaml');

    // 1. Nothing signed off yet: the gate fails and says how many claims are open.
    const first = await firnline(dir, 'check', 'drafts', '--require-signoff');
    expect(first.code).toBe(1);
    expect(first.out).toMatch(/Sign-off: 0 of (\d+) claims signed off; \1 claims open, 0 changed since sign-off, 0 marked needs change\./u);

    // 2. The checklist is written, every box ticked, and imported.
    expect((await firnline(dir, 'checklist', 'drafts', '-o', 'checklist.md')).code).toBe(0);
    const checklist = await readFile(join(dir, 'checklist.md'), 'utf8');
    const boxes = checklist.match(/^- \[ \] \*\*c[0-9a-f]{10}\*\*/gmu) ?? [];
    expect(boxes.length).toBeGreaterThanOrEqual(3);
    await writeFile(join(dir, 'checklist.md'), checklist.replaceAll('- [ ] **', '- [x] **'));
    const imported = await firnline(dir, 'signoff', '--from', 'checklist.md', '--by', 'R. Okafor');
    expect(imported).toEqual({ code: 0, out: `Recorded ${boxes.length} sign-offs by R. Okafor in firnline-signoffs.yaml.\n` });
    const ledgerAfterFirst = await readFile(ledgerFile, 'utf8');

    // 3. The gate passes.
    const signed = await firnline(dir, 'check', 'drafts', '--require-signoff');
    expect(signed.out).toContain(`Sign-off: ${boxes.length} of ${boxes.length} claims signed off; 0 claims open, 0 changed since sign-off, 0 marked needs change.`);
    expect(signed.code).toBe(0);

    // 4. Moving the paragraphs (and reflowing one sentence over two lines) keeps it passing.
    const moved = `# Carbon dioxide\n\n${PREINDUSTRIAL}\n\n${LGM.replace('atmospheric ', 'atmospheric\n')}\n\n# The long record\n\n${RECORD}\n`;
    await writeFile(join(dir, 'drafts', 'ice-hall.md'), moved);
    expect((await firnline(dir, 'check', 'drafts', '--require-signoff')).code).toBe(0);

    // 5. Changing a signed-off number fails the gate with "changed since sign-off", old and new wording shown.
    const LGM_EDITED = LGM.replace('185 ppm', '190 ppm');
    await writeFile(join(dir, 'drafts', 'ice-hall.md'), moved.replace('185 ppm', '190 ppm'));
    const stale = await firnline(dir, 'check', 'drafts', '--require-signoff');
    expect(stale.code).toBe(1);
    expect(stale.out).toContain(`0 claims open, 1 changed since sign-off, 0 marked needs change.`);
    expect(stale.out).toMatch(/changed since sign-off: drafts\/ice-hall\.md:5:1 c[0-9a-f]{10} \(signed off by R\. Okafor on \d{4}-\d\d-\d\d, approved\)/u);
    expect(stale.out).toContain(`  signed off: ${LGM}\n  now:        ${LGM_EDITED}\n`);

    // 6. A second reviewer signs off the new wording by id (found through the JSON checklist): passing again.
    const json = JSON.parse((await firnline(dir, 'checklist', 'drafts', '--format', 'json')).out) as Checklist;
    const changed = json.claims.filter((c) => c.signoff.status === 'stale');
    expect(changed.map((c) => [c.sentence, c.signoff.signedOffText])).toEqual([[LGM_EDITED, LGM]]);
    const second = await firnline(dir, 'signoff', changed[0]?.id ?? '', '--by', 'J. Berg', '--note', 'new LGM figure checked');
    expect(second.code).toBe(0);
    expect((await firnline(dir, 'check', 'drafts', '--require-signoff')).code).toBe(0);

    // 7. The ledger still holds the first reviewer's entries, byte for byte, followed by the new one.
    const ledgerNow = await readFile(ledgerFile, 'utf8');
    expect(ledgerNow.startsWith(ledgerAfterFirst)).toBe(true);
    const entries = (await readLedger(ledgerFile)).signoffs;
    expect(entries.map((e) => e.reviewer)).toEqual([...boxes.map(() => 'R. Okafor'), 'J. Berg']);
    expect(entries.at(-1)).toMatchObject({ text: LGM_EDITED, decision: 'approved', note: 'new LGM figure checked' });
  });

  it('keeps sign-offs valid when the gate runs from a subfolder of the repository', async () => {
    // Regression: claim ids hashed the path as seen from the working folder, so every sign-off
    // given at the repository root looked open when CI ran inside drafts/.
    const dir = await draftRepository(ICE_HALL);
    await firnline(dir, 'checklist', 'drafts', '-o', 'checklist.md');
    const ticked = (await readFile(join(dir, 'checklist.md'), 'utf8')).replaceAll('- [ ] **', '- [x] **');
    await writeFile(join(dir, 'checklist.md'), ticked);
    expect((await firnline(dir, 'signoff', '--from', 'checklist.md', '--by', 'R. Okafor')).code).toBe(0);
    const inside = await firnline(join(dir, 'drafts'), 'check', '.', '--require-signoff');
    expect(inside.out).toMatch(/Sign-off: (\d+) of \1 claims signed off; 0 claims open/u);
  });

  it('importing the same ticked checklist twice adds nothing the second time', async () => {
    const dir = await draftRepository(ICE_HALL);
    // Written in the repository root this time: later runs recognise it by its first line and skip it.
    const written = await firnline(dir, 'checklist', '-o', 'checklist.md');
    expect(written.code).toBe(0);
    const rerun = JSON.parse((await firnline(dir, 'check', '--format', 'json')).out) as { skipped: { file: string; reason: string }[] };
    expect(rerun.skipped).toContainEqual({ file: 'checklist.md', reason: 'sign-off checklist' });
    const ticked = (await readFile(join(dir, 'checklist.md'), 'utf8')).replaceAll('- [ ] **', '- [x] **');
    await writeFile(join(dir, 'checklist.md'), ticked);
    await firnline(dir, 'signoff', '--from', 'checklist.md', '--by', 'R. Okafor');
    const again = await firnline(dir, 'signoff', '--from', 'checklist.md', '--by', 'R. Okafor');
    expect(again.out).toMatch(/^Recorded 0 sign-offs by R\. Okafor in firnline-signoffs\.yaml \(\d+ already recorded as they are, left out\)\.\n$/u);
  });

  it.each([
    [['signoff', 'c0123456789'], 'say who signs off: --by "Your Name"\n'],
    [['signoff', '--by', 'R. Okafor'], 'give either --from CHECKLIST or one or more claim ids, not both and not neither\n'],
    [['signoff', 'c0123456789', '--by', 'R. Okafor'], 'command line: claim c0123456789 is not in the drafts as they stand now (changed or removed?); make the checklist again with `firnline checklist`\n'],
    [['check', '--changed-since', 'no-such-rev'], "unknown git revision 'no-such-rev'; give a commit, branch or tag that exists here (in CI, fetch enough history)\n"],
  ])('firnline %j exits 2 with one line', async (argv, line) => {
    const dir = await draftRepository(ICE_HALL);
    expect(await firnline(dir, ...argv)).toEqual({ code: 2, out: line });
  });
});
