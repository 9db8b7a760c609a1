/**
 * The words that read a record as something ("shows", "tells us", "is a measure of") are the pack
 * lexicon's `reading` words (session 17; a regular expression in detect-scope.ts before). The lexicon
 * derives every inflection itself, so an irregular form ("told", "gave", "shown") needs no
 * compromise root, and "gas" is never read as a form of "give". Sentences of our own.
 *
 * Sources: Antarctic glacial-interglacial swings of about 8-10 °C (Jouzel et al. 2007, Science 317,
 * 793-796); the global LGM cooling about 5-7 °C (Tierney et al. 2020, Nature 584, 569-573), so an
 * Antarctic swing read as the globe's is a scope error.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { compileLexicon, phraseWords } from '../../src/propositions/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const RULE = 'scope.regional-record-as-global';

async function rulesOf(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'draft.txt', packs });
  return result.flags.filter((f) => f.level === 'error' || f.level === 'warning').map((f) => f.ruleId);
}

describe('the lexicon\'s reading words', () => {
  const lexicon = compileLexicon(packs);
  const reads = (text: string) => lexicon.find(phraseWords(text)).some((h) => h.cls === 'reading');
  it.each(['told', 'gave', 'shown', 'showed', 'traced', 'plotted', 'histories', 'was'])('holds the form "%s"', (form) => {
    expect(reads(form)).toBe(true);
  });
  it.each(['gas', 'gases', 'showcase', 'warmed', 'colder'])('holds no "%s"', (word) => {
    expect(reads(word)).toBe(false);
  });
});

describe('a record read as the globe through a reading word', () => {
  it.each([
    'The Talos Dome core told researchers that the whole planet warmed by some 9 °C.',
    'The EDML record gave the world a glacial cooling of about 9 °C.',
    'What the Dome Fuji ice has shown is that the globe swung by 8 to 10 °C every cycle.',
    'Work on the NEEM core showed that the whole world was some 20 °C colder at the glacial maximum.',
  ])('flags %s', async (sentence) => {
    expect(await rulesOf(sentence)).toContain(RULE);
  });
  it.each([
    // a contrast still sets them apart
    'The Talos Dome core told researchers that Antarctica warmed by some 9 °C, more than the globe did.',
  ])('leaves clean: %s', async (sentence) => {
    expect(await rulesOf(sentence)).not.toContain(RULE);
  });
});
