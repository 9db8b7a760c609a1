/**
 * Scope and direction claims that the words around them used to hide (session 14). Sentences of our
 * own, each cause in several wordings, with correct look-alikes that must stay clean:
 * - a contrast word far from the record and the globe ("..., so I'd put 9 on the poster, not 6"), a
 *   "but" opening the sentence, or the "together" of two curves moving as one no longer sets a
 *   record apart from the globe (scope.regional-record-as-global);
 * - a phrasal denial with its object inside ("doesn't rule CO2 out") is read as a denial, so its
 *   negation leaves the cause open, not ruled out (logic.lag-rules-out-cause);
 * - the Southern Hemisphere told as warming after CO2 (direction.southern-warming-not-behind-co2);
 * - a cooling ocean told as giving up "more and more of its" CO2 (direction.co2-solubility-falls-with-warming);
 * - a block quote opened by a thread byline with a display name and a handle is a reply, not a quotation.
 *
 * Sources: an Antarctic or Greenland core records local temperature; polar swings are about 1.5-2
 * times the global mean (Jouzel et al. 2007, Science 317, 793-796; Tierney et al. 2020, Nature 584,
 * 569-573). Southern Hemisphere temperature rose before CO2 in the last deglaciation while global
 * temperature generally lagged CO2 (Shakun et al. 2012, Nature 484, 49-54, Figure 2b). CO2 is less
 * soluble in warmer water, so a cooling ocean takes CO2 up (Weiss 1974, Marine Chemistry 2, 203-215).
 * A lag of CO2 behind Antarctic temperature does not rule CO2 out as an amplifier (Shakun et al. 2012;
 * Masson-Delmotte et al. 2013, IPCC AR5 WGI chapter 5).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

async function rulesOf(text: string, path = 'draft.txt'): Promise<string[]> {
  const result = await checkText(text, { path, packs });
  return result.flags.filter((f) => f.level === 'error' || f.level === 'warning').map((f) => f.ruleId);
}

const SCOPE = 'scope.regional-record-as-global';

describe('a record read as the globe, whatever contrast words stand elsewhere', () => {
  it.each([
    'The Antarctic ice core shows the whole planet was about 9 degrees colder, so I would print 9 on the leaflet, not 6.',
    'Sorry, but the Vostok core shows the planet swinging by ten degrees, long before anyone drove a car.',
    'But the EPICA core tells us the whole Earth cooled by ten degrees.',
    'Since Dome C records the temperature of the whole planet, global temperature and CO2 must have moved together.',
    'Because Vostok records global temperature, the planet and CO2 rose together.',
    'Yet the Dome C record shows the entire globe was 9 °C colder, and that is the figure we will use only once.',
  ])('flags: %s', async (sentence) => {
    expect(await rulesOf(sentence)).toContain(SCOPE);
  });
  it.each([
    'The Vostok core shows Antarctic temperature swinging by ten degrees, while the planet as a whole swung by about five.',
    'The Vostok core records Antarctic temperature, not the temperature of the whole planet.',
    'The Vostok core shows Antarctica swinging by ten degrees, but the whole planet changed by only about five.',
    'Antarctica and Greenland together show how the whole planet cooled by 6 degrees.',
    'Global temperature and CO2 moved together over the last 800,000 years.',
    'CO2 and temperature rose together at the end of the last ice age.',
  ])('leaves clean: %s', async (sentence) => {
    expect(await rulesOf(sentence)).not.toContain(SCOPE);
  });
  it('flags the globe nearest the record when a sentence runs over two lines', async () => {
    const text = 'the global temperature at the glacial maximum was around 6 °C lower than now which is wild\nthe museum calls EPICA Dome C a thermometer for the whole planet\n';
    const result = await checkText(text, { path: 'post.txt', packs });
    const flag = result.flags.find((f) => f.ruleId === SCOPE);
    expect(flag?.span.start.line).toBe(2);
  });
});

describe('a phrasal denial with its object inside it', () => {
  const LAG = 'logic.lag-rules-out-cause';
  it.each([
    'A small Antarctic lead for temperature does not rule CO2 out as a cause, because CO2 amplifies the warming once it starts.',
    'The lag doesn’t rule the gas out as a driver of the warming.',
    'The lag does not rule out CO2 as a cause.',
  ])('leaves clean: %s', async (sentence) => {
    expect(await rulesOf(sentence)).not.toContain(LAG);
  });
  it.each([
    'The lag rules CO2 out as a cause of the warming.',
    'Since CO2 lagged temperature, you can rule the gas out as the cause of the warming.',
    'CO2 lagged temperature by 800 years, which rules it out as the driver.',
  ])('flags: %s', async (sentence) => {
    expect(await rulesOf(sentence)).toContain(LAG);
  });
});

describe('the Southern Hemisphere told as warming after CO2', () => {
  const FACT = 'direction.southern-warming-not-behind-co2';
  it.each([
    'In the 2012 compilation, the Southern Hemisphere warmed after CO2, the Northern Hemisphere before.',
    'In the Southern Hemisphere, CO2 rose first and temperature followed.',
    'Temperatures in the southern hemisphere only climbed once CO2 had started rising.',
  ])('flags: %s', async (sentence) => {
    expect(await rulesOf(sentence)).toContain(FACT);
  });
  it.each([
    'The Southern Hemisphere warmed before CO2 began to rise.',
    'Southern Hemisphere temperatures started climbing ahead of CO2.',
    'Global temperature lagged CO2, while the Southern Hemisphere warmed first.',
    'The Northern Hemisphere warmed after CO2.',
  ])('leaves clean: %s', async (sentence) => {
    expect(await rulesOf(sentence)).not.toContain(FACT);
  });
});

describe('a cooling ocean told as giving CO2 up', () => {
  const FACT = 'direction.co2-solubility-falls-with-warming';
  it.each([
    'As the oceans cooled, they released more and more of their carbon dioxide into the air.',
    'As the seas cooled, they gave up more and more of their CO2.',
    'The cooling ocean released more and more carbon dioxide.',
  ])('flags: %s', async (sentence) => {
    expect(await rulesOf(sentence)).toContain(FACT);
  });
  it.each([
    'As the oceans warmed, they released more and more of their carbon dioxide into the air.',
    'As the seas cooled they took up more and more of the carbon dioxide in the air.',
    'Warmer water holds less CO2.',
    'The cooling ocean gave up less and less of its CO2.',
  ])('leaves clean: %s', async (sentence) => {
    expect(await rulesOf(sentence)).not.toContain(FACT);
  });
});

describe('a reply in a thread, opened by a display name and a handle', () => {
  const FACT = 'direction.antarctic-warming-not-behind-co2';
  it('holds the reply as its writer’s own claim', async () => {
    const text = 'Thread\n\n> **Rowan Pike** @rowan_pike · 4h\n> At the end of the last ice age CO2 clearly rose first and Antarctica warmed afterwards.\n';
    expect(await rulesOf(text, 'thread.md')).toContain(FACT);
  });
  it('still reads a block quote with no byline as a quotation', async () => {
    const text = 'Thread\n\n> At the end of the last ice age CO2 clearly rose first and Antarctica warmed afterwards.\n';
    expect(await rulesOf(text, 'thread.md')).not.toContain(FACT);
  });
});

describe('a bare answer under a question that offers a comparison', () => {
  // The air in a bubble is younger than the ice around it: bubbles close only at the base of the
  // firn, tens of metres down (Caillon et al. 2003, Science 299, 1728-1731; common practice of
  // ice-core dating, the gas-age/ice-age difference).
  const FACT = 'direction.trapped-air-younger-than-ice';
  it.each([
    '**3. Is the air in an ice-core bubble younger or older than the ice around it?**\n\n**Older.** It gets sealed in first and the snow piles up on top later.\n',
    'Q: Is the air in an ice-core bubble older or younger than the surrounding ice?\nA: Older, of course.\n',
    'Quiz: is the air trapped in an ice-core bubble older than the ice that holds it?\n\nOlder.\n',
  ])('flags the answer: %s', async (text) => {
    const result = await checkText(text, { path: 'quiz.md', packs });
    const answer = result.flags.find((f) => f.ruleId === FACT && f.level === 'warning');
    expect(answer?.span.start.line).toBeGreaterThan(1);
  });
  it.each([
    '**3. Is the air in an ice-core bubble younger or older than the ice around it?**\n\n**Younger.** The bubbles close off only deep in the firn.\n',
    'Q: Is the air in an ice-core bubble older or younger than the surrounding ice?\nA: Younger, by centuries or more.\n',
  ])('leaves a right answer clean: %s', async (text) => {
    expect(await rulesOf(text, 'quiz.md')).not.toContain(FACT);
  });
});
