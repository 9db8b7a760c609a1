/**
 * Whose claim a sentence makes (session 19): "One says ..." / "The other says ..." sets out one of
 * several voices; a predicate of rightness said of a person ("I think he's right", "proves her
 * right", "she's got a point") endorses the view reported of that person, but a question ("Is he
 * right?") endorses nothing; "worth saying that ..." is the writer's own; the conclusion drawn after
 * a supposed case ("..., and it didn't, so ...") is the writer's own; "how exactly" asks as "how"
 * does. English grammar, common practice; sentences of our own.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { compileLexicon, readSentence, stanceOf, type SentenceStance } from '../../src/propositions/index.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const stance = (text: string, next?: string): SentenceStance => {
  const lexicon = compileLexicon(packs);
  return stanceOf(readSentence(text, lexicon), next === undefined ? {} : { next: readSentence(next, lexicon) });
};

describe('voices and endorsements', () => {
  it.each([
    'One says the gas only ever followed the warmth, so it was a mere by-product.',
    'The other claims carbon dioxide did all the warming by itself.',
    'Another insists the orbit ended every glaciation alone.',
  ])('a pronoun of choice reporting a view: %s', (text) => {
    expect(stance(text).kind).toBe('reported');
  });

  it('a numeral before its noun is no voice', () => {
    expect(stance('One core shows carbon dioxide rising first.').kind).toBe('asserted');
  });

  it.each([
    "My aunt says the orbit did everything on its own, and frankly I reckon she's right.",
    'My old teacher always said carbon dioxide ended the glaciations single-handedly, and the new display proves him right.',
  ])('a person said to be right endorses the report: %s', (text) => {
    expect(stance(text)).toMatchObject({ kind: 'reported', endorsed: true });
  });

  it('the next sentence may endorse the report of a person', () => {
    expect(stance('My cousin says the gas simply tagged along behind the warming.', "Honestly, she's got a point.").endorsed).toBe(true);
  });

  it('a denied or asked rightness endorses nothing', () => {
    expect(stance('My aunt says the orbit did everything on its own, but she is not right.').endorsed).toBe(false);
    expect(stance('My cousin says the gas simply tagged along behind the warming.', 'Is she right?').endorsed).toBe(false);
  });

  it('"worth saying that" is the writer\'s own', () => {
    expect(stance('Also worth saying that warm seawater keeps more carbon dioxide than cold seawater.').kind).toBe('asserted');
  });

  it('the conclusion after a supposed case is the writer\'s own', () => {
    const text = 'If carbon dioxide had set off the thaws it would have risen first each time, and it did not, so the orbit did all of the work alone.';
    const s = stance(text);
    expect(s.kind).toBe('hypothetical');
    expect(s.viewEnd).toBe(text.indexOf('so the orbit'));
  });

  it('"how exactly" opens a rhetorical question', () => {
    expect(stance('If the warmth came first, how exactly is the gas supposed to have caused it?').kind).toBe('rhetorical');
  });
});

describe('the writer as the subject of a report verb (session 21)', () => {
  it.each([
    'In my own report I wrote that carbon dioxide alone ended the last glaciation.',
    'On my blog we argued that the orbit did all the work by itself.',
  ])('a possessive before the writer is no outside source: %s', (text) => {
    expect(stance(text).kind).toBe('asserted');
  });

  it.each([
    'My cousin wrote that carbon dioxide alone ended the last glaciation.',
    'In my street my neighbour insists the orbit did all the work.',
  ])('someone of the writer\'s circle still reports: %s', (text) => {
    expect(stance(text).kind).toBe('reported');
  });
});
