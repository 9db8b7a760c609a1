/**
 * Subjects named one sentence back (src/claims/bind-context.ts), on our own two-sentence passages.
 * Quantities are built by hand (quantity-at.ts) so that only the binder is measured.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { boundAfter, quantitiesIn, type ContextRow, type Written } from './quantity-at.js';

const packs = await loadPacks([]);

type Row = ContextRow;
const bound = (context: string, sentence: string, written: Written[]): string[] => boundAfter(packs, context, sentence, written);

const REACHED: Row[] = [
  ['The Harwick team spent three summers at the GRIP site.', 'They drilled down to 3,029 metres.', [['3,029 metres', 'length']], ['grip-depth-and-span']],
  ['The last ice age peaked around 21,000 years ago.', 'At its height, the global mean was some 6 °C colder than in pre-industrial times.', [['some 6 °C', 'temperature-change']], ['gmst-lgm-to-preindustrial-warming']],
  ['The Younger Dryas began about 12,900 years ago.', 'It ended about 11,700 years ago.', [['about 11,700 years ago', 'age']], ['younger-dryas-end']],
  // A time phrase refers back; "global" qualifies "sea level"; "below today's" is a baseline (Lambeck et al. 2014: LGM lowstand 120-135 m).
  ['The Hollin Museum panel puts the Last Glacial Maximum at about 21,000 years ago.', "Global sea level at that time stood some 125 metres below today's.", [['some 125 metres', 'length']], ['lgm-sea-level-lowstand']],
  // "By then" refers back (Gulev et al. 2021: LGM global cooling about 5-7 °C).
  ['The last ice age peaked around 21,000 years ago.', 'By then the global mean temperature had fallen some 6 °C below pre-industrial levels.', [['some 6 °C', 'temperature-change']], ['gmst-lgm-to-preindustrial-warming']],
];

const KEPT_APART: Row[] = [
  // The sentence names its own subject: a depth word one sentence back does not make 560 km a depth.
  ['The Vostok core was drilled by three nations.', 'The EPICA Dome C core, about 560 km away, reaches further.', [['about 560 km', 'length']], ['-']],
  // No word refers back: the sentence does not take its subject from the one before.
  ['The GRIP team drilled at Summit.', 'Sediment cores from the fjord reach down 40 metres.', [['40 metres', 'length']], ['-']],
  // Its own words name another subject (a record span), so the Younger Dryas is not borrowed.
  ['The Younger Dryas began about 12,900 years ago.', 'Its ice cores hold a record of 800,000 years.', [['800,000 years', 'duration']], ['-']],
  // A veto word in the sentence still vetoes (the lake is not the core).
  ['The Vostok core reached 3,623 metres.', 'Beneath it, the subglacial lake is some 250 km long.', [['some 250 km', 'length']], ['-']],
  // A calendar year dates the sentence; it takes no subject from the one before.
  ['And then came the Holocene.', 'It officially begins 11,700 years before the year 2000.', [['11,700 years', 'duration'], ['2000', 'age', 'CE']], ['-', '-']],
  // A number with a subject of its own never looks back.
  ['The GRIP team drilled at Summit.', 'Their Vostok colleagues drilled to 3,623 metres.', [['3,623 metres', 'length']], ['vostok-drilled-depth']],
  // "At the time of writing" dates the sentence; it does not refer back.
  ['The Hollin panel shows the Last Glacial Maximum.', 'At the time of writing, sea level stands some 125 metres higher.', [['some 125 metres', 'length']], ['-']],
  // "In the period" opens a time span of its own; only "that" time refers back.
  ['The Hollin panel shows the Last Glacial Maximum.', 'In the period since, global sea level has risen some 60 metres.', [['some 60 metres', 'length']], ['-']],
  // A sea-level datum is a baseline, and the station named is a subject of its own: no sea-level value.
  ['The Last Glacial Maximum came about 21,000 years ago.', 'At that time the Vostok site lay some 3,500 metres above sea level.', [['some 3,500 metres', 'length']], ['-']],
  // A qualifier of a term that does not serve the value still names another subject.
  ['The Last Glacial Maximum came about 21,000 years ago.', 'At that time Vostok ice was some 125 metres thinner.', [['some 125 metres', 'length']], ['-']],
  // Two subjects one sentence back: no way to choose, so nothing binds.
  ['The Dome C and Dome Fuji teams both reached bedrock.', 'They drilled down about 3,100 metres.', [['about 3,100 metres', 'length']], ['?']],
];

describe('bindQuantities with the previous sentence', () => {
  it.each(REACHED)('binds: %s / %s', (context, sentence, written, expected) => expect(bound(context, sentence, written)).toEqual(expected));
  it.each(KEPT_APART)('keeps apart: %s / %s', (context, sentence, written, expected) => expect(bound(context, sentence, written)).toEqual(expected));

  it('binds nothing from context when no previous sentence is given', () => {
    const s = 'They drilled down to 3,029 metres.';
    expect(bindQuantities(s, quantitiesIn(s, [['3,029 metres', 'length']]), packs)).toEqual({ bindings: [], ambiguous: [] });
  });
});
