/**
 * The published definitions the unit checks cite. Recalled, not re-read for this release: each
 * says so in `how`, and an editor should open the link before relying on it.
 */
import { resolveSource } from '../rulepack/resolve-source.js';
import type { Source } from '../types.js';

/** NIST SP 811: SI conversion factors (ft, mile, °F intervals and temperatures, percent, ppm). */
export const NIST_SP_811: Source = {
  id: 'nist-sp-811-2008',
  cite: 'Thompson, A. & Taylor, B. N. (2008). Guide for the Use of the International System of Units (SI). NIST Special Publication 811, 2008 edition.',
  url: 'https://physics.nist.gov/cuu/pdf/sp811.pdf',
  how: 'from memory',
};

/** The BP convention: radiocarbon ages count years before AD 1950. */
export const BP_CONVENTION: Source = {
  id: 'stuiver-polach-1977',
  cite: 'Stuiver, M. & Polach, H. A. (1977). Discussion: Reporting of 14C data. Radiocarbon 19(3), 355-363.',
  doi: '10.1017/S0033822200003672',
  how: 'from memory',
};

/** The b2k convention: years before AD 2000, as used for the Greenland ice-core chronology. */
export const B2K_CONVENTION: Source = {
  id: 'walker-2009',
  cite: 'Walker, M. et al. (2009). Formal definition and dating of the GSSP (Global Stratotype Section and Point) for the base of the Holocene using the Greenland NGRIP ice core, and selected auxiliary records. Journal of Quaternary Science 24, 3-17.',
  doi: '10.1002/jqs.1227',
  how: 'from memory',
};

/**
 * The 800,000-year ice-core CO2 range (172-300 ppm), the low end of every CO2 level a draft on ice
 * ages can mean. The same entry as the built-in pack's `luthi-2008` (a test keeps them equal).
 */
export const LUTHI_2008: Source = resolveSource({
  id: 'luthi-2008',
  kind: 'paper',
  author: [
    { family: 'Lüthi', given: 'D.' }, { family: 'Le Floch', given: 'M.' }, { family: 'Bereiter', given: 'B.' },
    { family: 'Blunier', given: 'T.' }, { family: 'Barnola', given: 'J.-M.' }, { family: 'Siegenthaler', given: 'U.' },
    { family: 'Raynaud', given: 'D.' }, { family: 'Jouzel', given: 'J.' }, { family: 'Fischer', given: 'H.' },
    { family: 'Kawamura', given: 'K.' }, { family: 'Stocker', given: 'T. F.' },
  ],
  issued: 2008,
  title: 'High-resolution carbon dioxide concentration record 650,000-800,000 years before present',
  'container-title': 'Nature',
  volume: '453',
  page: '379-382',
  doi: '10.1038/nature06949',
  how: 'read in the source: CO2 172-300 ppmv over 800,000 years; EDML 2,774 m and EDC 3,270 m deep (abstract and full text)',
});

/** A modern CO2 level (global mean 419.3 ppm in 2023). The same entry as the built-in pack's `noaa-research-2024`. */
export const NOAA_2024: Source = resolveSource({
  id: 'noaa-research-2024',
  kind: 'agency',
  author: [{ literal: 'NOAA Research' }],
  issued: '2024-04-05',
  title: 'No sign of greenhouse gases increases slowing in 2023',
  genre: 'news release',
  publisher: 'National Oceanic and Atmospheric Administration',
  url: 'https://research.noaa.gov/2024/04/05/no-sign-of-greenhouse-gases-increases-slowing-in-2023/',
  from_memory: ['URL'],
  how: 'read in the source: global mean CO2 of 419.3 ppm in 2023, up 2.8 ppm, more than 50% above pre-industrial (title and numbers confirmed; the page address is from memory)',
});

/** The Last Glacial Maximum, about 26,500 to 19,000 years ago. The same entry as the built-in pack's `clark-2009`. */
export const CLARK_2009: Source = {
  id: 'clark-2009',
  cite: 'Clark, P. U., Dyke, A. S., Shakun, J. D., Carlson, A. E., Clark, J., Wohlfarth, B., Mitrovica, J. X., Hostetler, S. W. & McCabe, A. M. (2009). The Last Glacial Maximum. Science 325, 710-714.',
  doi: '10.1126/science.1172873',
  how: 'verified: https://pennds.org/archaeobib/items/show/26610',
};

/** The oldest dated ice, about 2.7 million years (Allan Hills blue ice). The same entry as the built-in pack's `yan-2019`. */
export const YAN_2019: Source = {
  id: 'yan-2019',
  cite: 'Yan, Y., Bender, M. L., Brook, E. J., Clifford, H. M., Kemeny, P. C., Kurbatov, A. V., Mackay, S., Mayewski, P. A., Ng, J., Severinghaus, J. P. & Higgins, J. A. (2019). Two-million-year-old snapshots of atmospheric gases from Antarctic ice. Nature 574, 663-666 (pages from memory).',
  doi: '10.1038/s41586-019-1692-3',
  how: 'verified: https://collaborate.princeton.edu/en/publications/two-million-year-old-snapshots-of-atmospheric-gases-from-antarcti; verified: Discover magazine report of the 2017 Goldschmidt announcement: https://www.discovermagazine.com/ancient-antarctic-ice-discovered-18047',
};

/** The orbital periods of the ice ages: near 100,000, 41,000-43,000, 23,000 and 19,000 years. The same entry as the built-in pack's `hays-1976`. */
export const HAYS_1976: Source = {
  id: 'hays-1976',
  cite: 'Hays, J. D., Imbrie, J. & Shackleton, N. J. (1976). Variations in the Earth\'s orbit: pacemaker of the ice ages. Science 194, 1121-1132.',
  doi: '10.1126/science.194.4270.1121',
  how: 'read in the source: spectral peaks at 42,000-43,000, 24,000 and 19,500 years and near 100,000 years (DOI from memory)',
};

/**
 * The first lasting ice sheet on Antarctica, at the Eocene-Oligocene boundary about 34 million years
 * ago: no ice on Earth today is older than that.
 */
export const ZACHOS_2001: Source = {
  id: 'zachos-2001',
  cite: 'Zachos, J., Pagani, M., Sloan, L., Thomas, E. & Billups, K. (2001). Trends, rhythms, and aberrations in global climate 65 Ma to present. Science 292, 686-693.',
  doi: '10.1126/science.1059412',
  how: 'from memory',
};

/** Every standard source, by id, for reporters and `firnline explain`. */
export const STANDARD_SOURCES: readonly Source[] = [NIST_SP_811, BP_CONVENTION, B2K_CONVENTION, LUTHI_2008, NOAA_2024, CLARK_2009, YAN_2019, HAYS_1976, ZACHOS_2001];
