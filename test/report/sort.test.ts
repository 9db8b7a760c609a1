import { describe, expect, it } from 'vitest';
import { compareByPlace, sortByPlace, sortRules } from '../../src/report/sort.js';
import type { Placed } from '../../src/report/sort.js';
import { ICE_AGE_RESULT, LAG_FLAG, RISE_FLAG, RULES, SPAN_FLAG } from './fixtures/ice-age-result.js';

function at(file: string, line: number, column: number, ruleId?: string, endColumn = column + 1): Placed {
  const span = { start: { line, column, offset: 0 }, end: { line, column: endColumn, offset: 0 } };
  return ruleId === undefined ? { file, span } : { file, span, ruleId };
}

describe('compareByPlace: the one order of every report', () => {
  // [first, second]: `first` must come before `second`.
  const cases: [string, Placed, Placed][] = [
    ['file before line', at('a/ice.md', 9, 9, 'value.x'), at('b/ice.md', 1, 1, 'value.x')],
    ['by code unit, not locale: upper case before lower', at('Z.md', 1, 1), at('a.md', 1, 1)],
    ['line before column', at('a.md', 2, 40, 'value.x'), at('a.md', 3, 1, 'value.x')],
    ['numeric lines, not text: 9 before 10', at('a.md', 9, 1), at('a.md', 10, 1)],
    ['column before rule id', at('a.md', 3, 5, 'value.z'), at('a.md', 3, 6, 'logic.a')],
    ['rule id at the same place', at('a.md', 3, 5, 'logic.lag-rules-out-cause'), at('a.md', 3, 5, 'value.edc-record-span')],
    ['a claim (no rule id) before a flag at the same place', at('a.md', 3, 5), at('a.md', 3, 5, 'logic.a')],
    ['the shorter span first when all else ties', at('a.md', 3, 5, 'value.x', 9), at('a.md', 3, 5, 'value.x', 20)],
  ];
  it.each(cases)('%s', (_name, first, second) => {
    expect(compareByPlace(first, second)).toBeLessThan(0);
    expect(compareByPlace(second, first)).toBeGreaterThan(0);
    expect(compareByPlace(first, first)).toBe(0);
  });

  it('sorts the sample run by file, then line: glacial-co2.md before ice-ages.md line 3 before line 5', () => {
    const input = [...ICE_AGE_RESULT.flags];
    expect(sortByPlace(input)).toEqual([RISE_FLAG, SPAN_FLAG, LAG_FLAG]);
    expect(input).toEqual([LAG_FLAG, SPAN_FLAG, RISE_FLAG]);
  });
});

describe('sortRules', () => {
  it('lists rules by id, one per id, the first description kept', () => {
    const duplicate = { ...RULES[0]!, summary: 'a second description of the same rule' };
    const sorted = sortRules([...RULES, duplicate]);
    expect(sorted.map((rule) => rule.id)).toEqual([
      'logic.lag-rules-out-cause',
      'value.deglacial-co2-rise',
      'value.edc-record-span',
    ]);
    expect(sorted[2]?.summary).toBe('Time span of the EPICA Dome C ice-core record');
  });
});
