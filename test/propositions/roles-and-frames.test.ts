/**
 * Restricted roles, sufficiency and the either/or frame, in wordings of our own: a cause denied by
 * casting CO2 as a mere follower, one cause said to suffice with the other shut out, a lag taken as
 * grounds to strike CO2 off, and the choice between two roles stated in the abstract.
 * The science:
 * - The orbit paced and triggered the deglaciations; CO2 amplified and spread the warming, and
 *   global temperature lagged CO2: Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915.
 * - Antarctic temperature and CO2 rose within a few centuries of each other, and CO2 acted as a
 *   feedback: Parrenin et al. 2013, Science 339, 1060-1063, doi 10.1126/science.1226368.
 * - CO2 acts as both a feedback and a forcing in the glacial cycles: IPCC AR6 WG1 (2021), chapter 5
 *   and the paleoclimate box of chapter 7 (from memory).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const serious = async (text: string) =>
  (await checkText(text, { packs, format: 'markdown' })).flags.filter((f) => f.level !== 'note' && f.ruleId.startsWith('logic.')).map((f) => f.ruleId);

describe('CO2 cast as a mere follower is denied a cause (Shakun et al. 2012: it amplified the warming)', () => {
  // The follower's part denies CO2 a cause: beside temperature named the cause it is the either/or
  // error; where the sentence also puts temperature first ("led", "second"), the lag check takes it.
  it.each([
    ['Over the glacial cycles temperature steered, and carbon dioxide simply rode in the back seat.', 'logic.either-or-causation'],
    ['Warmth drives the carbon cycle, while CO2 plays second fiddle to it.', 'logic.lag-rules-out-cause'],
    ['Temperature is the cause of the swings and the gas merely reads the gauge.', 'logic.either-or-causation'],
    // "tagged along" is an order word (lexicon `order.after`, read in its base form): the lag check takes it.
    ['Antarctic warmth was the driver, and CO2 only tagged along as a follower.', 'logic.lag-rules-out-cause'],
    ['The warming led the whole way, with carbon dioxide just going along for the ride as a bystander.', 'logic.lag-rules-out-cause'],
  ])('%s', async (sentence, rule) => {
    expect(await serious(sentence)).toContain(rule);
  });

  it('reads "only ever" on a verb of following as a dismissal, but not "only after" as a time', async () => {
    // A restriction on the verb (Shakun et al. 2012: CO2 was no mere follower).
    expect(await serious('In the Antarctic cores the temperature moves and the CO2 only ever trails it.')).toContain('logic.lag-rules-out-cause');
    // Parrenin et al. 2013: CO2 rose after Antarctic warming began, and then amplified it.
    expect(await serious('CO2 rose only after Antarctic temperature had begun to climb, and then it amplified the warming.')).toEqual([]);
  });

  it.each([
    // Shakun et al. 2012: CO2 was no passenger; it amplified the warming.
    ['CO2 was not just along for the ride: once released, it amplified the warming.'],
    ['Carbon dioxide did not merely read the dial; it turned it, amplifying the warming the orbit began.'],
  ])('keeps clean: %s', async (sentence) => {
    expect(await serious(sentence)).toEqual([]);
  });
});

describe('one cause said to suffice, the other shut out (Shakun et al. 2012: orbit and CO2 together)', () => {
  it.each([
    ['The tilt of the axis brought the last glaciation to an end, full stop.'],
    ['Changes in sunlight ended the ice ages, end of story, and the rest is detail.'],
    ['Summer sunshine in the far north was sufficient by itself to end the glaciation.'],
    ['Shifts in the orbit explain the glacial cycles, with no help from carbon dioxide.'],
    ['Orbital cycles drove the ice ages without any help from greenhouse gases.'],
  ])('%s', async (sentence) => {
    expect(await serious(sentence)).toContain('logic.single-cause');
  });

  it.each([
    // The orbit as the trigger only, with CO2's part granted (Shakun et al. 2012).
    ['The orbit started the deglaciation, full stop; CO2 then amplified it.'],
    // The help denied is itself denied: CO2 was needed.
    ['The orbit cannot explain the full swing without help from carbon dioxide.'],
  ])('keeps clean: %s', async (sentence) => {
    expect(await serious(sentence)).toEqual([]);
  });
});

describe('a lag taken as grounds to strike CO2 off (Parrenin et al. 2013; Shakun et al. 2012)', () => {
  it.each([
    ['Since CO2 rose centuries after the warming began, it can be crossed off the list of suspects for what ended the glaciation.'],
    ['If CO2 lags Antarctic warming in every core, the theory that CO2 contributed to the warming must be discarded.'],
    ['Because carbon dioxide trails the temperature, the possibility that it drove the deglaciation is ruled out.'],
  ])('%s', async (sentence) => {
    expect(await serious(sentence)).toContain('logic.lag-rules-out-cause');
  });

  it.each([
    // The denial is itself denied: CO2 stays a suspect.
    ['Although CO2 rose after the warming in Antarctica, it cannot be crossed off the list of suspects for what ended the glaciation.'],
    // The proposal stands: it has not been rejected.
    ['CO2 trails Antarctic temperature a little, yet the hypothesis that CO2 amplified the deglacial warming has not been rejected by any core.'],
  ])('keeps clean: %s', async (sentence) => {
    expect(await serious(sentence)).toEqual([]);
  });
});

describe('the either/or frame stated in the abstract (IPCC AR6: CO2 both feedback and forcing)', () => {
  it.each([
    ['The project will settle whether CO2 was a trigger or an amplifier, since the two roles are mutually exclusive.'],
    ['Carbon dioxide either drove the warming or answered it; the two parts exclude one another.'],
    ['The cores must tell us which one of the two was in control, carbon dioxide or the temperature.'],
  ])('%s', async (sentence) => {
    expect(await serious(sentence)).toContain('logic.either-or-causation');
  });

  it.each([
    // The frame denied: a feedback runs both ways.
    ['The two roles of CO2, trigger and amplifier, do not exclude each other.'],
    ['Asking which of the two was in control misses the point: each drove the other.'],
  ])('keeps clean: %s', async (sentence) => {
    expect(await serious(sentence)).toEqual([]);
  });
});

describe('maxims that deny the latecomer a cause (Parrenin et al. 2013: CO2 came late in Antarctica and amplified)', () => {
  it.each([
    // The latecomer named is CO2 itself: no earlier sentence needs to put temperature first.
    ['A gas that shows up after the warming has begun cannot be what set it going.'],
    ['Carbon dioxide that arrives late to the thaw can not have been the one who lit it.'],
    // An effect noun as the subject: the role, not a thing, is denied the cause.
    ['The lag of a few centuries makes CO2 a result of the warming, and a result can never be its driver.'],
    ['CO2 trailed the warming by centuries, so it was a response, and a response can never be a driver.'],
  ])('%s', async (sentence) => {
    expect(await serious(sentence)).toContain('logic.lag-rules-out-cause');
  });

  it.each([
    // Only the start is denied to the latecomer, which is right (Shakun et al. 2012).
    ['A gas that shows up after the warming has begun cannot be what started it, though it can amplify it.'],
  ])('keeps clean: %s', async (sentence) => {
    expect(await serious(sentence)).toEqual([]);
  });
});

describe('readings that keep answers and old views clean (common practice of debunking pieces)', () => {
  it.each([
    // The writer's own former view, told as past (Parrenin et al. 2013 is the answer it goes on to give).
    ['The argument, as we used to put it, ran like this: CO2 rose after the warming in Antarctica, so CO2 cannot have caused the warming.'],
    ['I once argued that CO2 came after the warming and so could not have caused it.'],
    // A focus of two things is no single cause (correlation and physics together make the case).
    ['The match is close, but on its own it proves nothing; the absorption of infrared by CO2, plus the timing in global records, is what makes the case.'],
    // A reason set off by a comma explains the whole denial before it (Shakun et al. 2012).
    ['The Antarctic lag does not clear CO2, because once the deep ocean started releasing carbon, CO2 amplified the warming.'],
  ])('keeps clean: %s', async (sentence) => {
    expect(await serious(sentence)).toEqual([]);
  });

  it('still flags the same lag argument held as the writer\'s own', async () => {
    // Parrenin et al. 2013: the lag does not rule CO2 out.
    expect(await serious('The argument runs like this: CO2 rose after the warming in Antarctica, so CO2 cannot have caused the warming.')).toContain('logic.lag-rules-out-cause');
  });
});

describe('a sentence that picks one side of the choice is the draft\'s pick (IPCC AR6: both directions hold)', () => {
  it('flags the pick even when the next sentence grants both', async () => {
    const text = 'Either warmth drives carbon dioxide or carbon dioxide drives warmth, and the ice settles it in favour of the first. Yet both happen in the cores.';
    expect(await serious(text)).toContain('logic.either-or-causation');
  });

  it('keeps clean a choice answered with both in the next sentence', async () => {
    const text = 'Does warmth drive carbon dioxide, or does carbon dioxide drive warmth? Both: each pushed the other through the deglaciation.';
    expect(await serious(text)).toEqual([]);
  });
});

describe('whose voice a quotation or a block quote is (common practice of press offices and museum panels)', () => {
  // The claim is the correlation-as-proof error (Shakun et al. 2012: the case rests on physics and
  // on the order of events in global records, not on the match alone).
  const claim = 'The two curves rise and fall together, which proves that CO2 controls the climate.';

  it.each([
    [`"${claim}" said Dr Ana Ruiz, lead author of the study.`],
    [`"${claim}" added the project's principal investigator, Dr Ana Ruiz.`],
    [`"${claim}" said Professor Ruiz, who led the research.`],
  ])('a quotation given to the work\'s own people is the draft\'s claim: %s', async (text) => {
    expect(await serious(text)).toContain('logic.correlation-as-proof');
  });

  it('a quotation given to someone the draft answers stays a quotation', async () => {
    expect(await serious(`"${claim}" said a caller to the station.`)).toEqual([]);
  });

  it('a block quote that opens with a label of its own is a panel in the writer\'s voice', async () => {
    expect(await serious(`> **Did you know?**\n> ${claim}\n`)).toContain('logic.correlation-as-proof');
    expect(await serious(`> **Had you noticed?**\n> ${claim}\n`)).toContain('logic.correlation-as-proof');
  });

  it('a block quote under a myth label or a report stays a quotation', async () => {
    expect(await serious(`> **Myth:**\n> ${claim}\n`)).toEqual([]);
    expect(await serious(`> **What critics say:**\n> ${claim}\n`)).toEqual([]);
    expect(await serious(`> ${claim}\n`)).toEqual([]);
  });
});

describe('an ice age said to be wholly one thing (Shakun et al. 2012: orbit and CO2 together)', () => {
  it.each([
    ['The last deglaciation was 100% the orbit, and greenhouse gases had zero to do with it.'],
    ['That glacial termination was all deep-ocean carbon dioxide.'],
    ['The ice age was entirely the orbit.'],
  ])('%s', async (sentence) => {
    expect(await serious(sentence)).toContain('logic.single-cause');
  });

  it.each([
    // A share, not the whole (Shakun et al. 2012 give CO2 a large part of the global warming).
    ['The last deglaciation was not all the orbit: CO2 amplified the warming it started.'],
    ['The glacial termination was 100 metres of sea-level rise in a few thousand years.'],
  ])('keeps clean: %s', async (sentence) => {
    expect(await serious(sentence)).toEqual([]);
  });
});

describe('sufficiency in itself, with the other factor in a clause of its own (Shakun et al. 2012)', () => {
  it('flags the orbit called sufficient in itself beside CO2 denied a part', async () => {
    expect(await serious('Orbital changes were sufficient in themselves, and carbon dioxide played no part in the melt.')).toContain('logic.single-cause');
  });

  it('keeps clean the orbit sufficient to start the melt, with CO2 amplifying it', async () => {
    expect(await serious('The brighter northern summers were sufficient to start the melt, and carbon dioxide then amplified it.')).toEqual([]);
  });
});
