/** Sentence frames: what extractFrames reads from one sentence, with exact UTF-16 offsets. */
import { describe, expect, it } from 'vitest';
import { extractFrames } from '../../src/claims/frames.js';
import { tokenizeSentence } from '../../src/claims/frames-tokens.js';

describe('extractFrames', () => {
  it('reads an order with its size, an inference and a negated causal statement', () => {
    const s = 'CO2 rose about 800 years after Antarctic temperature, so it cannot have caused the warming.';
    expect(extractFrames(s)).toEqual([
      { start: 25, end: 30, text: 'after', kind: 'order', relation: 'after', first: 'temperature', second: 'co2', amount: 'years' },
      { start: 31, end: 40, text: 'Antarctic', kind: 'scope', region: 'antarctic' },
      { start: 54, end: 56, text: 'so', kind: 'inference' },
      { start: 72, end: 78, text: 'caused', kind: 'causal', negated: true, effect: 'temperature' },
    ]);
  });

  it('reads the cause after "by" in the passive', () => {
    expect(extractFrames('The glacial cycles are driven solely by the orbit.')).toEqual([
      { start: 23, end: 29, text: 'driven', kind: 'causal', negated: false, cause: 'orbit' },
    ]);
  });

  it('marks either/or wording and a reported claim', () => {
    const frames = extractFrames("'Temperature drives CO2, not the other way round,' one reader wrote.");
    expect(frames.map((f) => [f.kind, f.start, f.end])).toEqual([
      ['causal', 13, 19],
      ['either-or', 25, 48],
      ['stance', 51, 61],
    ]);
    expect(frames[0]).toMatchObject({ cause: 'temperature', effect: 'co2' });
  });

  it('reads scope and certainty words', () => {
    expect(extractFrames('The ice cores prove beyond doubt that the whole planet warmed.').map((f) => [f.kind, f.text])).toEqual([
      ['scope', 'ice cores'],
      ['certainty', 'prove'],
      ['certainty', 'beyond doubt'],
      ['scope', 'whole planet'],
    ]);
  });

  it('finds nothing to frame in a sentence off the subject', () => {
    expect(extractFrames('The museum opens at nine on weekdays.')).toEqual([]);
  });
});

describe('tokenizeSentence', () => {
  it('splits contractions, reads hyphens as spaces, numbers clauses and tracks quotation marks', () => {
    const t = tokenizeSentence("It can't, said the 'ice-core' guide; but", ['but']);
    expect(t.tokens.filter((x) => x.isWord).map((x) => [x.text, x.start, x.end, x.clause, x.quoted])).toEqual([
      ['it', 0, 2, 0, false],
      ['can', 3, 5, 0, false],
      ['not', 5, 8, 0, false],
      ['said', 10, 14, 0, false],
      ['the', 15, 18, 0, false],
      ['ice', 20, 23, 0, true],
      ['core', 24, 28, 0, true],
      ['guide', 30, 35, 0, false],
      ['but', 37, 40, 2, false],
    ]);
  });
});
