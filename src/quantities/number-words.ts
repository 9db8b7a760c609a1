/**
 * Numbers written in words: "eight hundred thousand", "a million", "half a million",
 * "two and a half million", "a dozen", "twenty-one". A phrase is read left to right; a word that
 * cannot continue it ("two and three") ends the phrase there, so ranges in words still split.
 */

const SMALL: Record<string, number> = {
  zero: 0, one: 1, two: 2, three: 3, four: 4, five: 5, six: 6, seven: 7, eight: 8, nine: 9, ten: 10,
  eleven: 11, twelve: 12, thirteen: 13, fourteen: 14, fifteen: 15, sixteen: 16, seventeen: 17,
  eighteen: 18, nineteen: 19, twenty: 20, thirty: 30, forty: 40, fifty: 50, sixty: 60, seventy: 70,
  eighty: 80, ninety: 90,
};
const SCALES: Record<string, number> = { thousand: 1e3, million: 1e6, billion: 1e9 };
const FILLERS = ['a', 'an', 'and', 'half', 'hundred', 'dozen', 'point'];

/** Every word a number phrase may contain. */
export const NUMBER_WORDS: readonly string[] = [...Object.keys(SMALL), ...Object.keys(SCALES), ...FILLERS];

/** One phrase, as word tokens with their offsets. */
export interface WordToken {
  word: string;
  start: number;
  end: number;
}

/** A number read from the first tokens of a phrase: how many tokens it used and its value. */
export interface WordNumber {
  used: number;
  value: number;
}

/**
 * "two-eighty", "one-ninety", "four-twenty": a digit word and a tens word joined by a hyphen, as
 * people say a three-figure number aloud (280, 190, 420). The hyphen is kept in the token by the
 * caller; "twenty-one" (tens first) is not this form.
 */
function spokenHundreds(w: string): number | undefined {
  const parts = w.split('-');
  if (parts.length !== 2) return undefined;
  const [h, t] = parts.map((p) => SMALL[p]);
  return h !== undefined && t !== undefined && h >= 1 && h <= 9 && t >= 20 && t % 10 === 0 ? h * 100 + t : undefined;
}

const isScale = (w: string | undefined): boolean => w !== undefined && (w in SCALES || w === 'hundred' || w === 'dozen');

/**
 * Reads the longest number at the start of `tokens` (lower-case words), or undefined when they do not
 * start with one. Example: ["two", "and", "a", "half", "million"] → 2,500,000 using 5 tokens.
 */
export function readNumberWords(tokens: readonly string[]): WordNumber | undefined {
  let total = 0;
  let current = 0;
  let used = 0;
  let last: 'none' | 'small' | 'tens' | 'hundred' | 'scale' | 'half' | 'article' | 'and' = 'none';
  let any = false;
  // "nineteen thousand and eleven thousand": a scale no smaller than one already used ends the
  // number before its "and" (two numbers of a range), where "two thousand and five" goes on.
  let lastScale = Infinity;
  let beforeAnd: WordNumber | undefined;
  let hundredsBeforeAnd = 0;
  for (let i = 0; i < tokens.length; i++) {
    const w = tokens[i] as string;
    const spoken = spokenHundreds(w);
    if (spoken !== undefined) {
      // "two-eighty": a spoken three-figure number stands alone.
      if (last !== 'none') break;
      current = spoken;
      last = 'tens';
    } else if (w === 'point') {
      // "two point eight": digits after the point, one word each.
      const digits: number[] = [];
      for (let j = i + 1; j < tokens.length && (SMALL[tokens[j] as string] ?? 10) < 10; j++) digits.push(SMALL[tokens[j] as string] as number);
      if (digits.length === 0 || !(last === 'small' || last === 'tens')) break;
      current += Number(`0.${digits.join('')}`);
      any = true;
      used = i + 1 + digits.length;
      break;
    } else if (w in SMALL) {
      const n = SMALL[w] as number;
      const afterTens = last === 'tens' && n < 10 && n > 0;
      if (!(last === 'none' || last === 'hundred' || last === 'scale' || last === 'and' || afterTens)) break;
      if (last === 'and' && current === 0 && total === 0) break;
      current += n;
      last = n >= 20 ? 'tens' : 'small';
    } else if (w === 'a' || w === 'an') {
      // "a million", "half a million", "two and a half": an article only before a scale or "half".
      const next = tokens[i + 1];
      if (!(isScale(next) || next === 'half')) break;
      if (last === 'none') current = 1;
      last = 'article';
      continue;
    } else if (w === 'half') {
      const next = tokens[i + 1];
      if (last === 'none' && (next === 'a' || next === 'an') && isScale(tokens[i + 2])) current = 0.5;
      // "a million and a half": half of the scale just read; "two and a half": half of one.
      else if (last === 'article' && tokens[i - 2] === 'and' && current === 0 && lastScale !== Infinity) total += lastScale / 2;
      else if (last === 'article' && tokens[i - 2] === 'and') current += 0.5;
      else break;
      last = 'half';
    } else if (w === 'hundred' || w === 'dozen') {
      // "every hundred thousand years": a bare "hundred" before a scale is one hundred.
      const bareHundred = last === 'none' && w === 'hundred' && isScale(tokens[i + 1]);
      if ((last === 'none' && !bareHundred) || last === 'hundred' || last === 'and') break;
      // "nineteen hundred and twenty-one hundred": hundreds after hundreds start a number of their own.
      if (beforeAnd !== undefined && hundredsBeforeAnd >= 100) return beforeAnd;
      current = (current === 0 ? 1 : current) * (w === 'hundred' ? 100 : 12);
      last = 'hundred';
    } else if (w in SCALES) {
      if (last === 'none' || last === 'and') break;
      // "fifteen hundred and two thousand": a count of hundreds already as large as the scale is a
      // number of its own, where "a hundred and twenty thousand" is one.
      if ((SCALES[w] as number) >= lastScale || (beforeAnd !== undefined && hundredsBeforeAnd >= (SCALES[w] as number))) {
        if (beforeAnd !== undefined) return beforeAnd;
        break;
      }
      lastScale = SCALES[w] as number;
      total += (current === 0 ? 1 : current) * (SCALES[w] as number);
      current = 0;
      last = 'scale';
    } else if (w === 'and') {
      const next = tokens[i + 1];
      const nextNext = tokens[i + 2];
      const joinsHalf = (next === 'a' || next === 'an') && nextNext === 'half';
      if (!(last === 'hundred' || last === 'scale' || (joinsHalf && (last === 'small' || last === 'tens')))) break;
      beforeAnd = { used, value: total + current };
      hundredsBeforeAnd = current;
      last = 'and';
      continue;
    } else break;
    any = true;
    used = i + 1;
  }
  if (!any) return undefined;
  return { used, value: total + current };
}
