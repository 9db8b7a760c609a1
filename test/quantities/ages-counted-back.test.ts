/**
 * An age counted back from now in the words people use besides "ago": "years back", "before now",
 * "before today", "in the past", "back in time" (src/quantities/unit-table.ts, AGO_WORDS). That
 * these all state an age counted from the present is common practice of English usage; "back then"
 * and "back in the glacial" date a time and state no age. Sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';
import { checkText, loadPacks } from '../../src/index.js';

describe('ages counted back from now', () => {
  it.each([
    ['The ice sheets were at their largest some 21,000 years back.', 21000],
    ['The cold snap ended about twelve thousand years back.', 12000],
    ['Sea level began its rise roughly 19,000 years before today.', 19000],
    ['The warm interval peaked about 125,000 years before now.', 125000],
    ['The ice sheets stood largest twenty-one millennia back.', 21000],
    ['The oldest layers formed some 800,000 years back in time.', 800000],
    ['The last warm spell like ours was 125,000 years in the past.', 125000],
  ])('%s', (sentence, value) => {
    const [q] = parseQuantities(sentence);
    expect(q).toMatchObject({ dimension: 'age', value });
  });

  it.each([
    ['CO2 held steady for 2,000 years back then.', 2000],
    ['The level barely moved for 2,000 years back in the glacial.', 2000],
    ['The thaw took about 7,000 years back when the ice retreated.', 7000],
  ])('a span with "back then" stays a span: %s', (sentence, value) => {
    const [q] = parseQuantities(sentence);
    expect(q).toMatchObject({ dimension: 'duration', value });
  });

  // The Last Glacial Maximum: about 19,000 to 26,500 years ago (Clark et al. 2009, Science 325,
  // 710-714, DOI 10.1126/science.1172873), the built-in pack's lgm-chronozone.
  it('binds an age told as "years back" to the period it dates', async () => {
    const packs = await loadPacks([]);
    const wrong = await checkText('The Last Glacial Maximum was only about fifty thousand years back.', { packs, path: 'x.md' });
    expect(wrong.claims.flatMap((c) => c.flags.map((f) => f.ruleId))).toContain('value.lgm-chronozone');
    const right = await checkText('The Last Glacial Maximum was some twenty-one thousand years back.', { packs, path: 'x.md' });
    expect(right.claims.flatMap((c) => c.flags)).toEqual([]);
  });

  // IPCC AR6 WGI SPM A.2.1: CO2 in 2019 was higher than at any time in at least 2 million years.
  it('an age may state a span back from now: "last this high ... years back"', async () => {
    const packs = await loadPacks([]);
    const r = await checkText('When was carbon dioxide last this high? The IPCC puts it at least 200,000 years back.', { packs, path: 'x.md' });
    expect(r.claims.flatMap((c) => c.flags.map((f) => f.ruleId))).toContain('value.co2-2019-highest-in-2-myr');
  });
});
