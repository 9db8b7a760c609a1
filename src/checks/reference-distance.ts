/** How far a claimed interval lies outside a reference range (shared by the reference check and its unit slips). */
import type { ReferenceValue } from '../rulepack/types.js';

/**
 * How far a claim lies outside a reference range, relative to the range's magnitude:
 * 0 when they overlap; `gap / max(|low|, |high|, high - low)` otherwise.
 */
export function relativeDistance(low: number, high: number, r: Pick<ReferenceValue, 'low' | 'high'>): number {
  const gap = Math.max(r.low - high, low - r.high, 0);
  if (gap === 0) return 0;
  const scale = Math.max(Math.abs(r.low), Math.abs(r.high), r.high - r.low);
  return scale === 0 ? Infinity : gap / scale;
}
