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

/** Every standard source, by id, for reporters and `firnline explain`. */
export const STANDARD_SOURCES: readonly Source[] = [NIST_SP_811, BP_CONVENTION, B2K_CONVENTION];
