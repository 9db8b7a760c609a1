/**
 * Sole-cause claims and a lag used to rule out a cause, in wordings of our own, with the built-in
 * pack: a focus on the agent wherever it stands, a sufficiency predicate, a share word, informal
 * verbs of making and ending an ice age, and a later arrival as the premise of a denied cause; and
 * the correct look-alikes that must stay clean.
 *
 * The science behind the expected flags:
 * - Hays, Imbrie & Shackleton 1976 (Science 194, 1121-1132, doi 10.1126/science.194.4270.1121):
 *   the orbital cycles pace the ice ages, so the orbit starting a deglaciation is right.
 * - Shakun et al. 2012 (Nature 484, 49-54, doi 10.1038/nature10915): CO2 amplified the deglacial
 *   warming and global temperature lagged it, so neither the orbit nor CO2 ended an ice age alone.
 * - Parrenin et al. 2013 (Science 339, 1060-1063, doi 10.1126/science.1226368): Antarctic
 *   temperature and CO2 rose within a few centuries of each other; a lag is no proof CO2 did
 *   none of the warming.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkReasoning } from '../../src/checks/reasoning/index.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const SINGLE = 'logic.single-cause';
const LAG = 'logic.lag-rules-out-cause';

/** The rule ids raised as warnings or errors on the last sentence of the paragraph. */
function serious(paragraph: string[]): string[] {
  return checkReasoning(paragraph, paragraph.length - 1, packs)
    .filter((f) => f.level !== 'note')
    .map((f) => f.ruleId);
}

// Wrong by Shakun et al. 2012 and Hays, Imbrie & Shackleton 1976: one factor named the only cause.
const SOLE_CAUSE: string[] = [
  // a focus word on the agent, before, after or set off by commas
  'The orbit by itself ended the last ice age.',
  'The wobble of the orbit, acting alone, brought the last glaciation to an end.',
  'Carbon dioxide on its own pulled the world out of the last glaciation.',
  'Nothing but carbon dioxide carried the Earth into and out of each glaciation.',
  'The ice ages were switched off by the orbit and by nothing else.',
  'Each glaciation was brought to an end by the tilt of the Earth\'s axis and by nothing else.',
  'Nothing but the Earth\'s orbit was needed to finish off the last glaciation.',
  'Stronger northern sunshine melted the great ice sheets all by itself.',
  'Carbon dioxide pulled the planet out of the ice age on its own, with the orbit a bystander.',
  // a share word or a predicate noun restricted
  'The orbit was the single cause of the ice ages.',
  'Carbon dioxide was the sole driver of the glacial cycles.',
  'The orbit was the only thing needed to end the ice age.',
  // a sufficiency predicate with the agent as its subject
  'The wobble of the orbit was enough to end the last ice age.',
  'Carbon dioxide was sufficient to end the glaciation.',
  'A change in sunshine was all it took to end the ice age.',
  'CO2 was all that was needed to end the glaciation.',
  'The orbit did all the work of ending the last glaciation.',
  'CO2 came second, which means the sun did it all.',
  // informal verbs of making and ending an ice age, under a focus
  'CO2 alone switched the ice ages on and off.',
  'Only the orbit switched off the last ice age.',
  'Carbon dioxide, on its own, flipped the planet in and out of ice ages.',
  'The orbit alone hauled the planet out of the ice age.',
  'The orbit alone brought about the start of the glaciation.',
  'CO2 alone caused the end of the last ice age.',
  'The orbit did it alone; CO2 was just along for the ride.',
];

// Right, or not a sole-cause claim: must raise no warning.
const SOLE_CAUSE_CLEAN: string[] = [
  // the orbit could not have done it alone (Shakun et al. 2012)
  'The orbit alone could not have done it.',
  'The orbit alone could not have pulled the planet out of the ice age.',
  'The orbital push by itself was too weak to end the ice age.',
  'Stronger northern sunshine could not have melted the great ice sheets by itself.',
  'The orbit alone was not enough to end the ice age.',
  // the orbit started the deglaciation and CO2 amplified it (Hays et al. 1976; Shakun et al. 2012)
  'The orbit started the deglaciation and CO2 amplified it.',
  'The orbit started the melt; carbon dioxide then did most of the work.',
  // a share of the effect: a number for the reference check, no sole cause (unbound here)
  'CO2 alone explains about a third of the glacial cooling.',
  'CO2 by itself explains about half of the glacial cooling.',
  'The orbit alone accounts for roughly 40 percent of the warming.',
  // "enough" as a degree or as potency, not sufficiency for an ice age
  'CO2 rose enough to warm the planet by a few degrees.',
  'That may sound tiny, roughly four molecules in every thousand, but it is enough to shift the balance of energy.',
  'The snow stays open to the air until it is buried deep enough to seal the bubbles.',
  // the claim mentioned by name in quotation marks, not made
  'Every week the "curves line up so CO2 did it all" line comes back, and it is wrong.',
];

// Reported and rejected: the claim is not the draft's own (a note at most).
const REPORTED: string[] = [
  'Some say the orbit alone did it; the ice cores show otherwise.',
  'Some say the orbit alone ended the ice age, but the cores tell a different story.',
];

describe('sole-cause claims in any wording', () => {
  it.each(SOLE_CAUSE)('flags %j', (sentence) => {
    expect(serious([sentence])).toContain(SINGLE);
  });
  it.each(SOLE_CAUSE_CLEAN)('keeps %j clean', (sentence) => {
    expect(serious([sentence])).toEqual([]);
  });
  it.each(REPORTED)('raises no warning on the reported %j', (sentence) => {
    expect(serious([sentence])).toEqual([]);
  });
});

// Wrong by Parrenin et al. 2013 and Shakun et al. 2012: a late arrival used to deny CO2 any part.
const LATE_ARRIVAL: string[][] = [
  ["CO2 showed up late, so it can't have done any of the warming."],
  ['CO2 arrived too late to have caused any of the heating.'],
  ['CO2 came in trailing the temperature, which means it did none of the warming.'],
  ['The temperature rose first, which means CO2 did none of the warming.'],
  ['CO2 followed the warming; therefore it was not the cause.'],
  // across a sentence boundary, with the conclusion drawn by "So"
  ['CO2 rose second.', 'So it cannot have warmed the planet.'],
  ['The warming came first.', "So it's the sun doing it, not CO2."],
];

// A lag stated without a conclusion, or with CO2 still granted its part: clean.
const LATE_ARRIVAL_CLEAN: string[][] = [
  ['CO2 rose a few centuries after Antarctic temperature.'],
  ['CO2 lagged Antarctic temperature by a few centuries at the start of the deglaciation.'],
  ['CO2 came late, but it still did much of the warming.'],
];

describe('a later arrival used to rule out a cause', () => {
  it.each(LATE_ARRIVAL)('flags %j', (...paragraph) => {
    expect(serious(paragraph)).toContain(LAG);
  });
  it.each(LATE_ARRIVAL_CLEAN)('keeps %j clean', (...paragraph) => {
    expect(serious(paragraph)).toEqual([]);
  });
});
