/**
 * The tense of the verb that tells a figure (src/claims/told-in-past.ts figureToldInPast): the last
 * finite verb before it, a participle after a comma describing its noun, the present perfect running
 * up to today (common practice of English grammar). Sentences are our own.
 */
import { describe, expect, it } from 'vitest';
import { figureToldInPast } from '../../src/claims/told-in-past.js';

const at = (s: string, figure: string) => s.indexOf(figure);

describe('the tense a figure is told in', () => {
  it.each([
    ['The first core covered only about 150,000 years.', '150,000'],
    ['The team was sure the ice held 500,000 years.', '500,000'],
    ['Back then the record went back some 200,000 years.', '200,000'],
  ])('%j is told in the past', (s, figure) => expect(figureToldInPast(s, at(s, figure))).toBe(true));

  it.each([
    ['The record goes back some 200,000 years.', '200,000'],
    ['The record has reached back 200,000 years.', '200,000'],
    ['The core, drilled in the 1990s, holds 200,000 years.', '200,000'],
    ['A record of 200,000 years.', '200,000'],
  ])('%j is told as it stands', (s, figure) => expect(figureToldInPast(s, at(s, figure))).toBe(false));
});
