/**
 * scope.regional-event-as-global (session 17): a regional cold event of the deglaciation told as a
 * cooling of the whole planet. The globe must hold the cooling (a global word with a cool word after
 * it in its segment); a contrast sets the globe apart and passes. Sentences of our own.
 *
 * Sources: the Younger Dryas (about 12,900-11,700 years ago) cooled the North Atlantic region while
 * Antarctica warmed slightly, and the Antarctic Cold Reversal (about 14,700-13,000 years ago) cooled
 * the south while the north was warm: the bipolar seesaw (Pedro et al. 2016, Quat. Sci. Rev. 137,
 * 43-59, from memory); the global mean cooled only slightly in the Younger Dryas (Shakun et al. 2012,
 * Nature 484, 49-54).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const RULE = 'scope.regional-event-as-global';

async function rulesOf(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'draft.txt', packs });
  return result.flags.filter((f) => f.level === 'error' || f.level === 'warning').map((f) => f.ruleId);
}

describe('a regional cold event told as the globe\'s', () => {
  it.each([
    'In the Younger Dryas the entire planet sank back into glacial cold for about twelve centuries.',
    'The Antarctic Cold Reversal was a worldwide cooling that lasted almost two thousand years.',
    'Heinrich stadial 1 saw the whole Earth grow colder again before the thaw resumed.',
    'Around 13,000 years ago the globe turned cold once more, in the episode we call the Antarctic Cold Reversal.',
  ])('flags %s', async (sentence) => {
    expect(await rulesOf(sentence)).toContain(RULE);
  });
});

describe('a regional cold event with its own region, or the globe set apart', () => {
  it.each([
    'In the Younger Dryas the North Atlantic region sank back into glacial cold for about twelve centuries.',
    'The Younger Dryas chilled the north, while the globe as a whole cooled only slightly.',
    'During the Antarctic Cold Reversal the southern high latitudes cooled, but the whole planet kept warming.',
    'The Younger Dryas shows up in records from around the world.',
    // the globe after the cool word: whose temperature is meant is left open
    'The Younger Dryas cold reached parts of the world far from the Atlantic.',
    // a warming of the globe is no regional cold event told as global
    'The world warmed quickly after the Younger Dryas ended.',
  ])('leaves clean: %s', async (sentence) => {
    expect(await rulesOf(sentence)).not.toContain(RULE);
  });
});
