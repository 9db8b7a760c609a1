/**
 * Arithmetic whose result and operands are linked in ways the frames once missed: an amount
 * "spread over" its time, a result introduced by "work that out and you get", a pace told as an
 * amount every interval after the sentence holding its change and time, a degree every so many
 * years, spans of dates whose start is a bare number or which are told in words with "to", a
 * duration "of" something after a span in the sentence before, a relative change counted from the
 * base its own sentence names, and a percentage of a pair whose unit is written at its end only.
 * Every sum here is the sentence's own arithmetic (common practice); the figures are invented.
 */
import { describe, expect, it } from 'vitest';
import { check } from './arithmetic-at.js';

const ids = (...sentences: string[]) => check(...sentences).map((f) => f.ruleId);

describe('a rate from an amount spread over a time', () => {
  // 60 ppm over 5,000 years is 0.012 ppm a year.
  it('flags a wrong rate', () => {
    expect(ids('The lake gained 60 ppm spread over 5,000 years, or roughly 1 ppm a year.')).toEqual(['arith.rate']);
    expect(ids('The bog added 30 m of peat, stretched across 6,000 years, some 5 m per century.')).toEqual(['arith.rate']);
  });
  it('keeps a right rate clean', () => {
    expect(ids('The lake gained 60 ppm spread over 5,000 years, or roughly 0.012 ppm a year.')).toEqual([]);
  });
});

describe('a result drawn with "work that out and you get"', () => {
  // 50 ppm over 4,000 years is 1.25 ppm a century.
  it('flags a wrong rate two sentences on', () => {
    expect(ids('Over the thaw the gas went up by 50 ppm.', 'That took about 4,000 years.', 'Work that out and you get about 12 ppm a century.')).toEqual(['arith.rate']);
  });
  it('keeps a right one clean', () => {
    expect(ids('Over the thaw the gas went up by 50 ppm.', 'That took about 4,000 years.', 'Work that out and you get about 1.25 ppm a century.')).toEqual([]);
  });
});

describe('a pace told as an amount every interval, after the sentence with its change and time', () => {
  // 90 ppm over 9,000 years is 1 ppm every hundred years, 0.1 ppm every ten.
  it('flags a wrong amount', () => {
    const flags = check('Through the warm-up the gas climbed 90 ppm over 9,000 years.', "That's about one ppm every ten years.");
    expect(flags.map((f) => [f.ruleId, f.correction])).toEqual([['arith.rate', 'about 0.1 ppm (about 0.01 ppm per year)']]);
  });
  it('keeps a right amount clean', () => {
    expect(ids('Through the warm-up the gas climbed 90 ppm over 9,000 years.', "That's about one ppm every hundred years.")).toEqual([]);
  });
  it('reads "a degree every" as one degree of change in the sentence itself', () => {
    // 8 °C over 4,000 years is a degree every 500 years.
    expect(ids('The plateau warmed 8 °C over 4,000 years, about a degree every 50 years.')).toEqual(['arith.rate']);
    expect(ids('The plateau warmed 8 °C over 4,000 years, about a degree every 500 years.')).toEqual([]);
  });
});

describe('spans of dates in looser wordings', () => {
  it('reads a bare start number whose unit the end date carries', () => {
    // 16,400 to 15,100 years ago is 1,300 years.
    expect(ids('The stadial ran 16,400 → 15,100 years ago, so ~2,300 years of cold.')).toEqual(['arith.duration']);
    expect(ids('The stadial ran 16,400 → 15,100 years ago, so ~1,300 years of cold.')).toEqual([]);
    expect(ids('From its onset at about 16,400 to its close near 15,100 years ago, the stadial lasted about 300 years.')).toEqual(['arith.duration']);
    expect(ids('From its onset at about 16,400 to its close near 15,100 years ago, the stadial lasted about 1,300 years.')).toEqual([]);
  });
  it('reads a range of dates in words joined by "to"', () => {
    // Sixteen thousand to twelve and a half thousand years ago is 3,500 years.
    expect(ids('Sixteen thousand years ago to twelve and a half thousand, call it five thousand years of melting.')).toEqual(['arith.duration']);
    expect(ids('Sixteen thousand years ago to twelve and a half thousand, call it three and a half thousand years of melting.')).toEqual([]);
  });
  it('reads "N years of something" after a span in the sentence before', () => {
    expect(ids('Roughly 16,400 to 15,100 years ago the north froze again.', 'So, what, about three hundred years of cold.')).toEqual(['arith.duration']);
    expect(ids('Roughly 16,400 to 15,100 years ago the north froze again.', 'So, what, about thirteen hundred years of cold.')).toEqual([]);
  });
});

describe('a relative change counted from the base its own sentence names', () => {
  // 300 → 450 is +50%; 300 → 330 (another level of the paragraph) is +10%; 330 → 450 is +36%.
  it('takes the named base, not a coincidence among the other levels', () => {
    expect(ids('The lowest reading of the decade was 330 ppm.', 'The station logged 450 ppm last spring.', 'Against the baseline of 300 ppm, that is a rise of about 36 percent.')).toEqual(['arith.ratio']);
    expect(ids('The lowest reading of the decade was 330 ppm.', 'The station logged 450 ppm last spring.', 'Against the baseline of 300 ppm, that is a rise of about 50 percent.')).toEqual([]);
  });
  it('reads a base named after the percentage', () => {
    expect(ids('The station logged 450 ppm last spring.', 'That is an increase of about 80% on the baseline 300 ppm.')).toEqual(['arith.ratio']);
    expect(ids('The station logged 450 ppm last spring.', 'That is an increase of about 50% on the baseline 300 ppm.')).toEqual([]);
  });
});

describe('a percentage of a pair in looser wordings', () => {
  it('reads a pair whose unit is written at its end only', () => {
    expect(ids('So 300 → 450 ppm, give or take, is a 30% jump.')).toEqual(['arith.ratio']);
    expect(ids('So 300 → 450 ppm, give or take, is a 50% jump.')).toEqual([]);
  });
  it('reads a percentage set right after a stated change', () => {
    expect(ids('From 300 to 450 ppm is an increase of 150 ppm, roughly 30 per cent.')).toEqual(['arith.ratio']);
    expect(ids('From 300 to 450 ppm is an increase of 150 ppm, roughly 50 per cent.')).toEqual([]);
  });
});
