import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { splitSentences } from '../../src/prose/index.js';

const texts = (text: string) => splitSentences(text, 0).map((s) => s.text);

describe('splitSentences', () => {
  it.each([
    ['Vostok spans about 420,000 years. EPICA Dome C reaches 800,000 years.', ['Vostok spans about 420,000 years.', 'EPICA Dome C reaches 800,000 years.']],
    // Abbreviations common in science writing do not end a sentence (common practice).
    ['CO2 lagged by c. 800 years in that study. Later work found less.', ['CO2 lagged by c. 800 years in that study.', 'Later work found less.']],
    ['Petit et al. 1999 describe four cycles. That is the Vostok record.', ['Petit et al. 1999 describe four cycles.', 'That is the Vostok record.']],
    ['The rise was 2.4 ppm per year. It was 0.013 ppm per year before.', ['The rise was 2.4 ppm per year.', 'It was 0.013 ppm per year before.']],
    ['Was it CO2? Yes! It was.', ['Was it CO2?', 'Yes!', 'It was.']],
    ['He said "CO2 lagged." Then he stopped.', ['He said "CO2 lagged."', 'Then he stopped.']],
    ['J. R. Petit led the study. It was published in 1999.', ['J. R. Petit led the study.', 'It was published in 1999.']],
    ['First line\n\nSecond paragraph text', ['First line', 'Second paragraph text']],
    ['No full stop at the end', ['No full stop at the end']],
    ['  Leading space. ', ['Leading space.']],
  ])('%j', (input, expected) => {
    expect(texts(input)).toEqual(expected);
  });

  it('keeps offsets that slice back to the sentence text', () => {
    const text = 'One core. Two cores (EDC). Three!';
    for (const s of splitSentences(text, 3)) {
      expect(text.slice(s.start, s.end)).toBe(s.text);
      expect(s.blockIndex).toBe(3);
    }
  });

  it('never throws, and every sentence is a non-empty slice of its block (property)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 300 }), (text) => {
        let last = 0;
        for (const s of splitSentences(text, 0)) {
          expect(s.text.length).toBeGreaterThan(0);
          expect(text.slice(s.start, s.end)).toBe(s.text);
          expect(s.start).toBeGreaterThanOrEqual(last);
          last = s.end;
        }
      }),
    );
  });
  // A unit symbol after a number takes no full stop of its own (NIST SP 811, 7.2): a full stop after
  // "420 kyr" or "3,270 m" ends the sentence, while "c." (circa) and "et al." still do not.
  it('ends a sentence at a full stop after a unit symbol that follows a number', () => {
    const texts = (text: string) => splitSentences(text, 0).map((s) => s.text);
    expect(texts('Dome Fuji reaches back about 720 kyr. In 2025 a new core reached bedrock.')).toEqual(['Dome Fuji reaches back about 720 kyr.', 'In 2025 a new core reached bedrock.']);
    expect(texts('The drill stopped at 3,270 m. Below it lies older ice.')).toEqual(['The drill stopped at 3,270 m.', 'Below it lies older ice.']);
    expect(texts('The span is 800 ka. EPICA drilled it.')).toEqual(['The span is 800 ka.', 'EPICA drilled it.']);
    expect(texts('It dates from c. 800 years ago. Jouzel et al. Science showed it.')).toEqual(['It dates from c. 800 years ago.', 'Jouzel et al. Science showed it.']);
  });
  // A site named by a capital letter ("Dome C") may end a sentence; an initial before a surname does
  // not (common practice in sentence splitting).
  it('ends a sentence after a site letter when a sentence opener follows, not after an initial', () => {
    const texts = (text: string) => splitSentences(text, 0).map((s) => s.text);
    expect(texts('The record is longest at Dome C. The older ice is patchy.')).toEqual(['The record is longest at Dome C.', 'The older ice is patchy.']);
    expect(texts('They drilled at Dome C. It reached bedrock in 2004.')).toEqual(['They drilled at Dome C.', 'It reached bedrock in 2004.']);
    expect(texts('As J. R. Petit showed, Vostok holds four cycles.')).toEqual(['As J. R. Petit showed, Vostok holds four cycles.']);
    expect(texts('It dates from c. 800 years ago.')).toEqual(['It dates from c. 800 years ago.']);
  });
});

// Round 20: utterances of chat logs, mail replies and wiki talk pages, one per line with no end
// mark (common practice of that software; the lines are our own).
describe('splitSentences: a line that opens with a clock time, quote marks or a talk-page indent', () => {
  it('cuts a chat log whose lines open with a bare clock time', () => {
    const text = '09:14 Ruth (Guide): the orbit starts the thaw\n09:15 kit_b: and co2 keeps it going\n9:16 pm Ruth (Guide): yes, as a feedback';
    expect(splitSentences(text, 0).map((s) => s.text)).toEqual([
      '09:14 Ruth (Guide): the orbit starts the thaw',
      '09:15 kit_b: and co2 keeps it going',
      '9:16 pm Ruth (Guide): yes, as a feedback',
    ]);
  });

  it('ends a lower-case chat line at a full stop after its clock time and speaker', () => {
    const text = '10:02 Ruth (Guide): co2 fell to about 190 ppm. the ice sheets grew';
    expect(splitSentences(text, 0).map((s) => s.text)).toEqual(['10:02 Ruth (Guide): co2 fell to about 190 ppm.', 'the ice sheets grew']);
  });

  it('cuts lines set under a reply with two or more quote marks', () => {
    const text = '>> antarctica warmed a little first\n>> the north lagged behind';
    expect(splitSentences(text, 0).map((s) => s.text)).toEqual(['>> antarctica warmed a little first', '>> the north lagged behind']);
  });

  it('cuts the indented replies of a wiki talk page', () => {
    const text = ':the record covers eight cycles\n::not all of them the same length';
    expect(splitSentences(text, 0).map((s) => s.text)).toEqual([':the record covers eight cycles', '::not all of them the same length']);
  });

  it('keeps a clock time inside a line and a time range joined to their sentence', () => {
    const text = 'The gallery opens at 10:00 and the\n10:30 talk covers the Vostok core.';
    expect(splitSentences(text, 0).map((s) => s.text)).toEqual([text]);
  });
});
