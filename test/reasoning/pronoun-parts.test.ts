/**
 * CO2's two parts told of a pronoun: "it's" read as "it is", so the pronoun resolves to the thing
 * the sentence before is about, and a sentence naming a part of each side ("an effect, not a
 * cause") is read where its window names a subject, though it names none itself. A pronoun
 * focus restricted at once ("it's the orbit, full stop, ...") is singled out as a cleft's is.
 * The science: CO2 was both a response to the orbitally paced warming and an amplifier of it, and
 * the orbit alone did not end the ice ages (Shakun et al. 2012, Nature 484, 49-54,
 * doi 10.1038/nature10915; IPCC AR6 WG1 chapter 5, from memory).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const logic = async (text: string) =>
  (await checkText(text, { packs, format: 'markdown' })).flags.filter((f) => f.level !== 'note' && f.ruleId.startsWith('logic.')).map((f) => f.ruleId);

describe('a part told of "it\'s"', () => {
  it.each([
    ['The cores show CO2 rising after the warming. It\'s a response, not a driver.', 'logic.either-or-causation'],
    ['Carbon dioxide climbs late in every core. It\'s an outcome of the warming and not a cause of it.', 'logic.either-or-causation'],
    ['the co2 only went up after the warming. if it\'s an effect it\'s not a driver, cant be both', 'logic.either-or-causation'],
  ])('%s', async (text, rule) => {
    expect(await logic(text)).toContain(rule);
  });

  it.each([
    // a loop grants both parts
    'The cores show CO2 rising after the warming. It\'s a response and a driver at once, a feedback.',
    // "its" without the apostrophe stays the possessive
    'CO2 rose after the warming. Its effect on temperature was large.',
    // the pronoun is the record, which acts on nothing; no part is set against another
    'The core is 3.2 km long. It\'s the best record we have of the glacial air.',
  ])('%s stays clean of logic flags', async (text) => {
    expect(await logic(text)).toEqual([]);
  });
});

describe('a pronoun focus restricted at once', () => {
  it('flags "it\'s the tilt, full stop, ..." with a cause after it as the one cause', async () => {
    expect(await logic('Honestly it\'s the tilt, full stop, the tilt on its own pulled us out of the glaciation and CO2 played no part.')).toContain('logic.single-cause');
  });

  it('leaves a focus with no restriction, and a part for CO2, alone', async () => {
    expect(await logic('It\'s the orbit, mostly, and CO2 amplified the warming that ended each ice age.')).toEqual([]);
  });
});

describe('a choice of parts answered past a coordinator, a term held up in quotation marks', () => {
  it.each([
    // the loop word is only mentioned, in quotation marks, and the answer follows "and"
    'CO2 rose centuries late in the cores. "Feedback" is a buzzword; CO2 is either the driver or the follower and the bubbles plainly say follower.',
    'CO2 rose late. CO2 was either the cause or the effect and the cores say effect.',
  ])('%s', async (text) => {
    expect(await logic(text)).toContain('logic.either-or-causation');
  });

  it.each([
    // a loop granted, unquoted, answers the choice
    'CO2 rose centuries late in the cores. It is a feedback; CO2 is either the driver or the follower and the bubbles plainly say both.',
    // the clause after "and" picks no part
    'CO2 rose late. Whether CO2 was the cause or the effect and how much it mattered are both open.',
  ])('%s stays clean of logic flags', async (text) => {
    expect(await logic(text)).toEqual([]);
  });
});

describe('the latecomer maxim after another denial in its sentence', () => {
  // Temperature led CO2 at Termination III by about 800 years (Caillon et al. 2003, Science 299,
  // 1728-1731, doi 10.1126/science.1078758); a late CO2 rise still amplified the warming (Shakun et al. 2012).
  it('flags the second "can\'t" whose subject came late', async () => {
    expect(await logic('Temperature led CO2 by some 800 years in that core. A result can\'t come before its cause, so a gas that arrives 800 years late can\'t have done the warming.')).toContain(
      'logic.lag-rules-out-cause',
    );
  });

  it('leaves a latecomer granted a part alone', async () => {
    expect(await logic('Temperature led CO2 by some 800 years in that core. A result can\'t come before its cause, but a gas that arrives late can still amplify the warming.')).toEqual([]);
  });
});
