/**
 * Numbers with thousands separators, as `Intl.NumberFormat('en-US' or 'en-GB', {
 * maximumFractionDigits })` writes them, without starting ICU for the numbers a report holds.
 *
 * The first `Intl.NumberFormat` a process makes loads ICU's locale and number data: 45 to 85 ms of
 * a 2 KB `check` on our shared machine, for numbers such as 204, 0.8 or 21,000 whose digits
 * JavaScript already has. ICU writes a double from its shortest round-trip decimal (the digits
 * `String(x)` gives), rounded half away from zero to the fraction digits asked for, with a comma
 * every three digits of the whole part (both English locales, grouping from four digits) and a
 * hyphen-minus before a negative number. So where those digits need no rounding (or, with no
 * fraction digits, only the whole part's first digit after the point decides), the answer is
 * written here; every other number (exponent notation, more fraction digits than allowed, a
 * negative number that rounds to zero, -0, not finite, past 2^53) goes to the Intl formatter
 * itself, made on first use. test/format/grouped-number.test.ts compares both on a large sample.
 */

/** The whole-number digits `digits` with a comma every three from the right: "1234567" → "1,234,567". */
function withCommas(digits: string): string {
  if (digits.length <= 3) return digits;
  let out = digits.slice(0, ((digits.length - 1) % 3) + 1);
  for (let i = out.length; i < digits.length; i += 3) out += `,${digits.slice(i, i + 3)}`;
  return out;
}

/** The decimal digits string `digits` plus one ("199" → "200", "9" → "10"). */
function plusOne(digits: string): string {
  let i = digits.length - 1;
  while (i >= 0 && digits[i] === '9') i -= 1;
  if (i < 0) return `1${'0'.repeat(digits.length)}`;
  return `${digits.slice(0, i)}${String.fromCharCode(digits.charCodeAt(i) + 1)}${'0'.repeat(digits.length - i - 1)}`;
}

/**
 * `value` as the English Intl formatter with `maximumFractionDigits` writes it, or undefined when
 * the formatter must be asked (see the module comment).
 */
export function groupedWithoutIntl(value: number, maximumFractionDigits: number): string | undefined {
  if (!Number.isFinite(value) || value === 0 || Math.abs(value) >= 2 ** 53) return value === 0 && !Object.is(value, -0) ? '0' : undefined;
  const negative = value < 0;
  const text = String(negative ? -value : value);
  if (text.includes('e')) return undefined;
  const point = text.indexOf('.');
  let whole = point < 0 ? text : text.slice(0, point);
  let fraction = point < 0 ? '' : text.slice(point + 1);
  if (fraction.length > maximumFractionDigits) {
    if (maximumFractionDigits !== 0 || negative) return undefined;
    // Half away from zero, on the shortest decimal: only its first fraction digit decides.
    if (fraction.charCodeAt(0) >= 0x35) whole = plusOne(whole);
    fraction = '';
  }
  return `${negative ? '-' : ''}${withCommas(whole)}${fraction === '' ? '' : `.${fraction}`}`;
}

/** A formatter with Intl.NumberFormat's `format`, which makes the Intl one only for the numbers it must. */
export interface GroupedNumberFormat {
  format(value: number): string;
}

/** The `locale` ('en-US' or 'en-GB') number formatter with `maximumFractionDigits`, ICU loaded only if needed. */
export function groupedNumberFormat(locale: 'en-US' | 'en-GB', maximumFractionDigits: number): GroupedNumberFormat {
  let intl: Intl.NumberFormat | undefined;
  return {
    format(value) {
      const plain = groupedWithoutIntl(value, maximumFractionDigits);
      if (plain !== undefined) return plain;
      intl ??= new Intl.NumberFormat(locale, { maximumFractionDigits });
      return intl.format(value);
    },
  };
}
