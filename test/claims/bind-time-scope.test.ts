/**
 * What a number speaks of, read from the sentence's structure (src/claims/bind-time.ts,
 * bind-list.ts, bind-role.ts, bind-others.ts): a clause set at an earlier time, a time frame that
 * opens a sentence, a list of figures with one subject named, growth told as an amount added, and a
 * subject the sentence denies. Sentences of our own, read by the real parser and binder.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { restoreElidedUnits } from '../../src/claims/elided-units.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

/** Per quantity of `sentence` (after `context`): the reference id it binds, '?' when ambiguous, '-' when none. */
function read(sentence: string, context?: string): Record<string, string> {
  const quantities = restoreElidedUnits(sentence, parseQuantities(sentence));
  const { bindings, ambiguous } = bindQuantities(sentence, quantities, packs, context);
  return Object.fromEntries(quantities.map((q, i) => [q.text, bindings.find((b) => b.quantityIndex === i)?.referenceId ?? (ambiguous.includes(i) ? '?' : '-')]));
}

/** What the quantity written `text` in `sentence` binds; a text the parser did not find fails the test. */
function at(sentence: string, text: string): string {
  const found = read(sentence);
  if (!(text in found)) throw new Error(`no quantity "${text}" in ${JSON.stringify(found)}`);
  return found[text] as string;
}

describe('a clause set at an earlier time', () => {
  // Glacial cycles of about 41,000 years before the Mid-Pleistocene Transition and about 100,000
  // after it (Lisiecki & Raymo 2005, doi:10.1029/2004PA001071; Clark et al. 2006, doi:10.1016/j.quascirev.2006.07.008).
  it('does not read a figure for the earlier stretch as the later period', () => {
    expect(at('Prior to roughly 900,000 years ago, ice ages recurred about every 41,000 years.', '41,000 years')).not.toBe('glacial-cycle-period-after-mpt');
    expect(at('Lately the glacial cycles have lasted about 100,000 years, whereas before that they recurred about every 41,000 years.', '41,000 years')).not.toBe('glacial-cycle-period-after-mpt');
    expect(at('Until then the glacial cycles recurred roughly every 41,000 years.', '41,000 years')).not.toBe('glacial-cycle-period-after-mpt');
  });

  it('binds a wrong figure for the earlier stretch to the earlier period', () => {
    expect(at('Before about 1.2 million years ago, glacial cycles came roughly every 23,000 years.', '23,000 years')).toBe('glacial-cycle-period-before-mpt');
    expect(at('The ice ages now return about every 100,000 years; before that they recurred every 60,000 years.', '60,000 years')).toBe('glacial-cycle-period-before-mpt');
  });

  it('keeps the later period for the clause after the turn', () => {
    // "whereas" turns to another time: the earlier-time words stay in their own clause.
    expect(at('Before that the cycles were short, whereas the glacial cycles of the late Pleistocene recurred every 60,000 years.', '60,000 years')).toBe('glacial-cycle-period-after-mpt');
    expect(at('Glacial cycles have recurred roughly every 60,000 years for the past 800,000 years.', '60,000 years')).toBe('glacial-cycle-period-after-mpt');
    // A frame told at the end of the sentence yields as well.
    expect(at('Glacial cycles have recurred roughly every 60,000 years for the past 800,000 years.', '800,000 years')).toBe('-');
  });
});

describe('the former state of a change, and a clause set at a later time', () => {
  // Glacial cycles of about 41,000 years before the Mid-Pleistocene Transition and about 100,000
  // after it (Lisiecki & Raymo 2005, doi:10.1029/2004PA001071; Clark et al. 2006, doi:10.1016/j.quascirev.2006.07.008).
  const lengthened = (a: string, b: string) => `During the Mid-Pleistocene Transition the rhythm of the glacial cycles lengthened from roughly ${a} years to nearly ${b} years.`;

  it('reads the figure after "from" in a change of state as the earlier stretch', () => {
    expect(read(lengthened('41,000', '100,000'))).toMatchObject({
      'roughly 41,000 years': 'glacial-cycle-period-before-mpt',
      'nearly 100,000 years': 'glacial-cycle-period-after-mpt',
    });
    expect(at('The beat of the glacial cycles shifted abruptly from a 41,000-year rhythm to a 100,000-year one.', '41,000-year')).toBe('glacial-cycle-period-before-mpt');
  });

  it('reads the figure replaced in "gave way to" as the earlier stretch', () => {
    expect(at('In the middle Pleistocene a 41,000-year rhythm of glacial cycles gave way to a 100,000-year rhythm.', '41,000-year')).toBe('glacial-cycle-period-before-mpt');
  });

  it('still binds both ends of a change told the wrong way round, each to its own stretch', () => {
    expect(read(lengthened('100,000', '41,000'))).toMatchObject({
      'roughly 100,000 years': 'glacial-cycle-period-before-mpt',
      'nearly 41,000 years': 'glacial-cycle-period-after-mpt',
    });
  });

  it('does not read a range without a verb of change as a change', () => {
    expect(at('Glacial cycles have had a rhythm of 80,000 to 120,000 years since the Mid-Pleistocene Transition.', '80,000 to 120,000 years')).toBe('glacial-cycle-period-after-mpt');
  });

  it('keeps a clause set after a turn ("afterwards", "since then") from the earlier period', () => {
    const told = (b: string) => `Before the Mid-Pleistocene Transition the glacial cycles came every 41,000 years; afterwards they recurred every ${b} years or so.`;
    expect(read(told('100,000'))).toMatchObject({ '41,000 years': 'glacial-cycle-period-before-mpt', '100,000 years or so': '-' });
    // A wrong figure in the earlier clause is still read as the earlier period.
    expect(at('Before the Mid-Pleistocene Transition, glacial cycles recurred every 70,000 years; since then they have run to about 100,000 years.', '70,000 years')).toBe('glacial-cycle-period-before-mpt');
  });
});

describe('a span told as a lead or as a nearness in time', () => {
  // The last deglaciation took about 6,000-9,000 years (Clark et al. 2012, doi:10.1073/pnas.1116619109);
  // leads and lags between Antarctic temperature and CO2 were centuries (Pedro et al. 2012, doi:10.5194/cp-8-1213-2012).
  it('does not read a lead as how long the deglaciation took', () => {
    expect(at('Newer dating puts the southern lead at roughly 600 years at the start of the last deglaciation.', 'roughly 600 years')).toBe('-');
    expect(at('By one estimate the deglaciation leads the northern warming by roughly 600 years.', 'roughly 600 years')).toBe('-');
  });

  it('does not read "within N years of" as how long anything lasted', () => {
    expect(at('A newer study placed the CO2 rise within roughly 300 years of Antarctic warming during the last deglaciation.', 'roughly 300 years')).toBe('-');
  });

  it('still reads a duration told outright, or "within N years" with no "of"', () => {
    expect(at('The last deglaciation took roughly 300 years.', 'roughly 300 years')).toBe('termination-1-duration');
    expect(at('Within roughly 300 years the last deglaciation was over.', 'roughly 300 years')).toBe('termination-1-duration');
    expect(at('The deglacial rise in CO2 took roughly 300 years.', 'roughly 300 years')).toBe('co2-deglacial-rise-duration');
  });
});

describe('a time frame that opens a sentence', () => {
  // Glacial cycles of about 100,000 years since the Mid-Pleistocene Transition (Lisiecki & Raymo 2005).
  it('yields to the number of the sentence that states the same value', () => {
    expect(read('For the past 700,000 years, the glacial cycles have come about every 100,000 years.')).toMatchObject({ '700,000 years': '-', '100,000 years': 'glacial-cycle-period-after-mpt' });
    expect(read('Over the last 900,000 years, glacial cycles recurred roughly every 60,000 years.')).toMatchObject({ '900,000 years': '-', '60,000 years': 'glacial-cycle-period-after-mpt' });
  });

  it('still binds when it is the only number stating its value', () => {
    // EPICA Dome C spans about 800,000 years (Jouzel et al. 2007, doi:10.1126/science.1141038).
    expect(at('Over the last 600,000 years, the EPICA Dome C record shows eight glacial cycles.', '600,000 years')).toBe('edc-record-span');
  });
});

describe('a list of figures with one subject named', () => {
  // Orbital periods of about 100,000, 41,000 and 19,000-23,000 years (Hays et al. 1976, doi:10.1126/science.194.4270.1121).
  it('binds none of several figures that cannot all be that one value', () => {
    expect(read("Changes in the tilt pace the climate on beats of about 100,000, 41,000 and 21,000 years.")).toMatchObject({ 'about 100,000': '?', '41,000': '?', '21,000 years': '?' });
    expect(at('The wobble and the other orbital rhythms run near 400,000, 100,000 and 23,000 years.', '23,000 years')).not.toBe('milankovitch-precession-period');
  });

  it('still binds a list of one subject stated twice with figures that meet', () => {
    // Obliquity about 41,000 years (Berger 1978, doi:10.1175/1520-0469(1978)035<2362:LTVODI>2.0.CO;2).
    expect(at('The tilt cycle lasts 41,000 years or 42,000 years.', '41,000 years')).toBe('milankovitch-obliquity-period');
    // Two neighbouring counts joined by "or", the unit written once, are one range (session 10): it binds as one figure.
    expect(at('The tilt cycle lasts 41,000 or 42,000 years.', '41,000 or 42,000 years')).toBe('milankovitch-obliquity-period');
  });
});

describe('growth told as an amount added', () => {
  // Global CO2 about 423.9 ppm in 2024, growing by about 2-3.5 ppm a year (WMO Greenhouse Gas Bulletin 21, 2025; NOAA GML).
  it('reads the amount added in a year as a change, not as the level', () => {
    expect(at('In 2024 carbon dioxide added roughly 3 ppm to the air.', 'roughly 3 ppm')).toBe('-');
    expect(at("Today's atmosphere keeps gaining about 2.5 ppm of CO2 each year.", 'about 2.5 ppm')).not.toBe('co2-present-day');
    expect(at('Carbon dioxide today rises 2 ppm every year.', '2 ppm every year')).toBe('co2-growth-recent');
  });

  it('still reads a level as the level', () => {
    expect(at('Carbon dioxide in 2024 averaged about 380 ppm worldwide.', 'about 380 ppm')).toBe('co2-global-2024');
    expect(at('Carbon dioxide today stands at about 380 ppm.', 'about 380 ppm')).toBe('co2-present-day');
  });
});

describe('a subject the sentence denies', () => {
  // The last deglaciation ended about 11,700 years ago (Walker et al. 2009, doi:10.1002/jqs.1227).
  it('neither binds nor vetoes', () => {
    expect(at('That paper studied Termination II, about 130,000 years ago, not the end of the last ice age.', 'about 130,000 years ago')).toBe('-');
    expect(at('The record looked at the penultimate thaw, about 135,000 years ago, rather than the end of the last ice age.', 'about 135,000 years ago')).toBe('-');
  });

  it('still binds the subject the sentence asserts', () => {
    expect(at('The end of the last ice age came about 30,000 years ago, not later.', 'about 30,000 years ago')).toBe('termination-1-end');
  });
});

describe('a ceiling told with a participle', () => {
  // The highest natural CO2 of the last 800,000 years is about 300 ppm (Lüthi et al. 2008, doi:10.1038/nature06949).
  it('reads the ceiling, not the 1750 level', () => {
    expect(at('Before industry, natural carbon dioxide swung widely, never topping 330 ppm.', '330 ppm')).toBe('co2-highest-preindustrial-800kyr');
    expect(at('Ice-core CO2 moved with the cycles, never exceeding about 300 ppm.', 'about 300 ppm')).toBe('co2-highest-preindustrial-800kyr');
  });

  it('still reads the 1750 level', () => {
    // Pre-industrial CO2 about 278 ppm in 1750 (IPCC AR6 WGI, ch. 2, doi:10.1017/9781009157896.004).
    expect(at('Before industry, carbon dioxide stood near 300 ppm.', '300 ppm')).toBe('co2-preindustrial-1750');
  });
});
