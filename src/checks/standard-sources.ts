/**
 * The published definitions the unit checks cite. Recalled, not re-read for this release: each
 * says so in `how`, and an editor should open the link before relying on it.
 */
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
export const LUTHI_2008: Source = {
  id: 'luthi-2008',
  cite: 'Lüthi, D., Le Floch, M., Bereiter, B., Blunier, T., Barnola, J.-M., Siegenthaler, U., Raynaud, D., Jouzel, J., Fischer, H., Kawamura, K. & Stocker, T. F. (2008). High-resolution carbon dioxide concentration record 650,000-800,000 years before present. Nature 453, 379-382.',
  doi: '10.1038/nature06949',
  how: 'verified: http://www.nature.com/nature/journal/v453/n7193/abs/nature06949.html; verified: http://go.galegroup.com/ps/i.do?id=GALE%7CA183367808&v=2.1&u=vol_f162hs&it=r&p=PPGS&sw=w&asid=035b1391b51b7c8153eda3db4b23ea4e',
};

/** A modern CO2 level (global mean 419.3 ppm in 2023). The same entry as the built-in pack's `noaa-research-2024`. */
export const NOAA_2024: Source = {
  id: 'noaa-research-2024',
  cite: 'NOAA Research (2024-04-05). No sign of greenhouse gases increases slowing in 2023 (press release; global mean 419.3 ppm) - read via secondary news reports.',
  url: 'https://www.ciphernews.com/hot-take/419-3-ppm/',
  how: 'verified: https://www.ciphernews.com/hot-take/419-3-ppm/; verified: https://headtopics.com/us/greenhouse-gas-levels-continue-to-rise-in-2023-noaa-reports-50451425',
};

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

/** Every standard source, by id, for reporters and `firnline explain`. */
export const STANDARD_SOURCES: readonly Source[] = [NIST_SP_811, BP_CONVENTION, B2K_CONVENTION, LUTHI_2008, NOAA_2024, CLARK_2009, YAN_2019];
