/**
 * Finds the numbers in a sentence, before units: digits ("420,000", "8 × 10^5", "1.5 million"),
 * number words ("half a million"), vague magnitudes ("tens of thousands of") and multipliers
 * ("twice", "three-fold", "a third"). Overlaps go to the earliest, then the longest:
 * in "half a million", [half a million] wins over [half].
 */
import { findMultipliers } from './find-multipliers.js';
import { NUMBER_WORDS, readNumberWords } from './number-words.js';
import { halfPlace, halfPlaceOfValue } from './precision.js';

/** One number as written, with its value (scale applied) and its precision. */
export interface Atom {
  start: number;
  end: number;
  value: number;
  /** Half the last significant place, scale applied (0 for vague words and multipliers). */
  half: number;
  /** The value of a scale word ("thousand" → 1000), 1 when none. */
  scale: number;
  form: 'digits' | 'words' | 'vague' | 'multiplier';
  /** The interval-table row that reads it first: precision, multiplier-word or a vague row. */
  rule: string;
  /** A whole number of 3 or 4 digits with no separator, sign, exponent or scale: maybe a calendar year. */
  plainInteger: boolean;
  sign: '' | '+' | '-';
  /** Where a hedge written onto the digits starts ("420ish", "280-ish"); it ends with the atom. */
  glued?: number;
}

const SEP = String.raw`[,\u2009\u202F\u00A0 ]`;
const NUM = String.raw`\d{1,3}(?:${SEP}\d{3}(?!\d))+(?:\.\d+)?|\d+(?:\.\d+)?|\.\d+`;
const SUP = '⁰¹²³⁴⁵⁶⁷⁸⁹';
const EXP = String.raw`[eE](?<e1>[-−+]?\d{1,3})(?![\p{L}\p{N}])|[\s\u00A0]*[×xX*·][\s\u00A0]*10(?:[\s\u00A0]*\^[\s\u00A0]*(?<e2>[-−+]?\d{1,3})(?!\d)|(?<e3>[⁻⁺]?[${SUP}]{1,3})(?![${SUP}]))`;
const SCALE = String.raw`[\s\u00A0]+(?<scale>hundred|thousand|million|billion)(?![\p{L}])`;
/**
 * A scale letter written onto the digits, as people write figures in posts and notes: "45k" (a
 * thousand), "1.2M years" (a million). A capital K or M counts only before years: "5K" alone is
 * kelvin and "3 M" molar (NIST SP 811 symbols); "420kyr" and "2.6 Ma" are units, not scale letters.
 */
const LETTER_SCALE = String.raw`(?<letter>k|m(?=[\s\u00A0]*(?:years?|yrs?)(?![\p{L}])))(?![\p{L}\p{N}])`;
/** The case the pattern (case-blind) cannot tell: a lower-case k, or a capital K or M before years. */
const LETTER_OK = /^(?:k|[KMm][\s\u00A0]*(?:years?|yrs?)(?![\p{L}]))/u;
/** "420ish", "280-ish", "9-ish": an approximation written onto the number, as people write it in posts (common practice). */
const ISH = String.raw`(?<ish>-?ish(?![\p{L}\p{N}]))`;
const DIGITS = new RegExp(
  String.raw`(?<sign>(?<![\p{L}\p{N}.])[-−+])?(?<![\p{L}\p{N}_.])(?<num>${NUM})(?:${EXP})?(?:${SCALE}|${LETTER_SCALE})?${ISH}?`,
  'giu',
);
const WORD_PHRASE = new RegExp(
  String.raw`(?<![\p{L}\p{N}])(?:${NUMBER_WORDS.join('|')})(?:(?:[\s\u00A0]+|-)(?:${NUMBER_WORDS.join('|')}))*(?![\p{L}\p{N}])`,
  'giu',
);
const VAGUE = new RegExp(
  String.raw`(?<![\p{L}])(?:(?<plural>tens|hundreds|thousands|millions|dozens)[\s\u00A0]+of(?:[\s\u00A0]+(?<inner>thousands|millions)[\s\u00A0]+of)?|(?<few>a[\s\u00A0]+few|several|a[\s\u00A0]+couple(?:[\s\u00A0]+of)?)(?:[\s\u00A0]+(?<fewScale>hundred|thousand|million))?)(?=[\s\u00A0])`,
  'giu',
);
const SCALES: Record<string, number> = { hundred: 1e2, thousand: 1e3, million: 1e6, billion: 1e9, tens: 10, hundreds: 1e2, thousands: 1e3, millions: 1e6, dozens: 12 };
const LETTERS: Record<string, number> = { k: 1e3, m: 1e6 };
const SUPERSCRIPT: Record<string, string> = { '⁻': '-', '⁺': '+', ...Object.fromEntries([...SUP].map((c, i) => [c, String(i)])) };

function digitAtom(m: RegExpExecArray): Atom {
  const g = m.groups ?? {};
  const sign = g['sign'] === undefined ? '' : g['sign'] === '+' ? '+' : '-';
  const digits = (g['num'] ?? '').replace(/[^\d.]/g, '');
  const expText = g['e1'] ?? g['e2'] ?? [...(g['e3'] ?? '')].map((c) => SUPERSCRIPT[c] ?? '').join('');
  const exponent = expText === '' ? 0 : Number(expText.replace('−', '-'));
  // "5K" is kelvin, not a thousand: a scale letter the case-blind pattern took wrongly is left to the units.
  const letter = g['letter'] !== undefined && LETTER_OK.test(m.input.slice(m.index + m[0].length - 1)) ? g['letter'] : undefined;
  const ish = g['ish']?.length ?? 0;
  // A scale letter the units take back ("5K") stands before any glued hedge; then none is read.
  const dropped = g['letter'] !== undefined && letter === undefined;
  const end = m.index + m[0].length - (dropped ? 1 + ish : 0);
  const scale = g['scale'] !== undefined ? (SCALES[g['scale'].toLowerCase()] ?? 1) : letter !== undefined ? (LETTERS[letter.toLowerCase()] ?? 1) : 1;
  const magnitude = Number(digits) * 10 ** exponent * scale;
  const plainInteger = /^\d{3,4}$/.test(g['num'] ?? '') && expText === '' && scale === 1 && sign === '';
  return {
    start: m.index, end, value: sign === '-' ? -magnitude : magnitude,
    half: halfPlace(digits) * 10 ** exponent * scale, scale, form: 'digits', rule: 'precision', plainInteger, sign,
    ...(ish > 0 && !dropped ? { glued: end - ish } : {}),
  };
}

const DIGIT_WORDS = ['one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine'];
const TENS_WORDS = ['twenty', 'thirty', 'forty', 'fifty', 'sixty', 'seventy', 'eighty', 'ninety'];
/** "two-eighty": a digit word, a hyphen and a tens word (read by readNumberWords as 280). */
const spokenPair = (word: string): boolean => {
  const [a, b] = word.split('-');
  return DIGIT_WORDS.includes(a ?? '') && TENS_WORDS.includes(b ?? '');
};

function wordAtoms(m: RegExpExecArray): Atom[] {
  // "two-eighty" stays one token (a spoken 280); other hyphens split ("twenty-one").
  const tokens = [...m[0].matchAll(/\p{L}+(?:-\p{L}+)?/gu)]
    .flatMap((t) => {
      const at = m.index + t.index;
      const word = t[0].toLowerCase();
      if (!word.includes('-') || spokenPair(word)) return [{ word, start: at, end: at + t[0].length }];
      const cut = word.indexOf('-');
      return [{ word: word.slice(0, cut), start: at, end: at + cut }, { word: word.slice(cut + 1), start: at + cut + 1, end: at + t[0].length }];
    });
  const atoms: Atom[] = [];
  for (let i = 0; i < tokens.length; ) {
    const read = readNumberWords(tokens.slice(i).map((t) => t.word));
    const first = tokens[i];
    const last = tokens[i + (read?.used ?? 1) - 1];
    if (read === undefined || first === undefined || last === undefined) { i++; continue; }
    // A phrase ending in a scale word carries it, so "two and three million" can share it.
    const scale = SCALES[last.word] !== undefined && last.word !== 'hundred' ? (SCALES[last.word] as number) : 1;
    atoms.push({ start: first.start, end: last.end, value: read.value, half: halfPlaceOfValue(read.value), scale, form: 'words', rule: 'precision', plainInteger: false, sign: '' });
    i += read.used;
  }
  return atoms;
}

function vagueAtom(m: RegExpExecArray): Atom {
  const g = m.groups ?? {};
  const outer = g['plural'] ?? g['fewScale'];
  const s = (outer === undefined ? 1 : (SCALES[outer.toLowerCase()] ?? 1)) * (g['inner'] === undefined ? 1 : (SCALES[g['inner'].toLowerCase()] ?? 1));
  const few = g['few']?.toLowerCase().replace(/\s+/g, ' ');
  const rule = g['plural'] !== undefined ? 'plural-magnitude' : few === 'several' ? 'several' : few?.startsWith('a couple') === true ? 'a-couple' : 'a-few';
  return { start: m.index, end: m.index + m[0].length, value: s, half: 0, scale: s, form: 'vague', rule, plainInteger: false, sign: '' };
}

/**
 * A clock reading or a place in a recording: hours or minutes, a colon, two digits of minutes or
 * seconds ("at 6:30", "[21:17]", "1:02:45"), as ISO 8601 writes a time of day (hh:mm[:ss]). Its
 * digits count no amount of anything the sentence measures.
 */
const CLOCK = /(?<![\p{L}\p{N}.,:])\d{1,2}(?::[0-5]\d){1,2}(?![\p{N}]|[.,:]\d)/gu;
/**
 * The counter that opens a post of a thread ("12/ At 2.4 ppm a year", "5/12 Now it's ~424 ppm"):
 * a number and a slash, or a number out of a total, at the very start of the sentence and followed
 * by a space, as people number the posts of a thread in public (common practice). "1/2 of the
 * warming" is a fraction: a counter out of a total stands before a word that is not "of".
 */
const THREAD_COUNTER = /^[\s>*_-]*(?<n>\d{1,3})\/(?:(?<total>\d{1,3})(?=[\s\u00A0]+(?!of(?![\p{L}]))\S)|(?=[\s\u00A0]))/u;

/** The spans of `text` whose digits are labels, not numbers: clock readings and a thread's post counter. */
function labelSpans(text: string): { start: number; end: number }[] {
  const spans = [...text.matchAll(CLOCK)].map((m) => ({ start: m.index, end: m.index + m[0].length }));
  const counter = THREAD_COUNTER.exec(text);
  if (counter !== null) {
    const total = counter.groups?.['total'];
    if (total === undefined || Number(counter.groups?.['n']) <= Number(total)) spans.push({ start: counter.index, end: counter.index + counter[0].length });
  }
  return spans;
}

/** Every number in `text`, in order, without overlaps. */
export function findAtoms(text: string): Atom[] {
  const found: Atom[] = [
    ...findMultipliers(text),
    ...[...text.matchAll(DIGITS)].map(digitAtom),
    ...[...text.matchAll(VAGUE)].map(vagueAtom),
    ...[...text.matchAll(WORD_PHRASE)].flatMap(wordAtoms),
  ];
  // An exponent such as 8e300 written by mistake must not become Infinity in an interval.
  const labels = labelSpans(text);
  const finite = found.filter(
    (a) => Number.isFinite(a.value) && Number.isFinite(a.half) && Math.abs(a.value) < 1e15 && !labels.some((l) => a.start >= l.start && a.end <= l.end),
  );
  finite.sort((a, b) => a.start - b.start || b.end - a.end);
  const kept: Atom[] = [];
  for (const atom of finite) {
    const prev = kept[kept.length - 1];
    if (prev === undefined || atom.start >= prev.end) kept.push(atom);
  }
  return fractionsOfScales(text, kept);
}

/**
 * A fraction of a scale word, read as one number (common practice of English):
 *
 *   "around two-thirds of a million years ago"   "a quarter of a million years"
 *           ^^^^^^^^^^^^^^^^^^^^^^^^^ 666,667             ^^^^^^^^^^^^^^^^^^^^^^^ 250,000
 *
 * The fraction alone is a multiplier and "a million" a number of its own; read apart, the sentence
 * would state a million years. The whole is read to two digits of the scale, as "half a million" is.
 */
function fractionsOfScales(text: string, atoms: Atom[]): Atom[] {
  const out: Atom[] = [];
  for (let i = 0; i < atoms.length; i += 1) {
    const part = atoms[i] as Atom;
    const whole = atoms[i + 1];
    const joined =
      whole !== undefined &&
      part.form === 'multiplier' &&
      part.value > 0 &&
      part.value < 1 &&
      whole.form === 'words' &&
      whole.scale >= 1000 &&
      whole.value === whole.scale &&
      OF_ONE.test(text.slice(part.end, whole.start + 3));
    if (!joined) {
      out.push(part);
      continue;
    }
    out.push({ ...whole, start: part.start, value: part.value * whole.scale, half: whole.scale * 0.005 });
    i += 1;
  }
  return out;
}

/** What joins a fraction to the scale it is of: "of a", "of an", "of one". */
const OF_ONE = /^[\s\u00A0]+of[\s\u00A0]+(?:a|an|one)(?![\p{L}])/iu;
