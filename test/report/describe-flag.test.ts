import { describe, expect, it } from 'vitest';
import { describeFlag } from '../../src/report/describe-flag.js';
import { doiUrl, formatSource, fullReference } from '../../src/report/format-source.js';
import { asSentence, formatNumber, formatRange } from '../../src/report/format-value.js';
import { LAG_FLAG, RISE_FLAG, SOURCES, SPAN_FLAG } from './fixtures/ice-age-result.js';

describe('numbers and ranges in words', () => {
  const numbers: [number, string][] = [
    [790_000, '790,000'],
    [0.1 + 0.2, '0.3'], // binary floating point gives 0.30000000000000004 (IEEE 754, common practice)
    [75.5, '75.5'],
    [-8, '-8'],
    [0.000015, '0.000015'],
    [1_234_567, '1,234,567'],
  ];
  it.each(numbers)('formatNumber(%s) is %s', (value, words) => expect(formatNumber(value)).toBe(words));

  const ranges: [number, number, string, string][] = [
    [790_000, 810_000, 'yr', '790,000–810,000 years'],
    [76, 76, 'ppm', '76 ppm'],
    [800_000, Infinity, 'yr', 'at least 800,000 years'],
    [-Infinity, 5, 'degC', 'at most 5 °C'],
    [2, 3, 'ratio', '2–3 times'],
    [5, 7, 'count', '5–7'],
    [18_000, 11_000, 'yr BP', '11,000–18,000 years ago'],
    // The draft's own unit and scale word: km, kyr, °F (a 1 K difference is 1.8 °F, NIST SP 811 B.8).
    [499, 621, 'km', '499–621 km'],
    [395, 405, 'kyr', '395–405 kyr'],
    [14.4, 23.4, 'degF-change', '14.4–23.4 °F'],
    // Calendar years as CE/BCE, never as negative ages; there is no year 0 (common practice).
    [2024, 2024, 'CE', '2024 CE'],
    [1998, 2000, 'CE', '1998–2000 CE'],
    [-49, 10, 'CE', '50 BCE – 10 CE'],
    [10_000, 10_000, 'BCE', '10,000 BCE'],
    // A hedged calendar year keeps whole years at its ends ("around 9,000 BC" read as 9,000 ± 3.6%).
    [8676.27, 9323.73, 'BCE', '9324–8676 BCE'],
  ];
  it.each(ranges)('formatRange(%s, %s, %s) is "%s"', (low, high, unit, words) =>
    expect(formatRange(low, high, unit)).toBe(words),
  );

  it('ends a sentence once', () => {
    expect(asSentence('It lags')).toBe('It lags.');
    expect(asSentence('It lags.')).toBe('It lags.');
    expect(asSentence('Does it lag?')).toBe('Does it lag?');
    expect(asSentence('It says "lags."')).toBe('It says "lags."');
  });
});

describe('sources', () => {
  // DOI resolver form https://doi.org/<doi> (DOI Handbook; prefix 10.1000 is the handbook's example prefix).
  const dois: [string, string][] = [
    ['10.1126/science.1141038', 'https://doi.org/10.1126/science.1141038'],
    ['doi:10.1038/nature10915', 'https://doi.org/10.1038/nature10915'],
    ['https://dx.doi.org/10.1038/nature10915', 'https://doi.org/10.1038/nature10915'],
    ['10.1000/a<b>#c;d', 'https://doi.org/10.1000/a%3Cb%3E%23c%3Bd'],
  ];
  it.each(dois)('doiUrl(%s) is %s', (doi, url) => expect(doiUrl(doi)).toBe(url));

  it('cites a source written as plain text in short form, with the DOI or the URL, and marks a recalled source', () => {
    expect(formatSource(SOURCES.jouzel2007)).toBe('Jouzel et al. 2007, doi:10.1126/science.1141038');
    expect(formatSource(SOURCES.beeman2019)).toMatch(/^Chowdhry Beeman et al\. 2019, https:\/\/cp\.copernicus\.org\/articles\/15\/913\/2019$/u);
    expect(formatSource(SOURCES.parrenin2013)).toBe('Parrenin et al. 2013, doi:10.1126/science.1226368 (from memory)');
    expect(fullReference(SOURCES.parrenin2013)).toMatch(/Science 339, 1060-1063\. https:\/\/doi\.org\/10\.1126\/science\.1226368 \(from memory\)$/u);
  });

  it('renders a structured source with the CSL processor: short in text, full in explain and JSON', async () => {
    const { loadPacks } = await import('../../src/rulepack/index.js');
    const packs = await loadPacks([]);
    const jouzel = packs.sources.find((s) => s.id === 'jouzel-2007')!;
    // Jouzel et al. 2007, Science 317(5839), 793-796 (doi 10.1126/science.1141038).
    expect(formatSource(jouzel)).toBe('Jouzel et al. 2007, Science 317, doi:10.1126/science.1141038 (value and page, DOI from memory)');
    expect(fullReference(jouzel)).toMatch(/^Jouzel, J\., Masson-Delmotte, V\., .* & Wolff, E\. W\. \(2007\)\. Orbital and millennial Antarctic climate variability over the past 800,000 years\. Science 317\(5839\), 793–796\. https:\/\/doi\.org\/10\.1126\/science\.1141038 \(value and page, DOI from memory\)$/u);
    // IPCC AR6 WGI chapter 7 (Forster et al. 2021): an assessment chapter shows its report and chapter.
    const forster = packs.sources.find((s) => s.id === 'forster-2021')!;
    expect(formatSource(forster)).toBe('Forster et al. 2021, IPCC AR6 WGI chap. 7, doi:10.1017/9781009157896.009 (author, DOI from memory)');
  });
});

describe('describeFlag: one paragraph per flag', () => {
  it('states reason, claimed value, reference range with its date, and the correction', () => {
    // Reference range after Jouzel et al. (2007), Science 317, 793-796: the record reaches ~800,000 years.
    expect(describeFlag(SPAN_FLAG)).toBe(
      'The span given for the EPICA Dome C record is about half the published one. ' +
        'The draft says "400,000 years" (read as 395,000–405,000 years). ' +
        'Reference: 790,000–810,000 years for the time span of the EPICA Dome C ice-core record (as of 2007). ' +
        'Correction: replace "400,000 years" with "800,000 years".',
    );
  });

  it('gives the rewording advice when no exact correction exists', () => {
    expect(describeFlag(LAG_FLAG)).toBe(
      'A lag of CO2 behind Antarctic temperature is used to rule out CO2 as a cause of the warming. ' +
        'Suggestion: Say that CO2 released as the oceans warmed then amplified the warming: a lag shows CO2 acting as a feedback, not that it had no effect.',
    );
  });

  it('leaves out the date when the reference has none', () => {
    // Monnin et al. (2001), Science 291, 112: CO2 rose by 76 ppmv across the last termination at Dome C.
    expect(describeFlag(RISE_FLAG)).toBe(
      'The rise given for CO2 across the last deglaciation is larger than the Dome C record shows. ' +
        'The draft says "about 100 ppm" (read as 90–110 ppm). ' +
        'Reference: 75.5–76.5 ppm for the rise of CO2 at Dome C from the Last Glacial Maximum to the Holocene. ' +
        'Correction: replace "about 100 ppm" with "76 ppm".',
    );
  });
});
