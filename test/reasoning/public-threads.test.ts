/**
 * Claims as people write them in public threads, comment sections and group chats (session 14):
 * the record's figure handed to the globe in the next post ("So the planet as a whole was roughly
 * 20 degrees colder"), a discourse "but" that answers another poster ("Fair enough, but ..."), a
 * figure corrected at the end ("..., not 6"), a closing "that's what the Greenland cores show", a
 * tag question ("..., isn't it?"), the apostrophe left out ("thats", "cant"), the either/or frame
 * standing alone as a reply ("It can't be both."). Each wording has a correct look-alike that must
 * stay clean. Posts of our own invention.
 *
 * Sources: Greenland summit about 20 °C and Antarctica about 8-10 °C colder at the LGM, against a
 * global cooling of about 6 °C (Tierney et al. 2020, Nature 584, 569-573; Jouzel et al. 2007,
 * Science 317, 793-796; Buizert et al. 2021, Science 372, 1097-1101); CO2 and temperature each drove
 * the other in the glacial cycles (Shakun et al. 2012, Nature 484, 49-54; Masson-Delmotte et al.
 * 2013, IPCC AR5 WGI chapter 5).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

async function rulesOf(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'thread.txt', packs });
  return result.flags.filter((f) => f.level === 'error' || f.level === 'warning').map((f) => f.ruleId);
}

const SCOPE = 'scope.regional-record-as-global';
const EITHER_OR = 'logic.either-or-causation';

describe('a regional record read as the globe, as posters write it', () => {
  it.each([
    // The record's own figure handed to the globe in the next post, in two voices and wordings.
    'Greenland ice ran about 20-odd degrees colder at the LGM, I am fairly sure.\nSo the planet as a whole was roughly 20 degrees colder, which is why we answered 20.',
    'Wren: at the end of the Younger Dryas Greenland warmed by ~10°C in a few decades\nWren: so basically the whole world jumped 10 degrees in one lifetime. wild',
    // A discourse "but" answering another poster.
    'Fair enough, but the Greenland cores show the planet was over 20 degrees colder at the height of the ice age.',
    'Sorry but the Vostok core shows the planet\'s temperature swinging by ten degrees.',
    // A figure corrected at the end.
    'The Antarctic ice core shows the whole planet was about 9 degrees colder, so I would write 9 on the board not 6.',
    // The record read in a closing clause that points back.
    'At the end of the Younger Dryas the whole planet jumped about 10°C in a few decades, that\'s what the Greenland cores show.',
    // A tag question holds its statement.
    'That Vostok temperature curve is the whole planet\'s temperature, near enough, isn\'t it?',
    // The apostrophe left out.
    'ok but Antarctica warmed like 10°C at the end of the ice age so thats how much the whole planet warmed',
  ])('flags: %s', async (text) => {
    expect(await rulesOf(text)).toContain(SCOPE);
  });

  it.each([
    // The globe given its own, smaller figure in the next post.
    'Greenland ice ran about 20 degrees colder at the LGM.\nSo the planet as a whole was probably about 6 degrees colder, going by the ocean proxies.',
    'Wren: at the end of the Younger Dryas Greenland warmed by ~10°C in a few decades\nWren: so the whole world warmed too, but by much less than that.',
    // "but" between the globe and the record still sets them apart.
    'Fair enough, but the whole planet was only about 6 degrees colder, and the Greenland cores show a local swing.',
    // "not" before a figure between the record and the globe contrasts them.
    'The Vostok core shows Antarctica about 9 degrees colder, not 6 like the global mean.',
    // A closing clause naming another record.
    'The whole planet was about 6 degrees colder at the glacial maximum, that\'s what the ocean proxies show.',
    // A tag question about a regional record alone.
    'Dome C is a great record of Antarctic temperature, isn\'t it?',
  ])('leaves clean: %s', async (text) => {
    expect(await rulesOf(text)).not.toContain(SCOPE);
  });
});

describe('the either/or frame standing alone as a reply', () => {
  it.each([
    'Does CO2 cause warming or does warming cause CO2? It can\'t be both.',
    'Mags: global temp went up first and co2 followed it up\nMags: whatever. its either a cause or an effect, cant be both, pick one',
    'Tam: the CO2 in the cores comes after the warming, so it was driven by it\nTam: lol ok\nTam: it is one or the other, cannot be both',
  ])('flags: %s', async (text) => {
    expect(await rulesOf(text)).toContain(EITHER_OR);
  });

  it.each([
    'Does CO2 cause warming or does warming cause CO2? It can be both, and in the ice ages it was.',
    'Warming released CO2 and the CO2 then drove more warming. It\'s not one or the other.',
    'Mags: so co2 followed the warming in the cores\nDell: right, and it still warmed things further. It doesn\'t have to be one or the other.',
    'The cores hold CO2 and dust. Which of the two is easier to measure depends on the lab.',
  ])('leaves clean: %s', async (text) => {
    expect(await rulesOf(text)).not.toContain(EITHER_OR);
  });
});
