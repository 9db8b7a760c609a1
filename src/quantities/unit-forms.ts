/**
 * Helpers that turn the written forms of units into regular-expression sources. Forms are matched
 * case-sensitively, because case carries meaning in symbols (K is kelvin, k is thousand; Ma is a
 * date, m is metres); word forms are made caseless letter by letter with `words()`.
 */

/**
 * A caseless source for a word pattern: each letter becomes `[xX]`, each space any run of white
 * space (including no-break spaces). Regular-expression syntax (`?`, `(?:...)`, `|` and escapes) passes through.
 */
export function words(pattern: string): string {
  return pattern
    .replace(/\\.|\p{L}/gu, (c) => {
      if (c.startsWith('\\')) return c;
      const lower = c.toLowerCase();
      const upper = c.toUpperCase();
      return lower === upper ? c : `[${lower}${upper}]`;
    })
    .replace(/ /g, String.raw`[\s\u00A0\u202F]+`);
}

/** A case-sensitive source for a symbol pattern: spaces become optional white space. */
export function symbol(pattern: string): string {
  return pattern.replace(/ /g, String.raw`[\s\u00A0\u202F]*`);
}

/** "years", "yrs", "year", "yr": the year word in every form the draft may use. */
export const YEAR_WORD = words('(?:years?|yrs?)');

/** The Latin annum symbol `a`, accepted only when nothing word-like follows ("800 a." not "800 a year"). */
export const ANNUM = String.raw`a(?=[\s\u00A0]*(?:[.,;:)\]]|$))`;

/** What may stand between a number and its unit: nothing, white space, or a hyphen ("800,000-year"). */
export const NUMBER_UNIT_GAP = String.raw`(?:-|[\s\u00A0\u202F]*)`;

/** The end of a unit: no letter or digit may follow ("m" must not be the start of "march"). */
export const UNIT_END = String.raw`(?![\p{L}\p{N}])`;
