/**
 * The phrasing families added after the first corpus, with the built-in pack: exact flagged
 * stretches (UTF-16 offsets into the sentence) for a denial of any CO2 role after a lag, a single
 * cause named after a colon, a thermometer record or an "around the globe" lag read as the
 * planet's, and the CO2 solubility stated the wrong way round; and the guards that keep
 * near-misses quiet. The science: Shakun et al. 2012 (Nature 484, 49-54, doi 10.1038/nature10915:
 * CO2 amplified the deglacial warming and global temperature lagged it); Caillon et al. 2003
 * (Science 299, 1728-1731: the ~800-year lag is Antarctic); Weiss 1974 (Marine Chemistry 2,
 * 203-215, from memory: CO2 solubility falls as water warms, so cooling seas take CO2 up).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { isGuarded } from '../../src/checks/reasoning/direction-guards.js';
import { dropOutranked } from '../../src/checks/reasoning/flag-precedence.js';
import { checkReasoning } from '../../src/checks/reasoning/index.js';
import { tokenizeSentence } from '../../src/claims/frames-tokens.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';
import type { FlagDraft } from '../../src/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const LAG = 'logic.lag-rules-out-cause';
const SINGLE = 'logic.single-cause';
const REGIONAL = 'scope.regional-record-as-global';
const ANT_LAG = 'scope.antarctic-lag-as-global';
const SOLUBILITY = 'direction.co2-solubility-falls-with-warming';

// [sentence, expected flags as [rule id, start, end, flagged words]]
const FLAGGED: [string, [string, number, number, string][]][] = [
  ['Because the warming started first, carbon dioxide played no part in ending the ice ages, whatever role it plays today.', [[LAG, 35, 67, 'carbon dioxide played no part in']]],
  ['In every termination CO2 merely followed the temperature, a bystander to the warming.', [[LAG, 32, 40, 'followed']]],
  ["The warming that ended the last ice age had one cause: the extra summer sunlight that Earth's changing orbit sent to the far north.", [[SINGLE, 40, 53, 'had one cause']]],
  ['The great northern ice sheets melted for one reason only: rising carbon dioxide.', [[SINGLE, 37, 56, 'for one reason only']]],
  ['Whatever the Dome C thermometer says happened in Antarctica is what happened to the planet as a whole.', [[REGIONAL, 84, 90, 'planet']]],
  ['Around the globe, temperatures started climbing about 800 years before carbon dioxide did.', [[ANT_LAG, 54, 70, '800 years before']]],
  ['As the seas warm they absorb more CO₂, which is why ocean acidification is speeding up.', [[SOLUBILITY, 7, 33, 'seas warm they absorb more']]],
  ['As the oceans cooled going into each ice age, they released carbon dioxide into the air.', [[SOLUBILITY, 7, 59, 'oceans cooled going into each ice age, they released']]],
  ['The oceans release CO2 as they cool.', [[SOLUBILITY, 11, 35, 'release CO2 as they cool']]],
  ['The warmer the ocean, the more CO2 it can store.', [[SOLUBILITY, 4, 47, 'warmer the ocean, the more CO2 it can store']]],
  // The direction fact wins over an either/or flag on overlapping words.
  ['Temperature drives CO2, since as the oceans warm they absorb more CO2, and CO2 does not drive temperature.', [[SOLUBILITY, 37, 65, 'oceans warm they absorb more']]],
  // Without the solubility words the either/or flag stands.
  ['Temperature drives CO2, and CO2 does not drive temperature.', [['logic.either-or-causation', 0, 46, 'Temperature drives CO2, and CO2 does not drive']]],
];

const QUIET: string[] = [
  'Carbon dioxide played no part in starting the deglaciation, but once it rose it amplified the warming.',
  'At the start of the deglaciation CO2 merely followed Antarctic temperature; within a few centuries it was amplifying the warming.',
  'Orbital changes were one cause of the deglaciation; rising CO2 and shrinking ice sheets were others.',
  'No single cause ended the ice age: the orbit started it and CO2 amplified it.',
  'Did the ice age end for one reason only?',
  'The rise of CO2 since 1850 has a single cause: our burning of coal, oil and gas.',
  'The Dome C thermometer tells us about Antarctica, not about the planet as a whole.',
  'Antarctic temperature climbed some centuries before CO2, and the extra CO2 then warmed the globe.',
  'As the oceans warm they absorb more heat.',
  'As the oceans cooled they released heat.',
  'Even as the oceans warm, they absorb more CO2 every year, because there is more of it in the air.',
  'Cold water releases CO2 when it warms at the surface of the Southern Ocean.',
];

describe('phrasing families', () => {
  it.each(FLAGGED)('%s', (sentence, expected) => {
    const flags = checkReasoning([sentence], 0, packs);
    expect(flags.filter((f) => f.level !== 'note').map((f) => [f.ruleId, f.start, f.end, sentence.slice(f.start, f.end)])).toEqual(expected);
  });

  it.each(QUIET)('passes: %s', (sentence) => {
    expect(checkReasoning([sentence], 0, packs).filter((f) => f.level !== 'note')).toEqual([]);
  });

  it('keeps "Those bubbles alone prove ..." a note, the level the pack gives ice-core certainty', () => {
    const sentence = 'Those bubbles alone prove that CO₂ is now higher than at any time in two million years.';
    const flags = checkReasoning([sentence], 0, packs);
    expect(flags.map((f) => [f.ruleId, f.level, sentence.slice(f.start, f.end)])).toEqual([['logic.ice-core-certainty', 'note', 'prove']]);
  });
});

describe('direction guards', () => {
  const sentenceAndHit = (text: string, words: string) => [text, { start: text.indexOf(words), end: text.indexOf(words) + words.length }] as const;
  it.each([
    ['a plain statement', 'Warmer seas absorb more CO2.', 'Warmer seas absorb more', false],
    ['a question', 'Do warmer seas absorb more CO2?', 'warmer seas absorb more', true],
    ['a denial just before', 'It is not true that warmer seas absorb more CO2.', 'warmer seas absorb more', true],
    ['a denial inside', 'The bubbles are not older than the ice.', 'bubbles are not older than the ice', true],
    ['a concession', 'Even as the seas warm, they absorb more CO2 each year.', 'seas warm, they absorb more', true],
    ['a denial in another clause', 'Nobody doubts it; warmer seas absorb more CO2.', 'warmer seas absorb more', false],
  ])('%s', (_name, text, words, guarded) => {
    const [sentence, hit] = sentenceAndHit(text, words);
    expect(isGuarded(sentence, hit)).toBe(guarded);
  });
});

describe('flag precedence', () => {
  const flag = (ruleId: string, start: number, end: number): { flag: FlagDraft } => ({ flag: { ruleId, level: 'warning', start, end, reason: 'r', sources: [] } });
  it('drops an either/or flag that a direction flag overlaps, and keeps flags that do not overlap', () => {
    const found = [flag('logic.either-or-causation', 0, 40), flag('direction.co2-solubility-falls-with-warming', 10, 20), flag('logic.either-or-causation', 50, 60)];
    expect(dropOutranked(found).map((f) => [f.flag.ruleId, f.flag.start])).toEqual([
      ['direction.co2-solubility-falls-with-warming', 10],
      ['logic.either-or-causation', 50],
    ]);
  });

  it('leaves other overlaps to pack order', () => {
    const found = [flag('scope.antarctic-lag-as-global', 0, 20), flag('direction.global-co2-ahead-of-warming', 5, 25)];
    expect(dropOutranked(found)).toEqual(found);
  });
});

describe('clauses', () => {
  it('reads "but" after "nothing" as "except", inside the clause', () => {
    const tokens = tokenizeSentence('It was driven by nothing but the orbit, but CO2 helped.', ['but']);
    expect(tokens.tokens.filter((t) => t.isWord).map((t) => [t.text, t.clause])).toEqual([
      ['it', 0], ['was', 0], ['driven', 0], ['by', 0], ['nothing', 0], ['but', 0], ['the', 0], ['orbit', 0], ['but', 1], ['co2', 1], ['helped', 1],
    ]);
  });
});
