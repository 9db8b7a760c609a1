/**
 * Structure rules the frames grid (frames-grid.test.ts) showed were missing: coordinated bare verbs
 * read "respectively" (bind-clauses.ts, bind-list.ts), a number alone in brackets after a noun phrase
 * (bind.ts), a gap after a semicolon or inside a bracket (bind-turn.ts), a relative clause on a
 * compared subject (bind-others.ts), and a list after a lead-in sentence ending in a colon
 * (prose/lead-in.ts introOf, bind-context.ts). Sentences of our own, through the real parser, binder
 * and check; each rule with a correct look-alike that must stay clean or keep its own reading.
 *
 * Reference values (the pack's, with its sources): the last deglaciation began about 18,000 years ago
 * and ended about 11,500 years ago (Chowdhry Beeman et al. 2019, doi:10.5194/cp-15-913-2019; Clark et
 * al. 2009, doi:10.1126/science.1172873; Walker et al. 2009, doi:10.1002/jqs.1227); the Holocene began
 * about 11,700 years ago (Walker et al. 2009); Vostok's record spans about 420,000 years (Petit et al.
 * 1999, doi:10.1038/20859), EPICA Dome C's about 800,000 (Jouzel et al. 2007,
 * doi:10.1126/science.1141038); glacial CO2 about 172-200 ppm, interglacial about 240-300 ppm (Lüthi et
 * al. 2008, doi:10.1038/nature06949); drilled depths 3,623 m at Vostok (Petit et al. 1997,
 * doi:10.1038/387359a0) and about 3,270 m at Dome C (Lüthi et al. 2008).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { judgeAt } from './judge-at.js';

const packs = await loadPacks([]);

type Row = [sentence: string, text: string, value: string, verdict: string];

describe('coordinated verbs with one object are one predicate, read respectively', () => {
  it.each<Row>([
    ['The last deglaciation started and finished about 25,000 years ago and about 11,500 years ago, respectively.', 'about 25,000 years ago', 'termination-1-start', 'conflicts'],
    ['The last deglaciation started and finished about 25,000 years ago and about 11,500 years ago, respectively.', 'about 11,500 years ago', 'termination-1-end', 'agrees'],
    ['The last deglaciation began and ended roughly 18,000 and 4,000 years ago respectively.', '4,000 years ago', 'termination-1-end', 'conflicts'],
    // Look-alike: two predicates, each with its own object, still speak for themselves.
    ['The last deglaciation began about 18,000 years ago and ended about 11,500 years ago.', 'about 11,500 years ago', 'termination-1-end', 'agrees'],
  ])('%s [%s]', (sentence, text, value, verdict) => expect(judgeAt(sentence, text)).toEqual({ value, verdict }));

  it('with the unit written once, after the last number (the whole engine)', async () => {
    const { flags } = await checkText('The last deglaciation started and finished about 25,000 and 11,500 years ago, respectively.', { packs, path: 'list.md' });
    expect(flags.map((f) => [f.ruleId, f.excerpt, f.correction])).toEqual([['value.termination-1-start', 'about 25,000', 'about 18,000 years ago']]);
  });
});

describe('a number alone in brackets after a noun phrase is that phrase\'s', () => {
  it.each<Row>([
    ['The last deglaciation\'s end (about 6,000 years ago) gave way to the Holocene.', 'about 6,000 years ago', 'termination-1-end', 'conflicts'],
    ['The end of the last deglaciation (about 11,500 years ago) opened the Holocene.', 'about 11,500 years ago', 'termination-1-end', 'agrees'],
    // Look-alike: the phrase before the bracket names no measure, so the words after it still count.
    ['The Vostok core (3,623 m) was the deepest drilled at the time.', '3,623 m', 'deepest-ice-core', 'agrees'],
  ])('%s [%s]', (sentence, text, value, verdict) => expect(judgeAt(sentence, text)).toEqual({ value, verdict }));
});

describe('a gap after a semicolon or in a bracket names an alternate subject', () => {
  it.each<Row>([
    ['In the glacial periods carbon dioxide stood at about 190 ppm; in the interglacials, about 200 ppm.', 'about 200 ppm', 'co2-interglacial-maximum-typical', 'conflicts'],
    // The gap repeats "fell to": a level, as its counterpart is, not the glacial-interglacial swing.
    ['In the glacial periods carbon dioxide fell to about 190 ppm; in the interglacials, about 280 ppm.', 'about 280 ppm', 'co2-interglacial-maximum-typical', 'agrees'],
    ['In the glacial periods carbon dioxide fell to about 190 ppm; in the interglacials, about 200 ppm.', 'about 200 ppm', 'co2-interglacial-maximum-typical', 'conflicts'],
    ['Glacial CO2 hovered near 185 ppm (interglacial CO2: near 285 ppm).', 'near 285 ppm', 'co2-interglacial-maximum-typical', 'agrees'],
    ['Glacial CO2 hovered near 185 ppm (interglacial CO2: near 285 ppm).', 'near 185 ppm', 'co2-glacial-minimum-typical', 'agrees'],
    ['Vostok covers about 420,000 years; EPICA Dome C, about 600,000 years.', 'about 600,000 years', 'edc-record-span', 'conflicts'],
    ['Vostok was drilled to 3,623 metres (EPICA Dome C: about 3,000 metres).', 'about 3,000 metres', 'edc-drilled-depth', 'conflicts'],
    // Look-alike: a bracket that names a measure, not another subject, keeps the subject before it.
    ['The Vostok core (a record of about 420,000 years) sits above a lake.', 'about 420,000 years', 'vostok-record-span', 'agrees'],
  ])('%s [%s]', (sentence, text, value, verdict) => expect(judgeAt(sentence, text)).toEqual({ value, verdict }));
});

describe('a relative clause on a compared subject speaks of that subject', () => {
  it.each<Row>([
    ['Unlike Vostok, which reaches back some 800,000 years, the EPICA Dome C core goes back about 800,000 years.', 'some 800,000 years', 'vostok-record-span', 'conflicts'],
    ['Unlike Vostok, which reaches back some 800,000 years, the EPICA Dome C core goes back about 800,000 years.', 'about 800,000 years', 'edc-record-span', 'agrees'],
    ['Unlike the Vostok borehole, whose drill reached 3,623 metres, the Dome C borehole stopped at about 3,270 metres.', '3,623 metres', 'vostok-drilled-depth', 'agrees'],
  ])('%s [%s]', (sentence, text, value, verdict) => expect(judgeAt(sentence, text)).toEqual({ value, verdict }));

  it('the clause\'s words do not veto the main clause\'s number', () => {
    // "lagged" in the clause about CO2 is no veto on how long the deglaciation lasted (Chowdhry Beeman et al. 2019).
    const sentence = 'Unlike carbon dioxide, which lagged Antarctic warming by a few centuries, the last deglaciation lasted about 2,500 years.';
    expect(judgeAt(sentence, 'about 2,500 years')).toEqual({ value: 'termination-1-duration', verdict: 'conflicts' });
  });
});

describe('a list reads on from the lead-in sentence that ends in a colon', () => {
  const valueFlags = async (text: string) => (await checkText(text, { packs, path: 'list.md' })).flags.filter((f) => f.ruleId.startsWith('value.')).map((f) => [f.ruleId, f.excerpt, f.correction]);

  it('the first item takes the subject it lacks', async () => {
    expect(await valueFlags('Three things about the Vostok borehole:\n\n- it was drilled down to 3,100 metres;\n- it stops above a lake.')).toEqual([
      ['value.vostok-drilled-depth', '3,100 metres', '3,623 metres'],
    ]);
  });

  it('a later item takes the measure past the items before it', async () => {
    expect(await valueFlags('How far back the two cores reach:\n\n- Vostok: about 420,000 years\n- EPICA Dome C: about 500,000 years')).toEqual([
      ['value.edc-record-span', 'about 500,000 years', 'about 800,000 years'],
    ]);
  });

  it('right figures stay clean, and a lead-in with no colon lends nothing (common practice)', async () => {
    expect(await valueFlags('How far back the two cores reach:\n\n- Vostok: about 420,000 years\n- EPICA Dome C: about 800,000 years')).toEqual([]);
    expect(await valueFlags('We visited the Vostok station last year.\n\n- It took 3,100 metres of cable to reach the lab.')).toEqual([]);
  });
});
