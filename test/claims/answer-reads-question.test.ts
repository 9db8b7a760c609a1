/**
 * A block that opens by answering the question in the block just before it ("When did the
 * Pleistocene begin?" then "About 1.8 million years ago.") is on the question's topic and reads
 * on from the whole question, the sentence that sets its scene included (src/engine.ts,
 * answersOnTopic, sentenceBefore). A figure after a statement is no answer. Drafts of our own.
 *
 * Reference values: the base of the Pleistocene (Gelasian GSSP) is 2.58 million years old (Gibbard,
 * P. L. et al. 2010, J. Quaternary Sci. 25, 96-102, doi:10.1002/jqs.1338); the Vostok record covers
 * about 420,000 years (Petit, J. R. et al. 1999, Nature 399, 429-436, doi:10.1038/20859).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/index.js';

const flagsOf = async (text: string) => (await checkText(text, { path: 'quiz.md' })).flags.map((f) => [f.ruleId, f.span.start.line]);

describe('an answer block reads on from the question before it', () => {
  it.each([
    ['When did the Pleistocene begin?\n\nAbout 1.8 million years ago.\n', [['value.pleistocene-base', 3]]],
    ['**7. When did the Pleistocene, the epoch of the great ice ages, begin?**\n\n**About 1.8 million years ago.** No half points.\n', [['value.pleistocene-base', 3]]],
    ['How far back does the Vostok record reach?\n\nAbout 600,000 years.\n', [['value.vostok-record-span', 3]]],
    // Right answers stay clean (Gibbard et al. 2010; Petit et al. 1999).
    ['When did the Pleistocene begin?\n\nAbout 2.6 million years ago.\n', []],
    ['How far back does the Vostok record reach?\n\nAbout 420,000 years, four glacial cycles.\n', []],
    // A figure after a statement answers nothing (common practice).
    ['The Pleistocene is the epoch of the ice ages.\n\nAbout 1.8 million years ago.\n', []],
  ])('%j', async (text, expected) => {
    expect(await flagsOf(text)).toEqual(expected);
  });
});
