/**
 * Numbers whose subject is a back-reference (src/claims/back-reference.ts, docs/binding.md,
 * Back-references): a description of a kind ("that core", "the cold snap", "this episode"), read
 * through the whole engine on short drafts of our own, so the sentences before, the heading and a
 * list's earlier items are the engine's own. Each factual check names the pack's source beside it.
 */
import { describe, expect, it } from 'vitest';
import { descriptionsIn, resolveBackReferences, subjectsOfKind } from '../../src/claims/back-reference.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { readingOf as readingWith, type Row } from './fixtures/reading-of.js';

const packs = await loadPacks([]);

const readingOf = (draft: string, number: string) => readingWith(packs, draft, number);

// EPICA Dome C was drilled to 3,260-3,270 m (Lüthi et al. 2008, Nature 453:379-382; Bouchet et al.
// 2023, Climate of the Past 19:2257-2286, as the pack's edc-drilled-depth cites them); Vostok to 3,623 m
// (Petit et al. 1999, Nature 399:429-436: vostok-drilled-depth).
const CORES: Row[] = [
  ['They started on EPICA Dome C in 1996.\nThat core was drilled to a depth of 3,623 metres.', '3,623 metres', 'edc-drilled-depth', true],
  ['The Halvard team began at EPICA Dome C in 1996.\nThat core was eventually drilled to 3,270 metres.', '3,270 metres', 'edc-drilled-depth', false],
  ['EPICA Dome C is the centrepiece of the new gallery.\nVisitors read how the borehole went down 3,623 metres.', '3,623 metres', 'edc-drilled-depth', true],
  // A year in the sentence is the time frame of the drilling, not a subject of its own.
  ['Dr Quist began with the EPICA Dome C core.\n\nThe core was drilled through the early 2000s until it reached 3,623 metres.', '3,623 metres', 'edc-drilled-depth', true],
  ['Dr Quist began with the EPICA Dome C core.\n\nIn the 2000s the core was drilled to 3,265 metres.', '3,265 metres', 'edc-drilled-depth', false],
  // Decades in the sentence frame the drilling; they keep no subject of their own.
  ['Dome C drilling ended in 2004.\nThe drilling through the 1990s and 2000s reached 3,270 metres.', '3,270 metres', 'edc-drilled-depth', false],
  // Two sentences back: the sentence before names no core.
  ['Work at Dome C began in 1996.\nThe crews camped on the plateau for eight summers.\nThe core was finally drilled to 3,623 metres.', '3,623 metres', 'edc-drilled-depth', true],
  // The section heading names the core.
  ['## Vostok\n\nThe core was drilled to 3,623 metres.', '3,623 metres', 'vostok-drilled-depth', false],
  // A list item reads on from the item before it.
  ['Two facts about the Russian site:\n\n- Vostok sits on top of a buried lake.\n- That core stopped at 3,330 metres.', '3,330 metres', 'vostok-drilled-depth', true],
];

// Younger Dryas: began 12,800-12,900 years BP, ended 11,500-11,700, lasted 1,100-1,300 years
// (Rasmussen et al. 2006, JGR 111:D06102; Rasmussen et al. 2014, Quaternary Science Reviews 106:14-28;
// Walker et al. 2009 for the end: the pack's younger-dryas-start, -end and -duration).
const PERIODS: Row[] = [
  ['Then came the Younger Dryas.\nThat cold snap began around 12,900 years ago and held on for roughly three thousand years.', 'roughly three thousand years', 'younger-dryas-duration', true],
  ['Then came the Younger Dryas.\nThat cold snap began around 12,900 years ago and held on for roughly three thousand years.', 'around 12,900 years ago', 'younger-dryas-start', false],
  ['The Younger Dryas is a favourite of museum guides.\nThe cold spell ended about 11,700 years ago.', 'about 11,700 years ago', 'younger-dryas-end', false],
  ['Greenland ice shows the Younger Dryas clearly.\nThis episode lasted about 4,000 years.', 'about 4,000 years', 'younger-dryas-duration', true],
  // A time phrase takes up the latest period.
  ['Europe froze again during the Younger Dryas.\nBack then, the cold lasted some 1,200 years.', 'some 1,200 years', 'younger-dryas-duration', false],
  // The description skips a subject of another kind (a core) to the latest period.
  ['The Younger Dryas interrupted the warming.\nThe GRIP core from Greenland shows it in fine detail.\nThe event ended about 11,700 years ago.', 'about 11,700 years ago', 'younger-dryas-end', false],
];

// Correct look-alikes that must stay as they are (values as above).
const LOOK_ALIKES: Row[] = [
  // Two cores named together: "the core" could be either, so the number binds nothing.
  ['Vostok and Dome C were drilled a few hundred kilometres apart.\nThe core reached 3,623 metres.', '3,623 metres', '-', false],
  ['The exhibit compares Vostok with EPICA Dome C.\nThat core went down 3,270 metres.', '3,270 metres', '-', false],
  // The sentence names its own core: "the core at Dome C" is not the Vostok core of the sentence before.
  ['Our first post covered Vostok.\nThe core at Dome C was drilled to 3,270 metres.', '3,270 metres', 'edc-drilled-depth', false],
  // "that" opening a clause is no demonstrative, and a plural "the cold spells" names periods in general.
  ['The Vostok core is the one in the textbooks.\nGuides explain that cores often break below 3,000 metres.', '3,000 metres', '-', false],
  ['The Vostok record is on the wall.\nIts CO2 sat near 185 ppm in the cold spells and near 285 ppm in the warm ones.', '285 ppm', '-', false],
  // "The gas" after methane is methane: no CO2 value (the gas kind holds the term other-gas).
  ['Methane doubled over the deglaciation.\nThe gas rose by about 350 ppb.', 'about 350 ppb', '-', false],
  // A year in a sentence about a level of its time keeps it from a pre-industrial value before it
  // (the pre-industrial share, about 0.028 percent: IPCC AR6 WGI, Gulev et al. 2021, as the pack cites it).
  ['Before industrialisation CO2 made up about 0.028 percent of the air.\nIn 2023 the global average stood at about 0.042 percent.', 'about 0.042 percent', '-', false],
  // A subject of another kind does not answer a description: no period was named before "the event".
  ['The GRIP core was drilled at Summit.\nThe event ended about 11,700 years ago.', 'about 11,700 years ago', '-', false],
];

describe('a description of a kind takes up the latest subject of that kind', () => {
  it.each(CORES)('cores: %s', async (draft, number, value, flagged) => {
    expect(await readingOf(draft, number)).toEqual({ value, flagged });
  });
  it.each(PERIODS)('periods: %s', async (draft, number, value, flagged) => {
    expect(await readingOf(draft, number)).toEqual({ value, flagged });
  });
  it.each(LOOK_ALIKES)('look-alikes: %s', async (draft, number, value, flagged) => {
    expect(await readingOf(draft, number)).toEqual({ value, flagged });
  });
});

describe('descriptions and their subjects (the pack lexicon: kinds, kind-members, back-references)', () => {
  const kinds = (s: string): string[] => descriptionsIn(s, packs).map((d) => `${d.kind}${d.plural ? '+' : ''}:${s.slice(d.start, d.end)}`);
  it.each([
    ['That core was drilled to 3,623 metres.', ['core:That core']],
    ['This cold snap began 12,900 years ago.', ['period:This cold snap']],
    ['Those two records overlap.', ['record+:Those two records']],
    ['The same period saw CO2 fall.', ['period:The same period']],
    ['Back then the gas stood near 190 ppm.', ['period:Back then', 'gas:the gas']],
    // Look-alikes: a restrictor gives the noun a subject of its own; a clause "that"; a general plural.
    ['The core from Dome C is older.', []],
    ['At the time of the LGM the sea was lower.', []],
    ['Studies found that cores from Greenland agree.', []],
    ['CO2 was low in the cold spells.', []],
    ['The geological record shows many ice ages.', []],
  ])('%s', (sentence, expected) => {
    expect(kinds(sentence)).toEqual(expected);
  });

  it('merges the words of one subject and keeps two subjects apart', () => {
    expect(subjectsOfKind('They started on EPICA Dome C in 1996.', 'core', packs)).toEqual(['EPICA Dome C']);
    expect(subjectsOfKind('Vostok and Dome C were drilled apart.', 'core', packs)).toEqual(['Vostok', 'Dome C']);
    expect(subjectsOfKind('Methane rose with CO2.', 'gas', packs)).toEqual(['Methane', 'CO2']);
    expect(subjectsOfKind('The Younger Dryas chilled the north.', 'core', packs)).toEqual([]);
  });

  it('resolves in the earlier clause, then the texts before, most recent first', () => {
    expect(resolveBackReferences('That core reached bedrock.', ['Vostok came first.', 'Then EPICA drilled Dome C.'], packs)).toEqual({ state: 'found', referents: [{ text: 'Dome C', source: 1 }] });
    expect(resolveBackReferences('The core reached bedrock.', ['Vostok and Dome C were drilled.'], packs)).toEqual({ state: 'ambiguous' });
    expect(resolveBackReferences('Both cores reached bedrock.', ['Vostok and Dome C were drilled.'], packs)).toEqual({ state: 'found', referents: [{ text: 'Vostok and Dome C', source: 0 }] });
    expect(resolveBackReferences('CO2 rose and the gas kept rising.', [], packs)).toEqual({ state: 'found', referents: [{ text: 'CO2', source: -1 }] });
    expect(resolveBackReferences('The core reached bedrock.', ['Nothing here names one.'], packs)).toEqual({ state: 'none' });
  });
});
