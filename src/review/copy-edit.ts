/**
 * The wording of a claim with copy-edits that change no meaning folded away, so that a sign-off
 * survives them: case, white space, dash and quote styles, subscript digits, digit-group
 * separators and British/American spelling pairs. Every other word stays as written, so a change
 * of a number, a unit, a direction word, a negation or a hedge still gives a different wording.
 *
 *   canonicalWording('Sea level was about 120 metres lower – “at least”.')
 *     === canonicalWording('sea level was about 120 meters lower - "at least".')
 */

/** Dashes and minus signs of every style → `-`, with the spaces around them dropped. */
const DASHES = /\s*[-‐‑‒–—―−]+\s*/gu;
const DOUBLE_QUOTES = /[“”„‟«»″"]/gu;
const SINGLE_QUOTES = /[‘’‚‛′`]/gu;
const SUBSCRIPT_DIGITS = /[₀-₉]/gu;
/** A thousands separator between digit groups: "420,000", "420 000" (also no-break and thin spaces). */
const DIGIT_GROUP = /(\d)[,\u00a0\u2009\u202f ](?=\d{3}(?!\d))/gu;

/**
 * British spellings → American ones, one pair per line; both sides of a comparison are folded the
 * same way, so the direction does not matter. Common practice pairs of science writing; a pair is
 * added here only when neither spelling is another word.
 */
const SPELLING_PAIRS: readonly (readonly [string, string])[] = [
  ['metre', 'meter'], ['metres', 'meters'], ['kilometre', 'kilometer'], ['kilometres', 'kilometers'],
  ['centimetre', 'centimeter'], ['centimetres', 'centimeters'], ['millimetre', 'millimeter'], ['millimetres', 'millimeters'],
  ['litre', 'liter'], ['litres', 'liters'], ['centre', 'center'], ['centres', 'centers'],
  ['colour', 'color'], ['colours', 'colors'], ['behaviour', 'behavior'], ['favour', 'favor'],
  ['grey', 'gray'], ['sulphur', 'sulfur'], ['aluminium', 'aluminum'], ['per cent', 'percent'],
  ['modelling', 'modeling'], ['modelled', 'modeled'], ['labelled', 'labeled'], ['travelled', 'traveled'],
  ['analyse', 'analyze'], ['analysed', 'analyzed'], ['paleoclimate', 'palaeoclimate'],
  ['paleoclimatology', 'palaeoclimatology'], ['paleoclimatic', 'palaeoclimatic'],
  ['oesophagus', 'esophagus'], ['judgement', 'judgment'], ['programme', 'program'], ['defence', 'defense'],
];

/** -ise/-isation verbs and nouns, folded to -ize/-ization ("stabilise" = "stabilize"). */
const ISE = /\b([a-z]{3,}i)s(e|es|ed|ing|ation|ations)\b/gu;
const ISE_WORDS = new Set(['stabil', 'emphas', 'recogn', 'character', 'summar', 'organ', 'real', 'minim', 'maxim', 'normal', 'synchron', 'categor', 'optim', 'crystall', 'standard', 'general', 'util', 'visual', 'author', 'mobil']);

const PAIRS = new Map<string, string>();
for (const [british, american] of SPELLING_PAIRS) {
  // "paleoclimate" and "palaeoclimate" both fold to the shorter spelling.
  const canonical = american.length <= british.length ? american : british;
  PAIRS.set(british, canonical);
  PAIRS.set(american, canonical);
}
const PAIR_WORDS = new RegExp(`\\b(${[...PAIRS.keys()].sort((a, b) => b.length - a.length).join('|')})\\b`, 'gu');

/** The wording with meaning-free copy-edits folded away (see the module comment). */
export function canonicalWording(text: string): string {
  return text
    .normalize('NFKC')
    .toLowerCase()
    .replace(SUBSCRIPT_DIGITS, (d) => String(d.charCodeAt(0) - 0x2080))
    .replace(DOUBLE_QUOTES, '"')
    .replace(SINGLE_QUOTES, "'")
    .replace(DIGIT_GROUP, '$1')
    .replace(DASHES, '-')
    .replace(/\s+/gu, ' ')
    .replace(PAIR_WORDS, (w) => PAIRS.get(w) ?? w)
    .replace(ISE, (whole, stem: string, ending: string) => (ISE_WORDS.has(stem.slice(0, -1)) ? `${stem}z${ending}` : whole))
    .trim();
}

/** True when two wordings differ by copy-edits only. */
export function isCopyEdit(a: string, b: string): boolean {
  return canonicalWording(a) === canonicalWording(b);
}
