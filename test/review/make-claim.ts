import { claimIdOf } from '../../src/review/claim-id.js';
import type { SignoffEntry } from '../../src/review/signoff-entry.js';
import type { Claim } from '../../src/types.js';

/** A hand-made claim on one line of a draft (review code reads id, file, span lines and text only). */
export function makeClaim(file: string, line: number, text: string, extra: Partial<Claim> = {}): Claim {
  const point = (column: number) => ({ line, column, offset: 0 });
  return {
    id: claimIdOf(file, text),
    file,
    span: { start: point(1), end: point(text.length + 1) },
    text,
    heading: '',
    quantities: [],
    bindings: [],
    verdict: 'no reference',
    flags: [],
    ...extra,
  };
}

/** An approval of `claim` as it reads now. */
export function approve(claim: Claim, reviewer = 'R. Okafor', date = '2025-02-11T10:00:00Z'): SignoffEntry {
  return { claim: claim.id, file: claim.file, text: claim.text, decision: 'approved', reviewer, date, packVersion: 'paleoclimate 1.0.0' };
}
