import { describe, expect, it } from 'vitest';
import { reviewClaims } from '../../src/review/review-claims.js';
import { wordingSimilarity } from '../../src/review/wording-similarity.js';
import { approve, makeClaim } from './make-claim.js';

// Sentences from an invented exhibition text of the Harrow Vale Science Museum (demo wording).
const F = 'drafts/ice-hall.md';
const span = makeClaim(F, 3, 'The Dome C core reaches back about 420,000 years.');
const rise = makeClaim(F, 5, 'CO2 rose from about 180 ppm to 280 ppm as the last ice age ended.');

describe('wordingSimilarity', () => {
  it.each([
    ['same words, one number changed', span.text, 'The Dome C core reaches back about 800,000 years.', 1],
    ['reflowed and recased', 'CO2 rose  from\nabout 180 ppm', 'co2 rose from about 180 ppm', 1],
    // 9 words and 10 words, 8 shared: 2·8 / 19
    ['one word swapped, one added', 'The Dome C core reaches back about 800,000 years.', 'The Dome C core reaches back nearly 800,000 calendar years.', 16 / 19],
    ['unrelated sentences', span.text, 'Warmer oceans hold less dissolved gas.', 0],
  ])('%s', (_name, a, b, score) => {
    expect(wordingSimilarity(a, b)).toBeCloseTo(score, 10);
  });
});

describe('reviewClaims', () => {
  it('marks a claim signed off when its id has a sign-off, and open otherwise', () => {
    const review = reviewClaims([span, rise], { file: 'l.yaml', signoffs: [approve(span)] });
    expect(review.claims.map((r) => [r.claim.id, r.status])).toEqual([
      [span.id, 'signed off'],
      [rise.id, 'open'],
    ]);
    expect(review.counts).toEqual({ 'signed off': 1, 'needs change': 0, stale: 0, open: 1 });
  });

  it('keeps a sign-off when the claim moved to another line: the id does not hold a line number', () => {
    const moved = makeClaim(F, 40, span.text);
    expect(reviewClaims([moved], { file: 'l.yaml', signoffs: [approve(span)] }).claims[0]?.status).toBe('signed off');
  });

  it('calls an edited claim stale and keeps the signed-off wording beside it', () => {
    const edited = makeClaim(F, 3, 'The Dome C core reaches back about 800,000 years.');
    const review = reviewClaims([edited, rise], { file: 'l.yaml', signoffs: [approve(span), approve(rise)] });
    expect(review.claims[0]).toMatchObject({ status: 'stale', signoff: { claim: span.id, text: span.text } });
    expect(review.counts).toEqual({ 'signed off': 1, 'needs change': 0, stale: 1, open: 0 });
  });

  it('does not call a claim stale after a sign-off in another file of the run, or after one its claim still carries', () => {
    const edited = makeClaim(F, 3, 'The Dome C core reaches back about 800,000 years.');
    const other = makeClaim('drafts/other.md', 1, 'Sea level stood lower in the last ice age.');
    const elsewhere = { ...approve(span), file: 'drafts/other.md' };
    expect(reviewClaims([edited, other], { file: 'l.yaml', signoffs: [elsewhere] }).claims[0]?.status).toBe('open');
    // A file that is not in the run any more was renamed or moved: its sign-offs follow the claims.
    expect(reviewClaims([edited], { file: 'l.yaml', signoffs: [elsewhere] }).claims[0]).toMatchObject({ status: 'stale', movedFrom: 'drafts/other.md' });
    expect(reviewClaims([edited, span], { file: 'l.yaml', signoffs: [approve(span)] }).claims[0]?.status).toBe('open');
  });

  it('gives one old sign-off to one edited claim only, the closest', () => {
    const close = makeClaim(F, 3, 'The Dome C core reaches back about 800,000 years.');
    const far = makeClaim(F, 9, 'The Dome C core reaches back nearly 800,000 calendar years.');
    const statuses = reviewClaims([far, close], { file: 'l.yaml', signoffs: [approve(span)] }).claims.map((r) => r.status);
    expect(statuses).toEqual(['open', 'stale']);
  });

  it('lets the latest entry for a claim count', () => {
    const later = { ...approve(span, 'J. Berg', '2025-03-01'), decision: 'waived' as const, reason: 'quoted to answer it' };
    expect(reviewClaims([span], { file: 'l.yaml', signoffs: [approve(span), later] }).claims[0]?.signoff).toEqual(later);
  });
});

describe('reviewClaims: sign-offs that survive harmless change (issue 15)', () => {
  // Invented panel text; the value is the accepted one (EPICA Dome C ~800,000 years: Jouzel et al. 2007, Science 317, 793).
  const TEXT = 'The Dome C core reaches back about 800,000 years – eight glacial cycles.';
  const old = makeClaim('drafts/hall.md', 3, TEXT);

  it('follows a renamed file and says where the sign-off came from', () => {
    const moved = makeClaim('drafts/exhibits/hall.md', 3, TEXT);
    expect(reviewClaims([moved], { file: 'l.yaml', signoffs: [approve(old)] }).claims[0]).toMatchObject({ status: 'signed off', movedFrom: 'drafts/hall.md' });
  });

  it('keeps a sign-off through a copy-edit, and reopens a meaning change with the words marked', () => {
    const edited = makeClaim('drafts/hall.md', 3, TEXT.replace(' – ', ' - '));
    expect(reviewClaims([edited], { file: 'l.yaml', signoffs: [approve(old)] }).claims[0]).toMatchObject({ status: 'signed off', copyEdited: true });
    const changed = makeClaim('drafts/hall.md', 3, TEXT.replace('about', 'nearly'));
    expect(reviewClaims([changed], { file: 'l.yaml', signoffs: [approve(old)] }).claims[0]).toMatchObject({
      status: 'stale',
      changes: 'The Dome C core reaches back [about → nearly] 800,000 years – eight glacial cycles.',
    });
  });

  it('lets one sign-off cover the same sentence in several files', () => {
    const twin = makeClaim('drafts/leaflet.md', 8, TEXT);
    const review = reviewClaims([old, twin], { file: 'l.yaml', signoffs: [approve(old)] });
    expect(review.claims.map((r) => [r.status, r.sharedWith])).toEqual([['signed off', undefined], ['signed off', 'drafts/hall.md']]);
  });

  it('keeps a needs-change comment until the claim changes, then calls it changed since', () => {
    const comment = { ...approve(old), decision: 'needs-change' as const, reason: 'Dome C spans 800,000 years but only about eight cycles are resolved' };
    expect(reviewClaims([old], { file: 'l.yaml', signoffs: [comment] }).counts).toMatchObject({ 'needs change': 1, 'signed off': 0 });
    const fixed = makeClaim('drafts/hall.md', 3, TEXT.replace('eight', 'about eight'));
    expect(reviewClaims([fixed], { file: 'l.yaml', signoffs: [comment] }).claims[0]).toMatchObject({ status: 'stale', signoff: comment });
  });
});
