// matchUnit runs a unit's matcher only when the character after the number can start its match
// (src/quantities/first-chars.ts), so that a run compiles only the matchers its drafts meet. That
// must never change what it reads: here every matcher's first characters are checked against the
// matcher itself, and matchUnit against a run of every matcher over the text of our drafts.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { firstChars } from '../../src/quantities/first-chars.js';
import { matchUnit } from '../../src/quantities/match-unit.js';
import { NUMBER_UNIT_GAP, UNIT_END } from '../../src/quantities/unit-forms.js';
import { UNIT_TABLE } from '../../src/quantities/unit-table.js';

const root = fileURLToPath(new URL('../../', import.meta.url));
const chars = (set: ReadonlySet<number> | undefined): string => (set === undefined ? '(any)' : [...set].map((c) => String.fromCodePoint(c)).sort().join(''));

describe('firstChars', () => {
  it.each([
    ['ka', 'k'],
    ['(?:ka|Ma)s?', 'Mk'],
    ['[yY](?:ears?)?', 'Yy'],
    ['(?:cal\\.?\\s+)?BP', 'Bc'],
    ['(?<![\\p{L}])deg(?![^.;]{0,3})', 'd'],
    ['°[\\s\\u00A0]*C|\\u2103', '°℃'],
    ['\\bx*y', 'xy'],
    ['(?=a)b|c{0,2}d', 'bcd'],
    ['\\/yr|\\.a', './'],
    ['[a-c]x', 'abc'],
  ])('reads %s as starting with one of %s', (source, want) => {
    expect(chars(firstChars(source))).toBe(want);
  });

  it.each(['.x', '[^a]x', '\\sx', '\\p{L}x', '(a)\\1', '[\\d]x', 'x|\\w', 'a**'])('gives up on %s (any character may start it)', (source) => {
    expect(firstChars(source)).toBeUndefined();
  });

  it('reads every matcher of the unit table (else matchUnit would compile it on every draft)', () => {
    const unread = UNIT_TABLE.filter((d) => d.forms.length > 0 && firstChars(`(?:${d.forms.join('|')})${UNIT_END}`) === undefined).map((d) => d.id);
    expect(unread).toEqual([]);
  });
});

/** Every file under `dir` ending in .md or .txt. */
function textsUnder(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) out.push(...textsUnder(path));
    else if (/\.(?:md|txt)$/u.test(name)) out.push(readFileSync(path, 'utf8'));
  }
  return out;
}

describe('matchUnit with first characters', () => {
  // The reading before first characters: every matcher at every place, the longest wins.
  const gap = new RegExp(NUMBER_UNIT_GAP, 'uy');
  const all = UNIT_TABLE.filter((d) => d.forms.length > 0).map((def) => ({ def, re: new RegExp(`(?:${def.forms.join('|')})${UNIT_END}`, 'uy') }));
  function everyMatcher(text: string, from: number): { start: number; end: number; ids: string[] } | undefined {
    gap.lastIndex = from;
    const start = from + (gap.exec(text)?.[0].length ?? 0);
    let best: { start: number; end: number; ids: string[] } | undefined;
    for (const { def, re } of all) {
      re.lastIndex = start;
      const m = re.exec(text);
      if (m === null || m[0].length === 0) continue;
      const end = start + m[0].length;
      if (best === undefined || end > best.end) best = { start, end, ids: [def.id] };
      else if (end === best.end && best.ids[0] === def.id) best.ids.push(def.id);
    }
    return best;
  }
  const simple = (m: ReturnType<typeof matchUnit>) => (m === undefined ? undefined : { start: m.start, end: m.end, ids: m.defs.map((d) => d.id) });

  it('reads the same unit after every number of the tuning drafts, the docs and the examples', () => {
    const texts = [
      ...readdirSync(join(root, 'test', 'corpus')).filter((d) => d.startsWith('tuning-')).flatMap((d) => textsUnder(join(root, 'test', 'corpus', d))),
      ...textsUnder(join(root, 'docs')),
      ...textsUnder(join(root, 'examples')),
    ];
    let places = 0;
    let units = 0;
    const differ: string[] = [];
    for (const text of texts) {
      for (const m of text.matchAll(/\d(?!\d)/gu)) {
        const from = (m.index ?? 0) + 1;
        const want = everyMatcher(text, from);
        const got = simple(matchUnit(text, from));
        places += 1;
        if (want !== undefined) units += 1;
        if (JSON.stringify(got) !== JSON.stringify(want)) differ.push(text.slice(from - 5, from + 20));
      }
    }
    expect(differ).toEqual([]);
    expect(places).toBeGreaterThan(10_000);
    expect(units).toBeGreaterThan(5_000);
  });

  it('reads the same unit before text made of every unit form character and white space', () => {
    // Strings of characters the unit forms use, so long forms and near misses both occur.
    const alphabet = [...new Set('°ºC℃℉FKk %‰ppmvbyrsaMBPCEADe.-/ ⁻¹\u00A0\u202Fdegrsceliuminyt kyrMyr ka Ma'.split(''))];
    let seed = 7;
    const next = () => ((seed = (seed * 1_103_515_245 + 12_345) % 2 ** 31) / 2 ** 31);
    const differ: string[] = [];
    let units = 0;
    for (let n = 0; n < 20_000; n += 1) {
      let text = '5';
      const length = 1 + Math.floor(next() * 8);
      for (let i = 0; i < length; i += 1) text += alphabet[Math.floor(next() * alphabet.length)];
      const want = everyMatcher(text, 1);
      if (want !== undefined) units += 1;
      if (JSON.stringify(simple(matchUnit(text, 1))) !== JSON.stringify(want)) differ.push(text);
    }
    expect(differ).toEqual([]);
    expect(units).toBeGreaterThan(1_000);
  });
});
