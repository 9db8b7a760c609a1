// Code actions on a flag (LSP 3.17, "CodeAction", "WorkspaceEdit"), made in memory from the same
// check the server runs. The Vostok record spans about 420,000 years: Petit et al. (1999),
// Nature 399, 429-436.
import { describe, expect, it } from 'vitest';
import { checkDocument, createCheckSetup } from '../../src/lsp/check-document.js';
import { codeActionsOf, REPORTED_MARKER } from '../../src/lsp/code-actions.js';
import { createPositionMap } from '../../src/lsp/positions.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { Draft } from '../../src/types.js';

const WRONG = 'The Vostok ice core spans 800,000 years of climate history.';

async function actionsFor(text: string, format: Draft['format']) {
  const setup = createCheckSetup(await loadPacks([]), {}, { file: 'firnline-signoffs.yaml', signoffs: [] });
  const check = checkDocument(text, format, 'draft', 'draft', setup);
  const [flag] = check.flags;
  if (flag === undefined) throw new Error('expected a flag');
  return codeActionsOf(flag, { uri: 'file:///draft', draft: check.draft, positions: createPositionMap(text) });
}

describe('codeActionsOf', () => {
  it('offers the correction, the marker and the citation in Markdown', async () => {
    const titles = (await actionsFor(`# Panels\n\n${WRONG}\n`, 'markdown')).map((a) => a.title);
    expect(titles).toEqual([
      'Replace "800,000 years" with "about 420,000 years"',
      `Mark this paragraph as a deliberate quotation (firnline: reported)`,
      'Copy citation: Petit et al. 1999; Petit et al. 1999/2001',
    ]);
  });

  it('offers no marker in plain text, where an HTML comment means nothing', async () => {
    const titles = (await actionsFor(`${WRONG}\n`, 'text')).map((a) => a.title);
    expect(titles.some((t) => t.includes('reported'))).toBe(false);
  });

  it('offers no second marker when the paragraph already has one', async () => {
    const actions = await actionsFor(`# Panels\n\n${REPORTED_MARKER}\n${WRONG}\n`, 'markdown');
    expect(actions.some((a) => a.title.includes('reported'))).toBe(false);
  });

  it('puts the marker before a list item at the start of its line', async () => {
    const actions = await actionsFor(`# Panels\n\n- ${WRONG}\n`, 'markdown');
    const marker = actions.find((a) => a.title.includes('reported'));
    expect(marker?.edit?.changes?.['file:///draft']).toEqual([
      { range: { start: { line: 2, character: 0 }, end: { line: 2, character: 0 } }, newText: `${REPORTED_MARKER}\n` },
    ]);
  });
});
