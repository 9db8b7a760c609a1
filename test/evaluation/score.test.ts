import { describe, it, expect } from 'vitest';
import type { SeededError } from './answer-key.js';
import type { FlagLike } from './score.js';
import { assignFlags, flagMatchesError, flagTouches, locateClaim } from './score.js';

// The scorer decides what the evaluation reports, so its rules are specified here on tiny invented data.

const flag = (ruleId: string, line: number, column: number, endLine = line, endColumn?: number): FlagLike => ({
  ruleId,
  level: 'error',
  file: 'd.md',
  span: { start: { line, column }, end: endColumn === undefined ? { line: endLine } : { line: endLine, column: endColumn } },
});
const error = (kind: SeededError['kind'], line: number): SeededError => ({ file: 'd.md', line, kind, text: 'x', why: 'invented' });

describe('flagMatchesError', () => {
  it.each([
    ['same group, line inside the span', flag('value.a', 3, 1, 4), error('value', 4), true],
    ['group is a prefix up to the dot only', flag('valuex.a', 4, 1), error('value', 4), false],
    ['other group on the same line', flag('unit.a', 4, 1), error('value', 4), false],
    ['line outside the span', flag('value.a', 5, 1), error('value', 4), false],
  ])('%s', (_name, f, e, expected) => {
    expect(flagMatchesError(f, e)).toBe(expected);
  });
});

describe('assignFlags', () => {
  it('credits one flag covering two same-kind errors to only one of them', () => {
    expect(assignFlags([flag('logic.a', 1, 1, 2)], [error('logic', 1), error('logic', 2)])).toEqual([0, -1]);
  });
  it('reassigns so that two flags cover two errors when they can', () => {
    const flags = [flag('logic.a', 1, 1, 2), flag('logic.b', 1, 5)];
    expect(assignFlags(flags, [error('logic', 1), error('logic', 2)])).toEqual([1, 0]);
  });
});

describe('locateClaim and flagTouches', () => {
  const source = 'Intro.\nThe record spans about\n> 800 kyr in CO₂ terms. Next.\n';
  const claim = { file: 'd.md', line: 2, text: 'The record spans about 800 kyr in CO₂ terms.' };
  it('finds a sentence wrapped over a block-quote marker, columns in code points', () => {
    expect(locateClaim(source, claim)).toEqual({ start: { line: 2, column: 1 }, end: { line: 3, column: 23 } });
  });
  it('says undefined when the sentence does not start on the key line', () => {
    expect(locateClaim(source, { ...claim, line: 1 })).toBeUndefined();
  });
  it('counts a flag that overlaps the sentence, not one that starts after it', () => {
    const where = locateClaim(source, claim);
    if (where === undefined) throw new Error('claim not found');
    expect(flagTouches(flag('value.a', 3, 3, 3, 9), where)).toBe(true);
    expect(flagTouches(flag('value.a', 3, 25, 3, 29), where)).toBe(false);
  });
});
