/**
 * Term phrases with words put inside them (src/claims/term-gaps.ts): modifiers inside a noun phrase
 * ("the longest peer-reviewed ice-core record") and a pronoun or a short adverb inside a phrasal
 * verb ("takes us back", "goes all the way back") still name the term, and the match spans the
 * inserted words; words that leave the noun phrase (a determiner, a preposition, a conjunction, a
 * number, punctuation, a verb in -s) or name something of their own (another region, a term of
 * another subject, a veto) keep it apart. Sentences of our own; the published value each factual
 * check rests on is named beside it.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { findTerms } from '../../src/claims/bind.js';
import { tokensOf } from '../../src/claims/term-gaps.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

/** The text each match of term `id` covers in `sentence`. */
function matched(sentence: string, id: string): string[] {
  return (findTerms(sentence, packs).get(id) ?? []).map(([s, e]) => sentence.slice(s, e));
}

/** The rule ids flagged on a one-sentence draft. */
async function flagged(text: string): Promise<string[]> {
  const result = await checkText(text, { packs, path: 'draft.md' });
  return result.flags.map((f) => f.ruleId);
}

describe('modifiers inside a noun-phrase term', () => {
  it('match with one or two inserted modifiers, the span running over them', () => {
    expect(matched('The longest peer-reviewed ice-core record now stands at 740,000 years.', 'oldest-record')).toEqual(['longest peer-reviewed ice-core record']);
    expect(matched('The oldest continuously dated ice-core record covers 740,000 years.', 'oldest-record')).toEqual(['oldest continuously dated ice-core record']);
    expect(matched('During the last great interglacial the seas stood higher.', 'last-interglacial')).toEqual(['last great interglacial']);
    expect(matched('Over the past century the global annual mean rose.', 'global')).toContain('global annual mean');
    expect(matched('As the melting continental ice sheets retreated, the seas rose.', 'deglaciation')).toContain('melting continental ice sheets');
  });

  it('keep a word that leaves the noun phrase out', () => {
    // A preposition and a determiner: the oldest ice in a record is not the oldest record.
    expect(matched('The oldest ice in the record is about 740,000 years old.', 'longest')).toEqual([]);
    expect(matched('The oldest ice in the record is about 740,000 years old.', 'oldest-record')).toEqual([]);
    // A conjunction, punctuation, a number.
    expect(matched('The longest and deepest ice-core record covers 740,000 years.', 'oldest-record')).toEqual([]);
    expect(matched('The longest, most detailed ice-core record covers 740,000 years.', 'oldest-record')).toEqual([]);
    expect(matched('The last two interglacials were warmer than today.', 'last-interglacial')).toEqual([]);
    // A verb: "holds" in -s, "preserved" after a noun.
    expect(matched('The oldest ice holds records of past air.', 'longest')).toEqual([]);
    expect(matched('The oldest ice preserved records of past air.', 'longest')).toEqual([]);
  });

  it('keep a word that names something of its own out', () => {
    // Another region (a term and a capitalised name): the longest Greenland record is not the Antarctic one.
    expect(matched('The longest Greenland ice-core record reaches back about 123,000 years.', 'oldest-record')).toEqual([]);
    // A region word of the pack's lexicon in lower case.
    expect(matched('The oldest polar ice-core record covers 740,000 years.', 'oldest-record')).toEqual([]);
    // Another term's word (the gas; "resolution", a veto of durations).
    expect(matched('The longest CO2 record covers 740,000 years.', 'longest')).toEqual(['longest']);
    expect(matched('The longest high-resolution ice-core record covers 740,000 years.', 'oldest-record')).toEqual([]);
  });

  it('put nothing between the two nouns of a compound or the words of a name', () => {
    expect(findTerms('The ice core age at the bottom is about 800,000 years.', packs).has('glacial')).toBe(false);
    expect(matched('The Younger Dryas ended abruptly.', 'younger-dryas')).toEqual(['Younger Dryas']);
    expect(matched('the younger dated Dryas layers', 'younger-dryas')).toEqual([]);
  });
});

describe('a pronoun or a short adverb inside a phrasal-verb term', () => {
  it('matches, the span running over the inserted words', () => {
    expect(matched('EPICA Dome C takes us back some 700 thousand years.', 'record')).toEqual(['takes us back']);
    expect(matched('The Vostok core goes all the way back about 420,000 years.', 'record')).toEqual(['goes all the way back']);
    expect(matched('The Vostok core reaches right back about 420,000 years.', 'record')).toEqual(['reaches right back']);
    expect(matched('The Dome C ice carries us right back 800,000 years.', 'record')).toEqual(['carries us right back']);
  });

  it('takes no noun object and no other word inside', () => {
    expect(matched('The Vostok core takes the reader back about 420,000 years.', 'record')).toEqual([]);
    expect(matched('The Vostok team went quickly back to camp.', 'record')).toEqual([]);
  });
});

describe('end to end: the value a gapped term names', () => {
  // The longest peer-reviewed ice-core record: about 800,000 years, EPICA Dome C (Lüthi et al. 2008,
  // Nature 453, 379-382, DOI 10.1038/nature06949); the oldest continuous ice reached at Little Dome C
  // is at least 1.2 million years old (French Polar Institute, "Beyond EPICA: ice cores on their way to
  // Europe", press release, 24 March 2025; pack source beyond-epica-oldest-2025).
  it('flags the oldest record told with a modifier inside, and leaves the published figure alone', async () => {
    expect(await flagged('The longest peer-reviewed ice-core record now stands at 740,000 years.')).toContain('value.oldest-continuous-ice-core-record');
    expect(await flagged('The oldest continuously dated ice-core record covers 600,000 years.')).toContain('value.oldest-continuous-ice-core-record');
    expect(await flagged('The longest peer-reviewed ice-core record now stands at about 800,000 years.')).toEqual([]);
  });

  // EPICA Dome C's record spans about 800,000 years (Jouzel et al. 2007, Science 317, 793-796,
  // DOI 10.1126/science.1141038; Lüthi et al. 2008); Vostok's about 420,000 years (Petit et al. 1999,
  // Nature 399, 429-436, DOI 10.1038/20859).
  it('flags a record reach told with an object or an adverb inside the verb', async () => {
    expect(await flagged('EPICA Dome C takes us back some 700 thousand years.')).toContain('value.edc-record-span');
    expect(await flagged('EPICA Dome C takes us back some 800 thousand years.')).toEqual([]);
    expect(await flagged('The Vostok core goes all the way back about 300,000 years.')).toContain('value.vostok-record-span');
    expect(await flagged('The Vostok core reaches right back about 420,000 years.')).toEqual([]);
  });

  // Continuous Greenland records reach only into the last interglacial, about 123,000 years (NGRIP
  // members 2004, Nature 431, 147-151: from memory, as the pack's note on the GRIP value says).
  it('keeps the Greenland record and the oldest ice of a record off the oldest-record value', async () => {
    expect(await flagged('The longest Greenland ice-core record reaches back about 123,000 years.')).not.toContain('value.oldest-continuous-ice-core-record');
    expect(await flagged('The oldest ice in the record is about 740,000 years old.')).not.toContain('value.oldest-continuous-ice-core-record');
  });
});

describe('the words the gapped search cuts', () => {
  it('keeps hyphenated compounds and possessives whole and marks what stands between words', () => {
    const tokens = tokensOf("Dome C's peer-reviewed record, now");
    expect(tokens.map((t) => t.text)).toEqual(['dome', "c's", 'peer-reviewed', 'record', 'now']);
    expect(tokens.map((t) => t.joined)).toEqual([false, true, true, true, false]);
  });
});
