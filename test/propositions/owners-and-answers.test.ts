/**
 * Sentence structure that hid claims, restated in sentences of our own:
 * - a region that owns an entity ("the Earth's orbit", "the tilt of the Earth") is no temperature
 *   acting on its own, so the orbit stays the agent of a single-cause claim;
 * - a cleft may focus a possessed noun ("It was the planet's tilt that...");
 * - a negation inside a restricting phrase ("and nothing more") restricts, it denies nothing;
 * - "not the other way about" is the same reversal as "not the other way round";
 * - in threads, a reply that opens with an arrow, a handle or a bullet after a full stop is a new
 *   sentence, so its "bigger than" does not set the first poster's claim against the globe;
 * - an elliptic answer takes its subject from the question before it.
 * The science:
 * - Orbital forcing paced the deglaciation, CO2 amplified it and global temperature lagged CO2:
 *   Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915. A claim that the orbit alone
 *   ended an ice age is the single-cause error.
 * - Antarctic temperature swings exceed the global mean (polar amplification): Jouzel et al. 2007,
 *   Science 317, 793-796; global LGM cooling about 6 °C: Tierney et al. 2020, Nature 584, 569-573.
 * - Global mean sea level at the LGM about 120-135 m below present: Lambeck et al. 2014, PNAS 111,
 *   15296-15303, doi 10.1073/pnas.1411762111.
 * - EPICA Dome C's record spans about 800,000 years: EPICA community members 2004, Nature 429,
 *   623-628; Lüthi et al. 2008, Nature 453, 379-382.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { opensUtterance, splitSentences } from '../../src/prose/index.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const TOPIC = 'The Antarctic ice cores hold the CO2 record.\n\n';
const serious = async (text: string) =>
  (await checkText(TOPIC + text, { packs, format: 'markdown' })).flags.filter((f) => f.level !== 'note').map((f) => f.ruleId);

describe('a region that owns an entity', () => {
  it.each([
    "It was the Earth's orbit, and the orbit alone, that pulled the planet out of the last glaciation.",
    "The planet's wobbling orbit by itself brought the last ice age to an end.",
    'The tilt of the Earth alone finished off the last glacial period.',
    "It was the planet's tilt and nothing more that ended the glacial.",
  ])('keeps the orbit as the one agent: %s', async (text) => {
    expect(await serious(text)).toContain('logic.single-cause');
  });

  it.each([
    // The orbit set the pace, CO2 amplified: two causes, no single one.
    "The Earth's orbit set the timing of the last deglaciation, and carbon dioxide amplified the warming it began.",
    "Changes in the Earth's orbit started the melt; on their own they could not have finished it.",
  ])('passes a shared cause: %s', async (text) => {
    expect(await serious(text)).not.toContain('logic.single-cause');
  });

  it("the Earth's temperature is still a temperature", async () => {
    expect(await serious("Worldwide, the Earth's temperature climbed first and carbon dioxide trailed behind it.")).toContain('direction.global-co2-ahead-of-warming');
  });
});

describe('the other way about', () => {
  it.each([
    'The cores prove that warming drives carbon dioxide and not the other way about.',
    'Temperature pushes CO2, never the other way about.',
  ])('%s', async (text) => {
    expect(await serious(text)).toContain('logic.either-or-causation');
  });

  it('passes both ways', async () => {
    expect(await serious('Warming drives carbon dioxide and the other way about as well: each amplifies the other.')).not.toContain('logic.either-or-causation');
  });
});

describe('sentences in threads', () => {
  const texts = (text: string) => splitSentences(text, 0).map((s) => s.text);
  it.each([
    ['The core is 3 km long. ↳ @mira: It is more.', ['The core is 3 km long.', '↳ @mira: It is more.']],
    ['Nice post. @tomas_k agreed.', ['Nice post.', '@tomas_k agreed.']],
    ['First point. • Second point.', ['First point.', '• Second point.']],
    ['It fell to 185 ppm. ~40 years later it was measured again.', ['It fell to 185 ppm.', '~40 years later it was measured again.']],
    // A lower-case word or a comma after a full stop still continues the sentence (common practice).
    ['Drilled c. 1990, the core reached bedrock.', ['Drilled c. 1990, the core reached bedrock.']],
    ['See the figure (fig. 2) for the record.', ['See the figure (fig. 2) for the record.']],
  ])('%j', (input, expected) => {
    expect(texts(input)).toEqual(expected);
  });

  it("a reply's comparison does not hide the first poster's claim", async () => {
    const thread = [
      '@harbour_owl · 3 days ago',
      'The Antarctic curve on that chart simply is the temperature of the whole planet. ↳ @ice_ana: The Antarctic swing is larger than the global one.',
    ].join('\n');
    expect(await serious(thread)).toContain('scope.regional-record-as-global');
  });
});

describe('an answer takes the subject of its question', () => {
  it.each([
    ['Sea level at the height of the last ice age? About 40 m lower than today.', 'value.lgm-sea-level-lowstand'],
    ['How far back does the EPICA Dome C record go? Roughly 420,000 years.', 'value.edc-record-span'],
  ])('%s', async (text, ruleId) => {
    expect(await serious(text)).toContain(ruleId);
  });

  it.each([
    'Sea level at the height of the last ice age? About 125 m lower than today.',
    'How far back does the EPICA Dome C record go? Roughly 800,000 years.',
    // The question names no subject a value binds on: the answer stays unbound.
    'Why does any of this matter? About 40 m of coastline is at stake in our harbour plan.',
  ])('passes: %s', async (text) => {
    expect((await serious(text)).filter((id) => id.startsWith('value.'))).toEqual([]);
  });
});

describe('one utterance a line', () => {
  const texts = (text: string) => splitSentences(text, 0).map((s) => s.text);
  it.each([
    ['[09:12] Rosa: the core is long\n[09:13] Idris: how long', ['[09:12] Rosa: the core is long', '[09:13] Idris: how long']],
    ['NADIA: Welcome back\nTOBIAS: Thanks for having me', ['NADIA: Welcome back', 'TOBIAS: Thanks for having me']],
    ['Opening line\n- first point\n+ second point\n4/ fourth post', ['Opening line', '- first point', '+ second point', '4/ fourth post']],
    // A hard-wrapped sentence stays whole, capitals or not (common practice).
    ['The record from the\nAntarctic Cold Reversal is short.', ['The record from the\nAntarctic Cold Reversal is short.']],
  ])('%j', (input, expected) => {
    expect(texts(input)).toEqual(expected);
  });
});

// A writer who opens sentences in lower case ends them before a lower-case word too (chat logs and
// comment threads; common practice of reading informal English). A writer who capitalises, an
// abbreviation ("c.", "e.g.", "et al.") or an initial keeps the sentence whole.
describe('a lower-case writer\'s full stop', () => {
  const texts = (text: string) => splitSentences(text, 0).map((s) => s.text);
  it.each([
    ['[20:01] fennick: thats the greenland core tho. the global figure is much smaller', ['[20:01] fennick: thats the greenland core tho.', 'the global figure is much smaller']],
    ['miro_k: vostok is one site. the whole planet cooled less', ['miro_k: vostok is one site.', 'the whole planet cooled less']],
    ['ok so co2 was about 180 ppm. then it climbed to 280 ppm', ['ok so co2 was about 180 ppm.', 'then it climbed to 280 ppm']],
  ])('splits %j', (input, expected) => {
    expect(texts(input)).toEqual(expected);
  });

  it.each([
    'The ice at the bottom dates to c. 800,000 years ago.',
    'Some sites, e.g. the Dome C borehole, reach bedrock.',
    'Petit et al. found the same lag in the Vostok record.',
    'the ice dates to c. 21,000 BCE at that depth',
    'the lag is short, e.g. under 400 years at the onset',
    'The record is long. the next sentence opens in lower case by mistake',
  ])('keeps whole: %s', (input) => {
    expect(texts(input)).toEqual([input]);
  });
});

// Antarctica warmed while Greenland cooled in the Younger Dryas (bipolar seesaw): Pedro et al.
// 2016, Nature Geoscience 9, 51-55 (from memory); WAIS Divide Project Members 2013, Nature 500,
// 440-444 (from memory).
describe('a change said of two places', () => {
  it.each([
    'During the Younger Dryas, Antarctica and Greenland cooled in unison.',
    'Through the Younger Dryas both poles turned colder at once.',
    'In the Younger Dryas the Arctic as well as the Antarctic grew colder.',
  ])('is said of each: %s', async (text) => {
    expect(await serious(text)).toContain('direction.bipolar-seesaw-younger-dryas');
  });

  it.each([
    'During the Younger Dryas, Greenland and Europe cooled sharply while Antarctica warmed.',
    'At the Last Glacial Maximum both poles were far colder than today.',
  ])('passes: %s', async (text) => {
    expect(await serious(text)).not.toContain('direction.bipolar-seesaw-younger-dryas');
  });
});

// CO2 amplified and spread the deglacial warming (Shakun et al. 2012, above): casting it as a mere
// follower denies it that part, in any inflection of the lexicon's follower phrases.
describe('a mere follower, in any inflection', () => {
  it.each([
    'The warming came first, and carbon dioxide merely tagged along.',
    'Temperature sets off and the gas simply tags along behind.',
  ])('%s', async (text) => {
    expect(await serious(text)).toContain('logic.lag-rules-out-cause');
  });
});

describe('reports from readers and relatives', () => {
  const levels = async (text: string) => (await checkText(TOPIC + text, { packs, format: 'markdown' })).flags.filter((f) => f.ruleId === 'logic.lag-rules-out-cause').map((f) => f.level);
  it.each([
    'Many of you will have read that CO2 trails temperature, so it cannot be the cause.',
    'My neighbour keeps telling me that CO2 trails temperature, so it cannot be the cause.',
  ])('is a report, not the draft own claim: %s', async (text) => {
    expect(await levels(text)).toEqual(['note']);
  });

  it.each([
    'You can read it straight off the cores: CO2 trails temperature, so it cannot be the cause.',
    'The highest reading in the record trails temperature, so CO2 cannot be the cause.',
  ])('stays the draft own claim: %s', async (text) => {
    expect(await levels(text)).toContain('warning');
  });
});

// CO2 and temperature drove each other through the deglaciation (feedback): Shakun et al. 2012,
// above. A reply in a thread is another voice: it answers the post for its readers, not on the
// poster's behalf, so the post's either/or framing keeps its flag.
describe('another voice in a thread', () => {
  it('a reply that names the feedback does not clear the post above it', async () => {
    const thread = ['@moor_walker · 5 h', 'CO2 is an effect of the warming, not a cause of it.', '    ↳ @tidewatch · 4 h: It works both ways: each one drove the other as a feedback.'].join('\n');
    expect(await serious(thread)).toContain('logic.either-or-causation');
  });

  it('the same writer naming the feedback in the next sentence answers it (a thread reply does not)', async () => {
    expect(await serious('CO2 is an effect of the warming, not a cause of it. It works both ways: each one drove the other as a feedback.')).not.toContain('logic.either-or-causation');
  });

  it.each([
    ['↳ @tidewatch · 4 h: It works both ways.', true],
    ['[10:02] Rosa: agreed', true],
    ['Fact: it works both ways.', false],
    ['Q: which came first?', false],
    ['The core is long.', false],
  ])('%s opens an utterance: %s', (text, expected) => {
    expect(opensUtterance(text as string)).toBe(expected);
  });
});

// CO2 amplified the deglacial warming (Shakun et al. 2012, above): to deny it a passive part is a
// correct statement; to cast it as a mere passenger after the lag is the lag error.
describe('passive parts', () => {
  it.each([
    'But a lag in the Antarctic does not make carbon dioxide a bystander: once it rose it amplified the warming.',
    'CO2 is no mere passenger; it amplified the warming the orbit began.',
    'The short delay does not turn CO2 into a follower, since its heat-trapping effect acts whenever it rises.',
  ])('denied, it grants the part: %s', async (text) => {
    expect((await serious(text)).filter((id) => id.startsWith('logic.'))).toEqual([]);
  });

  it.each([
    'The lag makes carbon dioxide a mere passenger.',
    'Because CO2 trailed the warming, that makes it a mere passenger in the story.',
  ])('cast after the lag, it is the lag error: %s', async (text) => {
    expect(await serious(text)).toContain('logic.lag-rules-out-cause');
  });

  it('a correction after a negation is asserted: "not a cause, only a bystander"', async () => {
    expect(await serious('Warming came first, so CO2 was not a cause, only a bystander.')).toContain('logic.lag-rules-out-cause');
  });
});

// The CO2 rise of the last deglaciation took several thousand years (Monnin et al. 2001, Science
// 291, 112-114); Antarctic temperature and CO2 rose within a few centuries of each other (Parrenin
// et al. 2013, Science 339, 1060-1063): a separation between two curves is no duration of a rise.
describe('a separation is no duration', () => {
  it.each([
    'In the Talby record, CO2 and Antarctic temperature begin to climb within about two centuries of each other at the start of the deglaciation.',
    'At the start of the deglaciation the two curves turn upward some 200 years apart.',
  ])('%s', async (text) => {
    expect((await serious(text)).filter((id) => id.startsWith('value.'))).toEqual([]);
  });

  it('a duration of the rise is still read', async () => {
    expect(await serious('The CO2 rise at the start of the deglaciation took about 2,000 years.')).toContain('value.co2-deglacial-rise-duration');
  });
});

// 1 ka = 1,000 years before present (common practice; BP counts from AD 1950: Stuiver & Polach
// 1977, Radiocarbon 19, 355-363, from memory).
describe('a vague plural restates nothing', () => {
  it('"ka, thousands of years before present" is a definition, not a slip', async () => {
    expect((await serious('Dates on these panels use ka, thousands of years before present, so 21 ka means 21,000 years ago.')).filter((id) => id.startsWith('unit.'))).toEqual([]);
  });
});

// Orbital pacing with CO2 as amplifier (Shakun et al. 2012, above); Antarctic swings exceed the
// global mean (Jouzel et al. 2007, above).
describe('objects stay in their clause; Earth is the globe', () => {
  it.each([
    ['CO2 drives, and warming never pushes the CO2 at all.', 'logic.either-or-causation'],
    ['The gas rose afterwards, which shows it was not doing any of the warming.', 'logic.lag-rules-out-cause'],
    ['Carbon dioxide lagged, so it can hardly have been what did the warming.', 'logic.lag-rules-out-cause'],
    ["The Vostok temperature curve is, in effect, Earth's thermometer.", 'scope.regional-record-as-global'],
  ])('%s', async (text, ruleId) => {
    expect(await serious(text)).toContain(ruleId);
  });

  it.each([
    'The orbit started the melt, and CO2 amplified it and spread it around the globe.',
    "Earth's orbit paced the ice ages, and CO2 amplified the swings.",
  ])('passes: %s', async (text) => {
    expect(await serious(text)).toEqual([]);
  });
});

// The lag argument reported, not made (Shakun et al. 2012, above); ocean warming explains only part
// of the glacial-interglacial CO2 rise (Sigman & Boyle 2000, Nature 407, 859-869, from memory).
describe('reports by name and shares of a whole', () => {
  const levels = async (text: string, ruleId: string) => (await checkText(TOPIC + text, { packs, format: 'markdown' })).flags.filter((f) => f.ruleId === ruleId).map((f) => f.level);
  it.each([
    "Dr Hale's main claim is that CO2 always rose some 800 years after the warming, so it cannot be the cause.",
    'My brother-in-law insists the cores show the warming first, so CO2 cannot be the cause.',
  ])('a report: %s', async (text) => {
    expect(await levels(text, 'logic.lag-rules-out-cause')).toEqual(['note']);
  });

  it('the writer naming a record still asserts: "My data show the warming first, so CO2 cannot be the cause."', async () => {
    expect(await levels('My data show the warming first, so CO2 cannot be the cause.', 'logic.lag-rules-out-cause')).toEqual(['warning']);
  });

  it('"alone accounts for 20 to 30 ppm of the 80 to 100 ppm rise" is a share, not a single cause', async () => {
    expect(await serious('Warmer seas alone account for perhaps 20 to 30 ppm of the 80 to 100 ppm glacial-to-interglacial rise.')).not.toContain('logic.single-cause');
    expect(await serious('Warmer seas alone account for the whole glacial-to-interglacial CO2 rise.')).toContain('logic.single-cause');
  });
});

// A CO2 lag does not make CO2 a mere consequence of the warming: it amplified the deglacial warming
// and led global temperature (Shakun et al. 2012, Nature 484, 49-54). A source stressed by "itself"
// is the draft's own voice or its authority; a named outside voice stays a report.
describe('a source stressed by "itself"', () => {
  it.each([
    'Even so, the release itself concludes that the gas was a consequence of the warming rather than a cause of it.',
    'In the end the bulletin itself states that CO2 was merely a by-product of the warming, never a driver.',
    'The museum panel itself maintains that carbon dioxide was only a consequence of the warming, not a cause.',
  ])('is the writer\'s claim: %s', async (text) => {
    expect(await serious(text)).toContain('logic.either-or-causation');
  });

  it.each([
    'The op-ed itself claims that the gas was a consequence of the warming rather than a cause of it. That does not follow from the lag.',
    'Critics themselves argue that CO2 was merely a by-product of the warming. The cores show otherwise.',
  ])('stays a report: %s', async (text) => {
    expect(await serious(text)).not.toContain('logic.either-or-causation');
  });
});
