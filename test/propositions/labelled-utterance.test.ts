/**
 * A quotation that is all of a speaker's utterance after the speaker's label (a listener's email read
 * out in a radio log, a caller's text, a line of a script) is that voice's own claim, judged like any
 * utterance of a thread or script; a quotation that a lead-in reports or names as a saying stays a
 * quotation, and its flag a note. The facts the flags rest on (from memory): an Antarctic or Greenland
 * core records local temperature, and polar swings exceed the global mean (Tierney et al. 2020, Nature
 * 584, 569-573); warmer water holds less dissolved CO2 (Weiss 1974, Marine Chemistry 2, 203-215).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const TOPIC = 'The Antarctic ice cores hold the CO2 record.\n\n';
const levels = async (text: string, rule: string) =>
  (await checkText(TOPIC + text, { packs, format: 'markdown' })).flags.filter((f) => f.ruleId === rule).map((f) => f.level);

const SCOPE = 'scope.regional-record-as-global';
const SOLUBILITY = 'direction.co2-solubility-falls-with-warming';

describe('a quotation that is the whole of a labelled utterance', () => {
  it.each([
    ['NELL (by email): "The Dome Fuji core shows the whole world was 12 degrees colder back then."', SCOPE],
    ['HOST: A note from Priya in Lenton: "As the seas warm they will take up more of the CO2 we put out."', SOLUBILITY],
    ['Later: "Going by the Dome Fuji core, the whole planet was 12 degrees colder."', SCOPE],
  ])('%s', async (text, rule) => {
    const found = await levels(text, rule);
    expect(found.length).toBeGreaterThan(0);
    expect(found.every((l) => l === 'warning')).toBe(true);
  });
});

describe('a quotation a lead-in reports or names', () => {
  it.each([
    'Some readers put it like this: "The Dome Fuji core shows the whole world was 12 degrees colder back then."',
    'HOST: The usual line from callers: "The Dome Fuji core shows the whole world was 12 degrees colder back then."',
    'HOST: A caller insists: "The Dome Fuji core shows the whole world was 12 degrees colder back then."',
    '"The Dome Fuji core shows the whole world was 12 degrees colder back then." That one turns up every winter.',
  ])('%s', async (text) => {
    const found = await levels(text, SCOPE);
    expect(found.length).toBeGreaterThan(0);
    expect(found.every((l) => l === 'note')).toBe(true);
  });
});
