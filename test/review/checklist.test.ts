import { readFileSync } from 'node:fs';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { fromMarkdown } from 'mdast-util-from-markdown';
import { gfmFromMarkdown } from 'mdast-util-gfm';
import { gfm } from 'micromark-extension-gfm';
import { describe, expect, it } from 'vitest';
import { FirnlineError } from '../../src/errors.js';
import { toChecklist } from '../../src/report/checklist-json.js';
import { checklistToMarkdown, renderChecklistMarkdown } from '../../src/report/checklist-markdown.js';
import { readChecklistBoxes } from '../../src/report/checklist-remarks.js';
import { parseTickedChecklist } from '../../src/report/checklist-ticks.js';
import { reviewClaims } from '../../src/review/review-claims.js';
import type { ReferenceValue } from '../../src/rulepack/types.js';
import type { Quantity } from '../../src/types.js';
import { approve, makeClaim } from './make-claim.js';

// The EPICA Dome C record reaches back about 800,000 years: Jouzel et al. (2007), Science 317, 793-796
// (from memory; the pack holds the checked value, this test only carries it through).
const source = { id: 'jouzel2007', cite: 'Jouzel, J. et al. (2007). Orbital and millennial Antarctic climate variability over the past 800,000 years. Science 317, 793-796.', doi: '10.1126/science.1141038', how: 'from memory' };
const edcSpan: ReferenceValue = {
  id: 'edc-record-span', measures: 'time span of the EPICA Dome C ice-core record', dimension: 'duration', dimensions: ['duration', 'age'],
  low: 790_000, high: 810_000, central: 800_000, unit: 'yr', binding: { all: [], none: [] }, wording: 'about 800,000 years', levels: { warning: 0 }, sources: [source],
};
const q: Quantity = { text: 'about 420,000 years', start: 36, end: 55, value: 420_000, low: 415_000, high: 425_000, dimension: 'duration', unit: 'yr', statedUnit: 'yr', hedge: 'about' };

// Invented exhibition text of the Harrow Vale Science Museum (demo wording).
const F = 'drafts/ice-hall.md';
const span = makeClaim(F, 3, 'The Dome C core reaches back about 420,000 years.', {
  heading: 'The long record', quantities: [q], bindings: [{ quantityIndex: 0, referenceId: edcSpan.id }], verdict: 'conflicts',
});
span.flags = [{ ruleId: 'value.edc-record-span', level: 'error', file: F, span: span.span, excerpt: q.text, sentence: span.text, reason: 'The record spans about 800,000 years.', correction: 'about 800,000 years', sources: [source], claimId: span.id }];
const lag = makeClaim('drafts/a-letters.md', 7, 'Some readers argue the CO2 lag means it cannot warm anything.');

const input = {
  claims: [span, lag],
  review: reviewClaims([span, lag], { file: 'l', signoffs: [approve(lag)] }),
  reference: (id: string) => (id === edcSpan.id ? edcSpan : undefined),
  packVersion: 'paleoclimate 1.0.0',
  toolVersion: '0.1.0',
  generated: '2025-02-11T10:00:00Z',
};

describe('checklist --format json', () => {
  it('validates against schemas/checklist.schema.json (JSON Schema draft 2020-12, checked by ajv)', () => {
    const schema = JSON.parse(readFileSync(new URL('../../schemas/checklist.schema.json', import.meta.url), 'utf8')) as object;
    const validate = new Ajv2020({ strict: true }).compile(schema);
    const ok = validate(JSON.parse(JSON.stringify(toChecklist(input))));
    expect(validate.errors ?? []).toEqual([]);
    expect(ok).toBe(true);
  });

  it('lists every claim, flagged or not, by file then position, with its sign-off status', () => {
    const list = toChecklist(input);
    expect(list.claims.map((c) => [c.file, c.line, c.verdict, c.signoff.status])).toEqual([
      ['drafts/a-letters.md', 7, 'no reference', 'signed off'],
      [F, 3, 'conflicts', 'open'],
    ]);
    expect(list.counts).toEqual({ claims: 2, files: 2, agrees: 0, conflicts: 1, 'no reference': 1, 'signed off': 1, 'needs change': 0, stale: 0, open: 1 });
    expect(list.claims[1]?.sources.map((s) => s.id)).toEqual(['jouzel2007']);
  });
});

describe('checklist --format markdown', () => {
  const markdown = renderChecklistMarkdown(input);

  it('writes one box per claim with its id, line and sentence, details indented beneath', () => {
    expect(markdown).toContain(
      [
        '## File `drafts/ice-hall.md`',
        '',
        '### Under "The long record"',
        '',
        `- [ ] **${span.id}** line 3: The Dome C core reaches back about 420,000 years.`,
        '  - Values read: "about 420,000 years" (415,000–425,000 years)',
        '  - Verdict: conflicts with time span of the EPICA Dome C ice-core record: about 800,000 years (790,000–810,000 years)',
        '  - Flag (error, value.edc-record-span): The record spans about 800,000 years. Correction: "about 800,000 years"',
        '  - Sources:',
        '    - Jouzel et al. 2007, doi:10.1126/science.1141038 (from memory)',
      ].join('\n'),
    );
    expect(markdown).toContain('  - Signed off: by R. Okafor on 2025-02-11, approved');
  });

  it('states the cautions in the header', () => {
    expect(markdown).toContain('> Firnline supports, and does not replace, expert review. Reference values carry uncertainty and dates');
  });

  it('is read as GitHub Flavored Markdown task-list items, one box per claim, ticked when its sign-off holds (GFM spec, task list items extension)', () => {
    const tree = fromMarkdown(markdown, { extensions: [gfm()], mdastExtensions: [gfmFromMarkdown()] });
    const boxes: (boolean | null | undefined)[] = [];
    const walk = (node: { type: string; checked?: boolean | null; children?: unknown[] }) => {
      if (node.type === 'listItem' && typeof node.checked === 'boolean') boxes.push(node.checked);
      for (const child of node.children ?? []) walk(child as typeof node);
    };
    walk(tree);
    expect(boxes).toEqual([true, false]);
  });
});

describe('parseTickedChecklist', () => {
  const markdown = checklistToMarkdown(toChecklist(input));

  it('reads from an untouched checklist only the boxes Firnline ticked, which say they are already signed off', () => {
    const ticked = parseTickedChecklist(markdown);
    const boxes = readChecklistBoxes(markdown);
    expect(ticked.map((t) => t.claimId)).toEqual(boxes.filter((b) => b.alreadySignedOff).map((b) => b.claimId));
    expect(boxes.filter((b) => b.ticked && !b.alreadySignedOff)).toEqual([]);
  });

  it('reads a tick as approved, with its file section, even after the line was reflowed', () => {
    const ticked = markdown.replace(`- [ ] **${span.id}** line 3: The Dome C core reaches back about 420,000 years.`, `* [X] **${span.id}** line 3: The Dome C core\n  reaches back about 420,000 years.`);
    expect(parseTickedChecklist(ticked)).toContainEqual({ claimId: span.id, file: F, decision: 'approved', line: ticked.split('\n').findIndex((l) => l.startsWith('* [X]')) + 1 });
  });

  it.each([
    ['(waived: quoted in order to answer it)', { decision: 'waived', reason: 'quoted in order to answer it' }],
    ['(corrected: now says 800,000 years) (note: checked with the curator)', { decision: 'corrected', reason: 'now says 800,000 years', note: 'checked with the curator' }],
    ['(note: fine as worded)', { decision: 'approved', note: 'fine as worded' }],
  ])('reads the marks %s', (marks, expected) => {
    const ticked = `## File \`${F}\`\n- [x] **${span.id}** line 3: The Dome C core reaches back about 420,000 years. ${marks}\n  - Verdict: conflicts\n`;
    expect(parseTickedChecklist(ticked)).toEqual([{ claimId: span.id, file: F, line: 2, ...expected }]);
  });

  it.each([
    ['a ticked box without a claim id', '- [x] line 3: a sentence', 'checklist-no-id'],
    ['a waiver without a reason', `- [x] **${span.id}** (waived: )`, 'checklist-no-reason'],
    ['two decisions on one box', `- [x] **${span.id}** (waived: a) (corrected: b)`, 'checklist-two-decisions'],
  ])('rejects %s at checklist:line:column', (_name, text, code) => {
    const error = (() => {
      try {
        parseTickedChecklist(`# Sign-off checklist\n\n${text}\n`, 'review.md');
      } catch (e) {
        return e;
      }
      return undefined;
    })();
    expect(error).toBeInstanceOf(FirnlineError);
    expect(error).toMatchObject({ code, where: { file: 'review.md', line: 3, column: 3 } });
  });
});
