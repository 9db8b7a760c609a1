/**
 * An end mark that ends its line, before a line that opens in lower case, ends the sentence
 * (src/prose/split-sentences.ts endsAtLineBreak): a writer who breaks the line after a full stop, a
 * question or an exclamation ended a thought, whatever case the line before opened in. Sentences of
 * our own; the figures in them are from the pack's sources and beside the point for the splitter
 * (it reads none), except in the last block, which names each source.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { splitSentences } from '../../src/prose/index.js';

const split = (text: string) => splitSentences(text, 0).map((s) => s.text);

describe('a line that ends in an end mark, over a line in lower case', () => {
  it.each([
    ['Honestly the tilt paces the older cycles.\nthe co2 only amplifies it', ['Honestly the tilt paces the older cycles.', 'the co2 only amplifies it']],
    ['if the gas came late, why call it a cause?\nand the ice says it came late', ['if the gas came late, why call it a cause?', 'and the ice says it came late']],
    ['wow!!\nthe dome c curve is wild', ['wow!!', 'the dome c curve is wild']],
    // A figure or a word with a digit before the stop ends the sentence as a word does.
    ['Milankovitch wrote it all down in 1941.\nnobody listened for decades', ['Milankovitch wrote it all down in 1941.', 'nobody listened for decades']],
    ['The southern stack led co2.\nthe north came later', ['The southern stack led co2.', 'the north came later']],
    // A whole sentence in brackets ends at its closing bracket too.
    ['(the firn is the porous snow on top.)\nanyway back to the lag', ['(the firn is the porous snow on top.)', 'anyway back to the lag']],
  ])('cuts %j', (text, pieces) => expect(split(text)).toEqual(pieces));

  it.each([
    // A quoted sentence inside the writer's own, wrapped after its closing quote.
    'He wrote "The lag settles it."\nthen crossed it out',
    // Abbreviations that run on in lower case, and an initial.
    'As Jouzel et al.\nfound in the Vostok ice, the swings were large',
    'The swings were large (cf.\nthe Greenland cores)',
    // A wrapped line with no mark at its end.
    'The Vostok core reaches back\nsome 420,000 years.',
  ])('keeps %j whole', (text) => expect(split(text)).toEqual([text]));
});

describe('the whole engine: two lines of a post read as two sentences', () => {
  // The deglacial CO2 rise averaged about 0.01-0.015 ppm a year (Monnin et al. 2001, Science 291,
  // doi:10.1126/science.291.5501.112; Marcott et al. 2014, Nature 514, doi:10.1038/nature13799); the
  // 2010s averaged about 2.4 ppm a year (NOAA Global Monitoring Laboratory, as the pack cites it).
  it('binds each pace to its own line, so neither is flagged', async () => {
    const text = 'for context: the deglacial co2 climb averaged about 0.012 ppm a year.\nthe 2010s averaged ~2.4 ppm a year, a far steeper climb.\n';
    const flags = (await checkText(text, { path: 'reply.txt' })).flags.filter((f) => f.ruleId.startsWith('value.'));
    expect(flags.map((f) => f.ruleId)).toEqual([]);
  });

  it('still flags a pace given to the wrong time on its own line', async () => {
    const text = 'for context: the deglacial co2 climb averaged about 2.4 ppm a year.\nthe 2010s averaged ~2.4 ppm a year, the same climb as now.\n';
    const flags = (await checkText(text, { path: 'reply.txt' })).flags.filter((f) => f.ruleId.startsWith('value.'));
    expect(flags.map((f) => [f.ruleId, f.span.start.line])).toEqual([['value.co2-deglacial-mean-rate', 1]]);
  });
});
