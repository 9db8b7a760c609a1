import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { checkReferences, relativeDistance } from '../../src/checks/reference.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { Dimension, Quantity } from '../../src/types.js';

const packs = await loadPacks([]);

function q(sentence: string, text: string, dimension: Dimension, low: number, high: number, statedUnit = ''): Quantity {
  const start = sentence.indexOf(text);
  return { text, start, end: start + text.length, value: (low + high) / 2, low, high, dimension, unit: '', statedUnit };
}

function check(sentence: string, quantity: Quantity) {
  const { bindings } = bindQuantities(sentence, [quantity], packs);
  return checkReferences(sentence, [quantity], bindings, packs);
}

describe('checkReferences', () => {
  it('flags a wrong record span with the range, the correction and the sources', () => {
    // Jouzel et al. 2007 (doi 10.1126/science.1141038); Lüthi et al. 2008 (doi 10.1038/nature06949): 790,000-810,000 years.
    const s = 'The EPICA Dome C record spans 400,000 years.';
    const { flags, verdicts } = check(s, q(s, '400,000 years', 'duration', 395e3, 405e3));
    expect(verdicts).toEqual(['conflicts']);
    expect(flags).toEqual([{
      ruleId: 'value.edc-record-span',
      level: 'error',
      start: 30,
      end: 43,
      reason: 'The draft gives 400,000 years for the current time span of the EPICA Dome C climate (deuterium) and CO2 records; the sources give 790,000–810,000 years.',
      claimed: { text: '400,000 years', low: 395e3, high: 405e3, unit: 'yr' },
      reference: { id: 'edc-record-span', measures: packs.reference('edc-record-span')!.measures, text: '790,000–810,000 years', low: 790e3, high: 810e3, unit: 'yr' },
      correction: 'about 800,000 years',
      sources: packs.reference('edc-record-span')!.sources,
    }]);
    expect(flags[0]?.sources.map((s) => s.doi)).toEqual(['10.1126/science.1141038', '10.1038/nature06949']);
  });

  it('gives a figure that was right when published a note naming the newer value, not a warning', () => {
    // EPICA community members 2004 (doi 10.1038/nature02599): about 740,000 years; extended to about
    // 800,000 years by Jouzel et al. 2007 and Lüthi et al. 2008.
    // Told in the past: of its day (told in the present, it is today's figure: dated-after.test.ts).
    const s = 'The EPICA Dome C record spanned 740,000 years.';
    const { flags, verdicts } = check(s, q(s, '740,000 years', 'duration', 735e3, 745e3));
    expect(verdicts).toEqual(['conflicts']);
    expect(flags[0]).toMatchObject({ ruleId: 'value.edc-record-span', level: 'note', correction: 'about 800,000 years' });
    expect(flags[0]?.reason).toBe('The draft gives 740,000 years for the current time span of the EPICA Dome C climate (deuterium) and CO2 records: the figure of 2004, right when published and since superseded; the sources now give 790,000–810,000 years');
    expect(flags[0]?.sources.map((x) => x.id)).toContain('epica-community-members-2004');
    // Dated to the year it was right, the same figure is no error at all.
    const dated = 'In 2004 the EPICA Dome C record reached back 740,000 years.';
    expect(check(dated, q(dated, '740,000 years', 'duration', 735e3, 745e3))).toMatchObject({ flags: [], verdicts: ['agrees'] });
    // Given as today's figure ("currently"), the superseded figure is flagged like any other figure
    // that close to the range (a warning), and the reason says whose figure it was.
    const current = 'The EPICA Dome C record currently reaches back 740,000 years.';
    const asToday = check(current, q(current, '740,000 years', 'duration', 735e3, 745e3)).flags[0];
    expect(asToday).toMatchObject({ ruleId: 'value.edc-record-span', level: 'warning', correction: 'about 800,000 years' });
    expect(asToday?.reason).toBe("The draft gives 740,000 years for the current time span of the EPICA Dome C climate (deuterium) and CO2 records as today's figure: that is the figure of 2004, since superseded; the sources now give 790,000–810,000 years.");
    expect(asToday?.sources.map((x) => x.id)).toContain('epica-community-members-2004');
    // A figure far from both stays a warning or worse.
    const wrong = 'The EPICA Dome C record spans 500,000 years.';
    expect(check(wrong, q(wrong, '500,000 years', 'duration', 495e3, 505e3)).flags[0]?.level).toBe('error');
  });

  it('binds a claim about today to the latest value and a dated claim to that year', () => {
    // IPCC AR6 SPM A.2.1: +47% from 1750 to 2019; WMO Bulletin No. 21: about 152% of pre-industrial in 2024.
    const now = 'CO2 is now about 52% higher than before the industrial revolution.';
    expect(bindQuantities(now, [q(now, 'about 52%', 'percent', 51, 53)], packs).bindings.map((b) => b.referenceId)).toEqual(['co2-increase-since-preindustrial-pct-latest']);
    const then = 'By 2019 CO2 had risen 47% above pre-industrial levels.';
    expect(bindQuantities(then, [q(then, '47%', 'percent', 46.5, 47.5)], packs).bindings.map((b) => b.referenceId)).toEqual(['co2-increase-since-1750-pct-2019']);
    // The 2019 figure told as today's is a note naming the newer one.
    const stale = 'CO2 is now 47% higher than before the industrial revolution.';
    expect(check(stale, q(stale, '47%', 'percent', 46.5, 47.5)).flags[0]).toMatchObject({ level: 'note', ruleId: 'value.co2-increase-since-preindustrial-pct-latest' });
  });

  it('shows the range and the correction in the draft’s own unit', () => {
    const s = 'The EPICA Dome C record spans 400 kyr.';
    const [flag] = check(s, q(s, '400 kyr', 'duration', 395e3, 405e3, 'kyr')).flags;
    expect(flag).toMatchObject({ claimed: { low: 395, high: 405, unit: 'kyr' }, reference: { text: '790–810 kyr', low: 790, high: 810, unit: 'kyr' }, correction: 'about 800 kyr' });
  });

  it('rounds a depth measured to the metre in kilometres as an editor would, with the metres beside it', () => {
    // Vostok drilled to 3,623 m (Petit et al. 1999, doi 10.1038/20859); EPICA Dome C to 3,270 m (Lüthi et al. 2008, doi 10.1038/nature06949).
    const deep = 'The Vostok borehole went down some 4.1 km.';
    expect(check(deep, q(deep, '4.1 km', 'length', 4050, 4150, 'km')).flags[0]?.correction).toBe('about 3.6 km (3,623 metres)');
    const shallow = 'EPICA Dome C was drilled to a depth of 2.2 km.';
    expect(check(shallow, q(shallow, '2.2 km', 'length', 2150, 2250, 'km')).flags[0]?.correction).toBe('about 3.3 km (about 3,270 metres)');
  });

  it('converts temperature differences to °F for a draft that writes °F', () => {
    // 1 K difference = 1.8 °F difference (NIST SP 811 B.8). West Antarctica 8-13 K (Buizert et al. 2021; Cuffey et al. 2016).
    const s = 'West Antarctica was 5 °F colder then.';
    const [flag] = check(s, q(s, '5 °F', 'temperature-change', 4.5 / 1.8, 5.5 / 1.8, 'degF')).flags;
    expect(flag?.reference).toMatchObject({ text: '14.4–23.4 °F', unit: 'degF-change' });
    expect(flag?.correction).toBe('about 18 °F');
  });

  it('says "as of" for dated values, and that a claim about today meets a dated value', () => {
    const s = 'Today CO2 stands at 350 ppm.';
    const [flag] = check(s, q(s, '350 ppm', 'concentration', 349.5, 350.5, 'ppm')).flags;
    expect(flag?.reason).toBe('The draft gives 350 ppm for the atmospheric CO2 today: from the latest global annual mean (2024) to the latest Mauna Loa May peak (2025); the sources give 422.5–431 ppm as of 2025-10-15. The draft speaks of today; the reference value is dated 2025-10-15 and changes with time.');
    expect(flag?.reference?.asOf).toBe('2025-10-15');
  });

  it('passes an agreeing claim with no flag', () => {
    const s = 'The EPICA Dome C record spans about 800,000 years.';
    expect(check(s, q(s, 'about 800,000 years', 'duration', 780e3, 820e3))).toEqual({ flags: [], verdicts: ['agrees'] });
  });

  it.each([
    // [claimed low, high] against vostok-record-span 400,000-423,000 (Petit et al. 1999); default levels warning 0, error 0.1
    [424_000, 426_000, 'warning'],
    [480_000, 490_000, 'error'],
  ])('grows the level with the distance: %d-%d is a %s', (low, high, level) => {
    const s = 'The Vostok record spans that many years.';
    expect(check(s, q(s, 'that many years', 'duration', low, high)).flags[0]?.level).toBe(level);
  });

  it('measures distance relative to the size of the range', () => {
    expect(relativeDistance(380, 390, { low: 400, high: 423 })).toBeCloseTo(10 / 423, 12);
    expect(relativeDistance(410, 415, { low: 400, high: 423 })).toBe(0);
  });
});

describe('corrections', () => {
  it('use the pack wording when the draft writes °C for a temperature change (1 °C difference = 1 K, SI Brochure)', () => {
    const s = 'Global temperature at the Last Glacial Maximum was 2 °C lower.';
    const [flag] = check(s, q(s, '2 °C', 'temperature-change', 1.5, 2.5, 'degC')).flags;
    expect(flag?.correction).toBe('about 6 °C (estimates run from about 4 to 7 °C)');
    expect(flag?.reference?.text).toBe('3.5–7.5 °C');
  });
});
