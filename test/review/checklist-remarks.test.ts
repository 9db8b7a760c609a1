import { describe, expect, it } from 'vitest';
import { checklistRequests } from '../../src/cli/checklist-requests.js';
import { markdownText } from '../../src/report/markdown-escape.js';
import { checkReviewer } from '../../src/review/reviewers.js';
import { makeClaim } from './make-claim.js';

// Invented checklist lines; the reviewer's remark gives the accepted LGM sea level (about 120-130 m
// below present: Lambeck et al. 2014, PNAS 111, 15296-15303).
const F = 'drafts/coast.md';
const sea = makeClaim(F, 3, 'At the Last Glacial Maximum, sea level was about 50 m lower.');
const co2 = makeClaim(F, 5, 'Before industrialisation, CO2 was about 280 ppm.');
const box = (mark: string, claim = sea, extra = '') => `- [${mark}] **${claim.id}** line ${claim.span.start.line}: ${claim.text}${extra}\n  - Verdict: conflicts\n`;
const list = (...boxes: string[]) => `## File \`${F}\`\n\n${boxes.join('')}`;

describe('checklistRequests: nothing the reviewer wrote is dropped', () => {
  it('records a remark typed after the sentence on an unticked box as needs-change', () => {
    const read = checklistRequests(list(box(' ', sea, ' wrong: sea level was about 120 to 130 m lower')), 'c.md', [sea]);
    expect(read.requests).toEqual([{ claimId: sea.id, decision: 'needs-change', reason: 'wrong: sea level was about 120 to 130 m lower', where: { file: 'c.md', line: 3, column: 1 } }]);
  });

  it('records a note on an unticked box, and reports a decision there that it cannot record', () => {
    const read = checklistRequests(list(box(' ', sea, ' (note: check the coast figure) (waived: fine)')), 'c.md', [sea]);
    expect(read.requests.map((r) => [r.decision, r.reason])).toEqual([['needs-change', 'check the coast figure']]);
    expect(read.notRecorded).toEqual(['c.md:3: "(waived: fine)" is on an unticked box; tick the box to record it.']);
  });

  it('lets "(needs change: ...)" win over a tick, and says so', () => {
    const read = checklistRequests(list(box('x', sea, ' (needs change: 120 to 130 m)')), 'c.md', [sea]);
    expect(read.requests.map((r) => [r.decision, r.reason])).toEqual([['needs-change', '120 to 130 m']]);
    expect(read.notRecorded[0]).toContain('recorded as needs-change, not as approved');
  });

  it('reports a comment on a claim that is no longer in the drafts instead of dropping it', () => {
    const read = checklistRequests(list(box(' ', sea, ' (needs change: 120 to 130 m)'), box(' ', co2)), 'c.md', [co2]);
    expect(read.requests).toEqual([]);
    expect(read.notRecorded).toEqual([`c.md:3: the comment on claim ${sea.id} was not recorded: the claim is not in the drafts as they stand now (changed or removed); make the checklist again and copy the comment over.`]);
  });

  it('reads a remark after a sentence the writer escaped, and never takes the draft\'s own "(note: ...)" for one', () => {
    // The checklist writes draft text escaped (report/markdown-escape.ts), so the box line is not the claim's text.
    const odd = makeClaim(F, 7, 'CO2 (note: the *glacial* value) stood near 100 ppm at the <b>LGM</b>.');
    const line = (extra: string) => list(`- [ ] **${odd.id}** line 7: ${markdownText(odd.text)}${extra}\n  - Verdict: conflicts\n`);
    expect(checklistRequests(line(''), 'c.md', [odd])).toEqual({ requests: [], notRecorded: [], alreadySignedOff: 0 });
    const read = checklistRequests(line(' wrong: about 185 ppm'), 'c.md', [odd]);
    expect(read.requests.map((r) => [r.decision, r.reason])).toEqual([['needs-change', 'wrong: about 185 ppm']]);
  });

  it('leaves boxes Firnline ticked for a sign-off that already held', () => {
    const read = checklistRequests(list(`- [x] **${co2.id}** line 5: ${co2.text}\n  - Signed off: by J. Berg on 2026-01-05, approved\n`), 'c.md', [co2]);
    expect(read).toEqual({ requests: [], notRecorded: [], alreadySignedOff: 1 });
  });
});

describe('checkReviewer', () => {
  const listed = [{ name: 'Dr A. Rahman', git: 'Aisha Rahman <a.rahman@example.org>' }];
  it('lets anyone sign without a list, and a listed reviewer from their own git identity', () => {
    expect(checkReviewer('Anyone', [], undefined, 'firnline.yaml')).toEqual({ name: 'Anyone' });
    expect(checkReviewer('dr a.  rahman', listed, { name: 'A R', email: 'A.Rahman@example.org' }, 'firnline.yaml').name).toBe('Dr A. Rahman');
  });
  it('rejects an unlisted name and a borrowed identity with one clear line', () => {
    expect(() => checkReviewer('J. Berg', listed, undefined, 'firnline.yaml')).toThrow('"J. Berg" is not among the reviewers allowed to sign in firnline.yaml (Dr A. Rahman)');
    expect(() => checkReviewer('Dr A. Rahman', listed, { name: 'Desk', email: 'desk@example.org' }, 'firnline.yaml')).toThrow('git here is configured as Desk <desk@example.org>');
  });
});
