/**
 * The generative bad-input run: fast-check builds drafts (Markdown, plain text, raw bytes), rule
 * packs, settings files, ledgers and checklists from fragments that have broken Firnline before
 * (control characters, deep nesting, entity-escaped HTML, prototype-named keys, YAML anchors,
 * odd ticks) mixed with arbitrary strings. Each case must end in a result or a user error
 * (FirnlineError); anything else is a crash, and a case running longer than HANG_MS is a hang.
 * `npm run fuzz` runs 100,000 cases; `npm test` runs a smaller count (fuzz.test.ts).
 */
import fc from 'fast-check';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { checkText } from '../../src/engine.js';
import { isUserError } from '../../src/errors.js';
import { isChecklistText } from '../../src/report/checklist-lines.js';
import { parseTickedChecklist } from '../../src/report/checklist-ticks.js';
import { markdownText } from '../../src/report/markdown-escape.js';
import { appendToLedgerText } from '../../src/review/append-signoffs.js';
import { parseLedger } from '../../src/review/read-ledger.js';
import type { SignoffEntry } from '../../src/review/signoff-entry.js';
import { loadPacks, loadSettings } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';
import { decodeDraftBytes } from '../../src/source/decode-text.js';
import { renderReport } from '../../src/report/index.js';
import { visibleData } from '../../src/guard/visible-text.js';

/** A case slower than this counts as a hang (generous: the machine may be shared). */
export const HANG_MS = 5_000;

const PROSE = [
  'The Vostok core spans 800,000 years of CO2 history.', 'At the Last Glacial Maximum, CO2 stood near 185 ppm.',
  'Temperature fell by about 9 °C.', 'Ice cores show that CO2 rose about 800 years after the warming began, so CO2 cannot have caused the warming.',
  'CO2 rose from 180 to 280 ppm, a rise of 50 ppm.', 'constructor', '__proto__', 'toString', ' ', '\n', '\n\n', '\r\n', '\r', '\t',
  '> ', '- ', '* ', '1. ', '# ', '| a | b |\n|---|---|\n| 1 | 2 |', '```\n', '`', '**', '_', '[', '](', ')', '<!-- ', ' -->',
  '&lt;img src=x onerror=alert(1)&gt;', '<script>', '\\', '\u001b[31m', '\u0007', '\u0000', '\u202e', '\ufeff', '(waived: x)', '(note: y)',
  '---\ntitle: x\n---\n', '800,000', '1e308', '-0', 'NaN ppm', '½', '²', 'ppmv', 'kyr BP', '%', '…', '😀', '\ud800',
];
const YAML_BITS = [
  'pack: fuzz\n', 'version: "1"\n', 'as_of: 2025-01-01\n', 'sources:\n', 'terms:\n', 'patterns:\n', 'reference_values:\n', 'direction_facts:\n',
  'reasoning_checks:\n', '  - id: fuzz.a\n', '  - id: constructor\n', '  - id: __proto__\n', '    cite: c\n', '    how: read in the source\n',
  '    words: [Vostok, CO2]\n', '    reason: r\n', "    regex: 'Vostok'\n", "    regex: '(a|aa)*$'\n", '    match: "#Noun"\n', '    sources: [s]\n',
  '    low: 1\n', '    high: .inf\n', '    unit: ppm\n', '&a [1,2]\n', '*a\n', 'x: &b {a: 1}\n', 'y: *b\n', '<<: *b\n', '{', '[', ': ', '- ', '\t', '#', '"', "'",
  'include: ["**/*.md"]\n', 'exclude: [x]\n', 'packs: [../../etc/passwd]\n', 'levels: {constructor: off}\n', 'fail_on: note\n', 'ledger: l.yaml\n',
  'signoffs:\n', '  - claim: c0123456789\n', '    file: a.md\n', '    text: t\n', '    decision: approved\n', '    reviewer: R\n', '    date: 2025-01-01\n',
  '    pack_version: p 1\n', '\r\n', '\u0000', '\u001b[2K',
];
const CHECKLIST_BITS = [
  '<!-- firnline sign-off checklist: a review aid made from the drafts, not a draft -->\n', '## File `a.md`\n', '## File "a\\nb.md"\n', '### Under "x"\n',
  '- [ ] **c0123456789** line 1: ', '- [x] **c0123456789** line 1: ', '- [X] **c0123456789-2** line 2: ', '- [x ] **c0123456789** ', '-[x] **c0123456789** ',
  '* [✓] **c0123456789** ', '1. [x] **c9876543210** ', '(corrected: x)', '(waived: )', '(note: n)', '(waived: a) (corrected: b)', '\\(waived: z\\)', '  - Verdict: x\n', '\n',
];

const fragments = (bits: readonly string[]) =>
  fc.array(fc.oneof({ weight: 4, arbitrary: fc.constantFrom(...bits) }, { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 12 }) }), { maxLength: 40 }).map((parts) => parts.join(''));

/** One generated input of one kind. */
export type FuzzCase =
  | { kind: 'markdown' | 'text' | 'checklist' | 'ledger' | 'pack' | 'settings'; text: string }
  | { kind: 'bytes'; bytes: Uint8Array }
  | { kind: 'nesting'; prefix: string; depth: number };

export const fuzzCase: fc.Arbitrary<FuzzCase> = fc.oneof(
  { weight: 3, arbitrary: fragments(PROSE).map((text) => ({ kind: 'markdown' as const, text })) },
  { weight: 2, arbitrary: fragments(PROSE).map((text) => ({ kind: 'text' as const, text })) },
  { weight: 1, arbitrary: fc.uint8Array({ maxLength: 200 }).map((bytes) => ({ kind: 'bytes' as const, bytes })) },
  { weight: 1, arbitrary: fc.record({ prefix: fc.constantFrom('>', '- ', '> - ', '1. ', '  '), depth: fc.integer({ min: 1, max: 3000 }) }).map((r) => ({ kind: 'nesting' as const, ...r })) },
  { weight: 2, arbitrary: fragments([...CHECKLIST_BITS, ...PROSE]).map((text) => ({ kind: 'checklist' as const, text })) },
  { weight: 2, arbitrary: fragments(YAML_BITS).map((text) => ({ kind: 'ledger' as const, text })) },
  { weight: 2, arbitrary: fragments(YAML_BITS).map((text) => ({ kind: 'pack' as const, text: `pack: fuzz\nversion: "1"\nas_of: 2025-01-01\n${text}` })) },
  { weight: 1, arbitrary: fragments(YAML_BITS).map((text) => ({ kind: 'settings' as const, text })) },
);

const ENTRY: SignoffEntry = { claim: 'c0000000001', file: 'a.md', text: 'The Vostok core spans 420,000 years.', decision: 'approved', reviewer: 'R', date: '2025-01-01', packVersion: 'p 1' };

/** Runs one case; throws only for a crash (an error that is not a user error, or a broken promise of the code). */
export async function runCase(input: FuzzCase, packs: LoadedPacks, scratch: string): Promise<void> {
  try {
    await runUnguarded(input, packs, scratch);
  } catch (error) {
    if (isUserError(error)) return;
    throw error;
  }
}

async function runUnguarded(input: FuzzCase, packs: LoadedPacks, scratch: string): Promise<void> {
  switch (input.kind) {
    case 'markdown':
    case 'text': {
      const result = await checkText(input.text, { path: input.kind === 'markdown' ? 'f.md' : 'f.txt', packs });
      // Every report renders, and the text report reaches no terminal with a raw control character.
      const text = renderReport('text', visibleData(result), { color: false, toolVersion: '0', failOn: 'error' });
  // eslint-disable-next-line no-control-regex -- finding control characters is the point
      if (/[\u0000-\u0008\u000b-\u001f\u007f]/u.test(text)) throw new Error('raw control character in the text report');
      for (const format of ['json', 'sarif', 'junit'] as const) renderReport(format, result, { color: false, toolVersion: '0', failOn: 'error' });
      return;
    }
    case 'bytes': {
      const decoded = decodeDraftBytes(input.bytes);
      if ('text' in decoded) await checkText(decoded.text, { path: 'b.md', packs });
      return;
    }
    case 'nesting':
      await checkText(`${input.prefix.repeat(input.depth)}The Vostok core spans 800,000 years.\n`, { path: 'n.md', packs });
      return;
    case 'checklist': {
      isChecklistText(input.text);
      parseTickedChecklist(input.text, 'cl.md');
      // Escaped draft text never reads back as a reviewer's decision, whatever it holds.
      const line = `- [x] **c0123456789** line 1: ${markdownText(input.text)}`;
      const ticked = parseTickedChecklist(line, 'cl.md');
      if (ticked.length !== 1 || ticked[0]?.decision !== 'approved' || ticked[0].note !== undefined) throw new Error(`draft text read as a mark: ${JSON.stringify(input.text)}`);
      return;
    }
    case 'ledger': {
      const before = parseLedger(input.text, 'l.yaml');
      // A ledger that reads can always take one more entry, and keeps every earlier one.
      const after = parseLedger(appendToLedgerText(input.text, [ENTRY]), 'l.yaml');
      if (after.signoffs.length !== before.signoffs.length + 1) throw new Error('appending lost or duplicated an entry');
      return;
    }
    case 'pack': {
      const file = join(scratch, 'pack.yaml');
      writeFileSync(file, input.text);
      const loaded = await loadPacks([file], { builtin: false });
      await checkText('The Vostok core spans 800,000 years of CO2 history. constructor __proto__', { path: 'p.md', packs: loaded });
      return;
    }
    case 'settings': {
      const file = join(scratch, 'firnline.yaml');
      writeFileSync(file, input.text);
      await loadSettings(file);
      return;
    }
  }
}
