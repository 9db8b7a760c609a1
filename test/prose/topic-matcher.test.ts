import { describe, expect, it } from 'vitest';
import { createTopicMatcher } from '../../src/prose/index.js';

describe('createTopicMatcher', () => {
  const topic = createTopicMatcher(['CO2', 'CO₂', 'carbon dioxide', 'ice core', 'Vostok']);

  it.each([
    ['Atmospheric CO2 rose.', true],
    ['Atmospheric CO₂ rose.', true],
    ['The carbon\ndioxide level', true],
    ['An ICE CORE from Vostok', true],
    ['CO2-rich air', true],
    ['The CO20 form is unrelated', false],
    ['Nothing about the subject here.', false],
    ['', false],
  ])('%j → %s', (text, expected) => {
    expect(topic.test(text)).toBe(expected);
  });

  it('matches nothing when there are no topic words', () => {
    expect(createTopicMatcher([]).test('CO2')).toBe(false);
  });

  it('treats pack words as literal text, not as patterns', () => {
    expect(createTopicMatcher(['a.c']).test('abc')).toBe(false);
    expect(createTopicMatcher(['a.c']).test('the a.c value')).toBe(true);
  });
});
