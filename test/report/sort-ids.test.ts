import { describe, expect, it } from 'vitest';
import { sortById } from '../../src/report/sort.js';

const byLocale = (ids: string[]): string[] => [...ids].sort((a, b) => a.localeCompare(b));
const sorted = (ids: string[]): string[] => sortById(ids.map((id) => ({ id }))).map((r) => r.id);

describe('rules sorted by id', () => {
  it('orders plain ids as localeCompare does (hyphen, then dot, digits, letters; a prefix first)', () => {
    const ids = ['value.sea-level-lowstand', 'unit.kelvin-offset', 'value.sea-level', 'value.sea.level', 'logic.lag-2', 'logic.lag-10', 'arith.sum', 'value.sea-level-2'];
    expect(sorted(ids)).toEqual(byLocale(ids));
    expect(sorted(ids)).toEqual(['arith.sum', 'logic.lag-10', 'logic.lag-2', 'unit.kelvin-offset', 'value.sea-level', 'value.sea-level-2', 'value.sea-level-lowstand', 'value.sea.level']);
  });

  it('agrees with localeCompare on random plain ids', () => {
    const alphabet = 'abcdefghijklmnopqrstuvwxyz0123456789.-';
    let state = 42;
    const next = (): number => {
      state = (state * 1103515245 + 12345) % 2147483648;
      return state / 2147483648;
    };
    for (let round = 0; round < 300; round += 1) {
      const ids = Array.from({ length: 30 }, () => Array.from({ length: Math.floor(next() * 9) }, () => alphabet[Math.floor(next() * alphabet.length)]).join(''));
      expect(sorted(ids)).toEqual(byLocale(ids));
    }
  });

  it('keeps localeCompare for a list with any other id (capitals, underscores)', () => {
    const ids = ['team_rule', 'team-rule', 'Team.rule', 'team.rule'];
    expect(sorted(ids)).toEqual(byLocale(ids));
  });
});
