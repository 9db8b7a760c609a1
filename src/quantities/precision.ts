/**
 * Half a unit in the last significant place of a number as written: the `h` of the precision row
 * of the interval table. A whole number's trailing zeros are ambiguous; we read it to at least its
 * second digit, so "800,000" is ±5,000 and "5" is ±0.5 (see the precision row in interval-rules.ts).
 */

/** `h` for plain digits (no sign, no separators), e.g. "420000" → 5000, "0.25" → 0.005, "5" → 0.5. */
export function halfPlace(digits: string): number {
  const dot = digits.indexOf('.');
  if (dot >= 0) return 0.5 * 10 ** -(digits.length - dot - 1);
  const whole = digits.replace(/^0+(?=\d)/, '');
  const trailingZeros = whole.length - whole.replace(/0+$/, '').length;
  return 0.5 * 10 ** Math.max(0, Math.min(trailingZeros, whole.length - 2));
}

/** `h` for a number known only by its value (number words): its shortest decimal writing. */
export function halfPlaceOfValue(value: number): number {
  const abs = Math.abs(value);
  const written = Number.isInteger(abs) ? abs.toFixed(0) : String(abs);
  return written.includes('e') ? 0.5 : halfPlace(written);
}
