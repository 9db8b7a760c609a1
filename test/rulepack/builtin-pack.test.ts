import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { BUILTIN_PACK_FILE, describeRule, loadPacks, toCanonical } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

describe('the built-in paleoclimate pack', () => {
  it('holds at least 120 reference values, each with a published source that has a DOI or URL', () => {
    expect(packs.references.length).toBeGreaterThanOrEqual(120);
    const unsourced = packs.references.filter((r) => !r.sources.some((s) => s.doi !== undefined || s.url !== undefined));
    expect(unsourced.map((r) => r.id)).toEqual([]);
  });

  it('keeps every "from memory" mark of the vetted research table', () => {
    // /work/shared/reference-values.yaml marks recalled values "from memory"; the pack keeps them in `how`.
    const marked = packs.sources.filter((s) => s.how.includes('from memory')).map((s) => s.id);
    expect(marked).toEqual(expect.arrayContaining(['gulev-2021', 'loulergue-2007', 'shakun-2012', 'weiss-1974']));
  });

  it('dates the values that change with time, and gives each current one a review date after its as-of date', () => {
    expect(packs.reference('co2-present-day')).toMatchObject({ asOf: '2025-10-15', reviewBy: '2026-06-30' });
    expect(packs.reference('co2-increase-since-1750-pct-2019')).toMatchObject({ asOf: '2019-12-31', supersededBy: 'co2-increase-since-preindustrial-pct-latest' });
    const current = packs.references.filter((r) => r.asOf !== undefined && r.supersededBy === undefined);
    expect(current.filter((r) => r.reviewBy === undefined || r.reviewBy <= (r.asOf ?? '')).map((r) => r.id)).toEqual([]);
    // The values the sources audit (§2.4) names as time-dependent.
    for (const id of ['co2-present-day', 'co2-growth-recent', 'co2-420ppm-as-percent', 'oldest-continuous-ice-core-record', 'allan-hills-oldest-ice', 'co2-increase-since-preindustrial-pct-latest']) {
      expect(packs.reference(id)?.reviewBy, id).toMatch(/^\d{4}-\d{2}-\d{2}$/u);
    }
  });

  it('states values in canonical units: b2k ages become BP (BP = b2k - 50; Walker et al. 2009, doi 10.1002/jqs.1227)', () => {
    expect(packs.reference('holocene-start')).toMatchObject({ low: 11551, high: 11749, unit: 'yr BP', dimension: 'age' });
  });

  it('carries the three direction facts the issue names, and the others of the vetted list', () => {
    // Issue 4: CO2 solubility falls as water warms; trapped air is younger than the ice around it;
    // globally CO2 rose ahead of most of the deglacial warming (Shakun et al. 2012, doi 10.1038/nature10915).
    // REFERENCE-VALUES.md "Direction facts" 6-9: logarithmic forcing (Myhre et al. 1998), polar
    // amplification, the pace of the modern rise against the deglacial ones (Marcott et al. 2014),
    // the bipolar seesaw (Pedro et al. 2016). Round 13: Antarctic temperature rose with CO2 or a few
    // centuries before it, not after it (Parrenin et al. 2013, doi 10.1126/science.1226368; Pedro et
    // al. 2012; Caillon et al. 2003, doi 10.1126/science.1078758). Round 14: the Southern Hemisphere
    // stack warmed before CO2 over the last deglaciation (Shakun et al. 2012, Figure 2b). Round 20:
    // CO2 rose as each ice age ended and fell as the ice sheets grew (Monnin et al. 2001, doi
    // 10.1126/science.291.5501.112; Petit et al. 1999; Lüthi et al. 2008).
    expect(packs.directions.map((d) => d.id)).toEqual([
      'co2-solubility-falls-with-warming',
      'trapped-air-younger-than-ice',
      'global-co2-ahead-of-warming',
      'antarctic-warming-not-behind-co2',
      'southern-warming-not-behind-co2',
      'polar-swings-exceed-global',
      'co2-forcing-logarithmic',
      'modern-co2-rise-faster-than-natural',
      'bipolar-seesaw-younger-dryas',
      'co2-rises-as-ice-ages-end',
    ]);
    expect(packs.directions.find((d) => d.id === 'co2-forcing-logarithmic')?.sources.map((s) => s.doi)).toContain('10.1029/98GL01908');
  });

  it('ends with the reasoning checks and then the lexicon; the lag check cites its three sources', () => {
    const text = readFileSync(BUILTIN_PACK_FILE, 'utf8');
    expect(text.indexOf('# reasoning checks')).toBeGreaterThan(text.indexOf('\npatterns:'));
    expect(text.indexOf('\nlexicon:')).toBeGreaterThan(text.indexOf('\nreasoning_checks:'));
    expect(text.slice(text.indexOf('\nlexicon:'))).not.toMatch(/^\S(?!exicon)/mu);
    const lag = packs.reasoning.find((c) => c.id === 'logic.lag-rules-out-cause');
    // Shakun et al. 2012, Nature 484, 49-54; Pedro et al. 2012; Parrenin et al. 2013.
    expect(lag?.sources.map((s) => s.doi)).toEqual(expect.arrayContaining(['10.1038/nature10915', '10.5194/cp-8-1213-2012', '10.1126/science.1226368']));
    expect(lag).toMatchObject({ level: 'warning', enabled: true });
  });

  // Issue 9: the built-in pack states its direction facts as data and keeps no regular expression
  // in its reasoning checks or direction facts (teams' own pattern rules may still use them).
  it('keeps no regular expression in its direction facts or reasoning checks', () => {
    const own = packs.packs[0];
    expect(own?.directions.every((d) => d.wrong.length === 0 && d.says.length > 0)).toBe(true);
    const words = (own?.reasoning ?? []).flatMap((c) => Object.values(c.words).flat());
    expect(words.filter((w) => /[\\()[\]{}|^$?+]/u.test(w))).toEqual([]);
  });

  it('describes rules of every kind for reports and explain', () => {
    expect(describeRule(packs, 'value.edc-record-span')?.description).toMatch(/^Accepted range: 790,000–810,000 years\./u);
    expect(describeRule(packs, 'direction.trapped-air-younger-than-ice')?.defaultLevel).toBe('warning');
    expect(describeRule(packs, 'logic.lag-rules-out-cause')?.sources.map((s) => s.id)).toEqual(expect.arrayContaining(['shakun-2012', 'pedro-2012', 'parrenin-2013']));
    expect(describeRule(packs, 'value.no-such-value')).toBeUndefined();
  });
});

/**
 * Hosts that are copies, news pages, aggregators, annotation or document-sharing sites, personal or
 * development servers: never a source of record (the independent sources audit of pack 1.0.0, §1.1
 * and §1.3, found each of these in the pack). Bare IP addresses are rejected by pattern.
 */
const NOT_OF_RECORD = [
  'scribd.com', 'studylib.net', 'hypothes.is', 'liquisearch.com', 'wiki2.org', 'wikipedia.org', 'particle.news',
  'worldscope-news.com', 'phys.org', 'ciphernews.com', 'headtopics.com', 'co2.earth', 'paleo.ltrr.arizona.edu',
  'globalauthorid.com', 'sciref.net', 'issuhub.com', 'fliphtml5.com', 'arxiv-vanity.com', 'peeref.com', 'pennds.org',
  'ecoradio.net', 'coek.info', 'environmentcounts.org', 'agendamalvinas.com.ar', 'discovermagazine.com', 'grida.no',
  'github.io', 'confit.atlas.jp', 'tweb-dev.unibo.it', 'semanticclimate.org', 'openpolar.no', 'b2find.eudat.eu',
  'galegroup.com', 'core-prod.cambridgecore.org', 'clim-past-discuss.net', 'uchicago.edu', 'huji.ac.il', 'boris.unibe.ch',
  'hero.epa.gov', 'collaborate.princeton.edu', 'icedrill.org', 'epic.awi.de', 'catalogue.ceda.ac.uk',
];
/** Hosts of official records: DOI resolver, agencies, assessment bodies, data archives (the audit's list). */
const OFFICIAL = /^(?:doi\.org|[\w.-]*\.noaa\.gov|library\.wmo\.int|www\.ipcc\.ch|icecores\.org|institut-polaire\.fr|www\.cnrs\.fr|scrippsco2\.ucsd\.edu|doi\.pangaea\.de)$/u;

describe('sources of record (the sources audit of pack 1.0.0)', () => {
  const text = readFileSync(BUILTIN_PACK_FILE, 'utf8');

  it('gives every source its kind and a DOI or an official locator', () => {
    const weak = packs.sources.filter((s) => s.kind === undefined || (s.doi === undefined && (s.url === undefined || !OFFICIAL.test(new URL(s.url).host))));
    expect(weak.map((s) => s.id)).toEqual([]);
  });

  it('links no copy, news page, aggregator, annotation site or bare IP address anywhere in the pack', () => {
    const hosts = [...text.matchAll(/https?:\/\/([^/\s"')]+)/gu)].map((m) => (m[1] ?? '').toLowerCase());
    expect(hosts.filter((h) => /^\d+(?:\.\d+){3}(?::\d+)?$/u.test(h) || NOT_OF_RECORD.some((bad) => h === bad || h.endsWith(`.${bad}`)))).toEqual([]);
  });

  it('rejects a weak source when one is added (the check above is not vacuous)', () => {
    const fake = { id: 'x', cite: 'x', how: 'x', url: 'https://www.scribd.com/document/1' };
    expect(fake.url.includes(NOT_OF_RECORD[0] ?? '')).toBe(true);
    expect(OFFICIAL.test(new URL(fake.url).host)).toBe(false);
  });

  it('is dated no earlier than its newest source or dated value', () => {
    const pack = packs.packs[0];
    const issued = packs.sources.flatMap((s) => {
      const parts = s.csl?.issued?.['date-parts'][0] ?? [];
      return parts.length === 0 ? [] : [parts.map((n, i) => String(n).padStart(i === 0 ? 4 : 2, '0')).join('-')];
    });
    const dated = packs.references.flatMap((r) => (r.asOf === undefined ? [] : [r.asOf]));
    const newest = [...issued, ...dated].sort().at(-1) ?? '';
    expect(pack?.asOf.localeCompare(newest.padEnd(10, '-00'))).toBeGreaterThanOrEqual(0);
    // WMO Greenhouse Gas Bulletin No. 21 was released on 15 October 2025 (sources audit §2.4).
    expect((pack?.asOf ?? '') >= '2025-10-15').toBe(true);
  });

  it('stores citations as CSL-JSON fields, authors as family and given names', () => {
    const jouzel = packs.sources.find((s) => s.id === 'jouzel-2007');
    // Jouzel et al. 2007, Science 317, 793-796 (doi 10.1126/science.1141038).
    expect(jouzel?.csl).toMatchObject({ type: 'article-journal', 'container-title': 'Science', volume: '317', DOI: '10.1126/science.1141038', issued: { 'date-parts': [[2007]] } });
    expect(jouzel?.csl?.author?.[0]).toEqual({ family: 'Jouzel', given: 'J.' });
    expect(jouzel?.short).toBe('Jouzel et al. 2007, Science 317, doi:10.1126/science.1141038');
  });
});

describe('unit conversions used by the loader', () => {
  // SI Brochure (9th ed.) and NIST SP 811 B.8: 1 ft = 0.3048 m exactly; a 1 °C difference is 1 K and 1.8 °F.
  it.each([
    [1, 'ft', 0.3048],
    [1.8, 'degF-change', 1],
    [800, 'kyr', 800_000],
    [21, 'ka', 21_000],
    [11_700, 'yr b2k', 11_650],
    // 1 BCE is 1950 years before AD 1950 (there is no year 0): common practice.
    [10_000, 'BCE', 11_949],
  ])('%d %s = %d in the canonical unit', (value, unit, expected) => {
    expect(toCanonical(value, unit)).toBeCloseTo(expected, 9);
  });
});
