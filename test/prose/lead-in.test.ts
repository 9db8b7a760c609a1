import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { leadInOf } from '../../src/prose/lead-in.js';
import { draftFromText } from '../../src/source/index.js';

const arithmetic = async (text: string, path = 'draft.md') => (await checkText(text, { path })).flags.filter((f) => f.ruleId.startsWith('arith.')).map((f) => [f.ruleId, f.excerpt, f.correction]);

// Blocks that read on from the block before: a thread's posts, a list's items, a table's cells, a
// speaker's turns. Sums by hand (common practice): 75 ppm ÷ 5,000 yr = 0.015 ppm/yr; 275 − 185 = 90;
// 410 ÷ 275 − 1 = 49 %.
describe('arithmetic on figures given one block up (the lead-in)', () => {
  it('reads a thread post on from the post before', async () => {
    const thread = ['3/ The Skelda core shows CO2 gaining about 75 ppm over some 5,000 years.', '', "4/ Do the sum and that's roughly 0.15 ppm a year."].join('\n');
    expect(await arithmetic(thread)).toEqual([['arith.rate', 'roughly 0.15 ppm a year', 'roughly 0.015 ppm a year']]);
  });

  it('reads a list item on from the items before', async () => {
    const list = ['- In the stadials the Skelda CO2 record sits near 185 ppm.', '- In the interglacials it reaches about 275 ppm.', '- So CO2 went up by roughly 140 ppm at each warming.'].join('\n');
    expect(await arithmetic(list)).toEqual([['arith.change', 'roughly 140 ppm', 'roughly 90 ppm']]);
  });

  it('reads a percentage on from the paragraph before', async () => {
    const text = ['The Corran Head inlet averaged about 410 ppm of CO2 in its first year, 2021.', '', "That's a 30% increase on the 275 ppm of the old flask record."].join('\n');
    expect(await arithmetic(text)).toEqual([['arith.ratio', '30%', '49%']]);
  });

  it("reads a table's cell on from the cells of its own row, never from the row above", async () => {
    // 60 m ÷ 6,000 yr = 1 cm per year; 20 m ÷ 4,000 yr = 0.5 cm per year (common practice). The
    // Holocene row's 1 cm per year would be wrong by the row above; it is read on its own row only.
    const table = [
      'Sea level after the Last Glacial Maximum, by stage:',
      '',
      '| Stage | Change | Mean pace |',
      '|---|---|---|',
      '| Early thaw, 17,000–11,000 years ago | about 60 m of sea-level rise in 6,000 years | an average of 10 cm per year |',
      '| Late thaw, 11,000–7,000 years ago | about 20 m of sea-level rise in 4,000 years | an average of 0.5 cm per year |',
      '| Holocene, since 7,000 years ago | a few metres | an average of 1 cm per year |',
    ].join('\n');
    expect(await arithmetic(table)).toEqual([['arith.rate', '10 cm per year', '1 cm per year']]);
  });

  it('leaves right sums alone', async () => {
    const thread = ['3/ The Skelda core shows CO2 gaining about 75 ppm over some 5,000 years.', '', "4/ Do the sum and that's roughly 0.015 ppm a year."].join('\n');
    expect(await arithmetic(thread)).toEqual([]);
  });

  it('does not read across a heading, a code block or a block with neither a subject nor two numbers', async () => {
    const heading = ['The Skelda core shows CO2 gaining about 75 ppm over some 5,000 years.', '', '## Today', '', "Do the sum and that's roughly 0.15 ppm a year."].join('\n');
    expect(await arithmetic(heading)).toEqual([]);
    const code = ['The Skelda core shows CO2 gaining about 75 ppm over some 5,000 years.', '', '```', 'x = 1', '```', '', "Do the sum and that's roughly 0.15 ppm a year."].join('\n');
    expect(await arithmetic(code)).toEqual([]);
    const between = ['The Skelda core shows CO2 gaining about 75 ppm over some 5,000 years.', '', 'Our volunteers counted the layers by hand.', '', "Do the sum and that's roughly 0.15 ppm a year."].join('\n');
    expect(await arithmetic(between)).toEqual([]);
  });

  it('gives the last sentences of the blocks right before, nearest last', () => {
    const text = ['# Notes', '', 'CO2 held 190 ppm then. It reached 280 ppm later.', '', '- a 90 ppm rise over 7,000 years', '- that is 0.013 ppm a year'].join('\n');
    const draft = draftFromText('notes.md', text, 'markdown');
    const last = draft.blocks.length - 1;
    expect(leadInOf(text, draft.blocks, last, (t) => /CO2/u.test(t))).toEqual(['CO2 held 190 ppm then.', 'It reached 280 ppm later.', 'a 90 ppm rise over 7,000 years']);
    // A heading has no lead-in, and the block after a heading reads on from nothing.
    expect(leadInOf(text, draft.blocks, 0, () => true)).toEqual([]);
    expect(leadInOf(text, draft.blocks, 1, () => true)).toEqual([]);
  });
});
