import { describe, expect, it } from 'vitest';
import { CHECKLIST_FORMATS } from '../../src/cli/commands/checklist.js';
import { CHECK_FORMATS } from '../../src/cli/speed-options.js';
import { CHECKLIST_RENDERERS } from '../../src/cli/render-checklist.js';
import { REPORT_FORMATS } from '../../src/report/index.js';

// The command modules name their format choices without loading the reporters (lazy start,
// docs/speed.md); these lists must stay the reporters' own.
describe('format choices named before the reporters load', () => {
  it('check offers every report format and the checklist', () => {
    expect([...CHECK_FORMATS]).toEqual([...REPORT_FORMATS, 'markdown']);
  });
  it('checklist offers every checklist renderer', () => {
    expect([...CHECKLIST_FORMATS]).toEqual(Object.keys(CHECKLIST_RENDERERS));
  });
});
