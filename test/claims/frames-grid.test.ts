/**
 * The frames grid: a dozen claims of the built-in pack's reference values, each said with a right
 * and with a wrong number in many syntactic frames of our own (active, passive, a fronted
 * adverbial, an apposition, a parenthesis, a relative clause, two subjects in one sentence,
 * "respectively", coordinated clauses, a list after a lead-in, a subject carried from the sentence
 * before, a question, a cleft, a comparison, numbers in words). The whole engine reads each draft
 * (checkText). A wrong number must be flagged with its own reference value and a correction that
 * carries the reference number; a right number must stay clean; a number must never be bound to
 * the other subject of its sentence. The hit rate per frame is printed and held to floors.
 *
 * Every sentence here is our own; the reference values are the pack's, their sources named beside
 * each claim as the pack names them.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { Flag } from '../../src/types.js';

const packs = await loadPacks([]);

/** How a number is written: in digits and in words. */
type Written = [digits: string, words: string];

/** One claim of a reference value and the slots the frames fill. `n` is where the number goes. */
interface Claim {
  key: string;
  /** The reference values a wrong number may be flagged under (the pack's ids). */
  ids: string[];
  /** The number the correction must carry. */
  ref: string;
  right: Written;
  wrong: Written;
  /** The subject as it opens a sentence, and its short name. */
  subject: string;
  name: string;
  /** The predicate with the number: "reaches back n". */
  verb: (n: string) => string;
  passive: (n: string) => string;
  fronted: (n: string) => string;
  /** A noun phrase that renames the subject: "Vostok, <apposition>, ...". */
  apposition: string;
  paren: (n: string) => string;
  /** What follows a relative clause: "The Vostok core, which ..., <rest>." */
  rest: string;
  lead: string;
  item: (n: string) => string;
  /** A sentence naming the subject with no number, and the pronoun that carries it on. */
  intro: string;
  pronoun: string;
  cleft: (n: string) => string;
}

const cap = (s: string): string => s.charAt(0).toUpperCase() + s.slice(1);

const CLAIMS: Claim[] = [
  {
    // Vostok: about 420,000 years (Petit et al. 1999, doi:10.1038/20859).
    key: 'vostok-span', ids: ['vostok-record-span'], ref: '420,000',
    right: ['about 420,000 years', 'some four hundred and twenty thousand years'],
    wrong: ['about 800,000 years', 'some eight hundred thousand years'],
    subject: 'the Vostok core', name: 'Vostok',
    verb: (n) => `reaches back ${n}`,
    passive: (n) => `${n} of climate history are recorded in the Vostok core`,
    fronted: (n) => `On the high East Antarctic plateau, the Vostok core reaches back ${n}`,
    apposition: 'the Russian core near the lake',
    paren: (n) => `The Vostok core (a record of ${n}) changed how we read the ice ages`,
    rest: 'was drilled in the 1990s',
    lead: 'What the Vostok core gives us:', item: (n) => `a record that reaches back ${n}`,
    intro: 'The Vostok core was drilled by a Russian, French and American team.', pronoun: 'It',
    cleft: (n) => `It is the Vostok core that reaches back ${n}`,
  },
  {
    // EPICA Dome C: about 800,000 years (Jouzel et al. 2007, doi:10.1126/science.1141038;
    // Lüthi et al. 2008, doi:10.1038/nature06949).
    key: 'edc-span', ids: ['edc-record-span'], ref: '800,000',
    right: ['about 800,000 years', 'some eight hundred thousand years'],
    wrong: ['about 420,000 years', 'some four hundred and twenty thousand years'],
    subject: 'the EPICA Dome C core', name: 'EPICA Dome C',
    verb: (n) => `goes back ${n}`,
    passive: (n) => `${n} of climate history are held in the EPICA Dome C core`,
    fronted: (n) => `In the heart of East Antarctica, the EPICA Dome C core goes back ${n}`,
    apposition: 'the European core',
    paren: (n) => `The EPICA Dome C record (${n}) is the longest we have`,
    rest: 'was finished by a European team',
    lead: 'What the EPICA Dome C core gives us:', item: (n) => `a record that goes back ${n}`,
    intro: 'The EPICA Dome C core was drilled by ten European nations.', pronoun: 'It',
    cleft: (n) => `It is the EPICA Dome C core that goes back ${n}`,
  },
  {
    // Vostok: drilled to 3,623 m in January 1998 (Petit et al. 1997, doi:10.1038/387359a0;
    // Petit et al. 1999, doi:10.1038/20859).
    key: 'vostok-depth', ids: ['vostok-drilled-depth'], ref: '3,623',
    right: ['3,623 metres', 'three thousand six hundred and twenty-three metres'],
    wrong: ['3,270 metres', 'three thousand two hundred and seventy metres'],
    subject: 'the Vostok borehole', name: 'Vostok',
    verb: (n) => `was drilled down to ${n}`,
    passive: (n) => `A depth of ${n} was reached by the Vostok drill`,
    fronted: (n) => `In January 1998, the Vostok drill reached a depth of ${n}`,
    apposition: 'the Russian station',
    paren: (n) => `The Vostok borehole (${n} deep) stops short of the lake`,
    rest: 'stopped short of the lake below',
    lead: 'Facts about the Vostok borehole:', item: (n) => `it was drilled down to ${n}`,
    intro: 'The Vostok borehole was drilled through the thick East Antarctic ice.', pronoun: 'It',
    cleft: (n) => `It is the Vostok borehole that was drilled down to ${n}`,
  },
  {
    // EPICA Dome C: about 3,270 m (Lüthi et al. 2008, doi:10.1038/nature06949; Bouchet et al. 2023,
    // doi:10.5194/cp-19-2257-2023).
    key: 'edc-depth', ids: ['edc-drilled-depth'], ref: '3,270',
    right: ['about 3,270 metres', 'about three thousand two hundred and seventy metres'],
    wrong: ['about 3,623 metres', 'about three thousand six hundred and twenty-three metres'],
    subject: 'the EPICA Dome C borehole', name: 'EPICA Dome C',
    verb: (n) => `was drilled down to ${n}`,
    passive: (n) => `A depth of ${n} was reached by the EPICA Dome C drill`,
    fronted: (n) => `In late 2004, the EPICA Dome C drill reached a depth of ${n}`,
    apposition: 'the European site',
    paren: (n) => `The EPICA Dome C borehole (${n} deep) nearly reached bedrock`,
    rest: 'nearly reached the rock below',
    lead: 'Facts about the EPICA Dome C borehole:', item: (n) => `it was drilled down to ${n}`,
    intro: 'The EPICA Dome C borehole was drilled by a European team.', pronoun: 'It',
    cleft: (n) => `It is the EPICA Dome C borehole that was drilled down to ${n}`,
  },
  {
    // Glacial CO2 about 172-200 ppm (Lüthi et al. 2008, doi:10.1038/nature06949; Siegenthaler et al.
    // 2005, doi:10.1126/science.1120130).
    key: 'co2-glacial', ids: ['co2-glacial-minimum-typical', 'co2-lgm'], ref: '180',
    right: ['about 190 ppm', 'about one hundred and ninety parts per million'],
    wrong: ['about 280 ppm', 'about two hundred and eighty parts per million'],
    subject: 'glacial carbon dioxide', name: 'glacial carbon dioxide',
    verb: (n) => `sat at ${n}`,
    passive: (n) => `Levels of ${n} were measured for carbon dioxide in the glacial periods`,
    fronted: (n) => `In the glacial periods, carbon dioxide sat at ${n}`,
    apposition: 'the gas trapped in the coldest ice',
    paren: (n) => `Glacial carbon dioxide (${n}) is read from bubbles in the ice`,
    rest: 'kept the ice ages cold',
    lead: 'Carbon dioxide in the glacial periods:', item: (n) => `it sat at ${n}`,
    intro: 'Carbon dioxide swung with the ice ages, and the glacial periods were its lows.', pronoun: 'In the glacial periods it',
    cleft: (n) => `It is in the glacial periods that carbon dioxide sat at ${n}`,
  },
  {
    // Interglacial CO2 about 240-300 ppm (Lüthi et al. 2008, doi:10.1038/nature06949; Siegenthaler et
    // al. 2005, doi:10.1126/science.1120130).
    key: 'co2-interglacial', ids: ['co2-interglacial-maximum-typical'], ref: '280',
    right: ['about 280 ppm', 'about two hundred and eighty parts per million'],
    wrong: ['about 190 ppm', 'about one hundred and ninety parts per million'],
    subject: 'interglacial carbon dioxide', name: 'interglacial carbon dioxide',
    verb: (n) => `stood at ${n}`,
    passive: (n) => `Levels of ${n} were measured for carbon dioxide in the interglacials`,
    fronted: (n) => `In the interglacials, carbon dioxide stood at ${n}`,
    apposition: 'the gas trapped in the warmest ice',
    paren: (n) => `Interglacial carbon dioxide (${n}) is read from the same bubbles`,
    rest: 'kept the warm spells warm',
    lead: 'Carbon dioxide in the interglacials:', item: (n) => `it stood at ${n}`,
    intro: 'Carbon dioxide swung with the ice ages, and the interglacials were its highs.', pronoun: 'In the interglacials it',
    cleft: (n) => `It is in the interglacials that carbon dioxide stood at ${n}`,
  },
  {
    // The Last Glacial Maximum: the world about 6 °C colder, estimates from about 4 to 7 °C (Gulev et
    // al. 2021, doi:10.1017/9781009157896.004; Tierney et al. 2020, doi:10.1038/s41586-020-2617-x).
    key: 'lgm-cooling', ids: ['gmst-lgm-to-preindustrial-warming', 'gmst-lgm-cooling-ar6'], ref: '6',
    right: ['about 6 °C', 'about six degrees'],
    wrong: ['about 15 °C', 'about fifteen degrees'],
    subject: 'the world at the Last Glacial Maximum', name: 'the Last Glacial Maximum',
    verb: (n) => `was ${n} colder than before industry`,
    passive: (n) => `A global cooling of ${n} is estimated for the Last Glacial Maximum`,
    fronted: (n) => `At the Last Glacial Maximum, the world was ${n} colder than before industry`,
    apposition: 'the coldest part of the last ice age',
    paren: (n) => `The world at the Last Glacial Maximum (${n} colder than before industry) had ice over much of the north`,
    rest: 'had ice over much of the north',
    lead: 'The world at the Last Glacial Maximum:', item: (n) => `it was ${n} colder than before industry`,
    intro: 'The Last Glacial Maximum came about 21,000 years ago.', pronoun: 'The world then',
    cleft: (n) => `It is at the Last Glacial Maximum that the world was ${n} colder than before industry`,
  },
  {
    // The last deglaciation took about 7,000 years (Chowdhry Beeman et al. 2019,
    // doi:10.5194/cp-15-913-2019; Clark et al. 2012, doi:10.1073/pnas.1116619109).
    key: 'deglaciation-length', ids: ['termination-1-duration'], ref: '7,000',
    right: ['about 7,000 years', 'about seven thousand years'],
    wrong: ['about 2,000 years', 'about two thousand years'],
    subject: 'the last deglaciation', name: 'the last deglaciation',
    verb: (n) => `lasted ${n}`,
    passive: (n) => `A span of ${n} is needed for the last deglaciation to run its course`,
    fronted: (n) => `From start to finish, the last deglaciation lasted ${n}`,
    apposition: 'the way out of the last ice age',
    paren: (n) => `The last deglaciation (${n} from start to finish) reshaped the coasts`,
    rest: 'reshaped the coasts',
    lead: 'The last deglaciation in brief:', item: (n) => `it lasted ${n}`,
    intro: 'The last deglaciation took the world out of the ice age.', pronoun: 'It',
    cleft: (n) => `It is the last deglaciation that lasted ${n}`,
  },
  {
    // The last deglaciation began about 18,000 years ago (Chowdhry Beeman et al. 2019,
    // doi:10.5194/cp-15-913-2019; Clark et al. 2009, doi:10.1126/science.1172873).
    key: 'deglaciation-start', ids: ['termination-1-start'], ref: '18,000',
    right: ['about 18,000 years ago', 'about eighteen thousand years ago'],
    wrong: ['about 30,000 years ago', 'about thirty thousand years ago'],
    subject: 'the last deglaciation', name: 'the last deglaciation',
    verb: (n) => `began ${n}`,
    passive: (n) => `The start of the last deglaciation is dated to ${n}`,
    fronted: (n) => `In the Southern Hemisphere, the last deglaciation began ${n}`,
    apposition: 'the way out of the last ice age',
    paren: (n) => `The start of the last deglaciation (${n}) shows first in Antarctica`,
    rest: 'shows first in Antarctic ice',
    lead: 'The last deglaciation in brief:', item: (n) => `it began ${n}`,
    intro: 'The last deglaciation took the world out of the ice age.', pronoun: 'It',
    cleft: (n) => `It is ${n} that the last deglaciation began`,
  },
  {
    // The last deglaciation was over about 11,500 years ago (Chowdhry Beeman et al. 2019,
    // doi:10.5194/cp-15-913-2019; Walker et al. 2009, doi:10.1002/jqs.1227).
    key: 'deglaciation-end', ids: ['termination-1-end'], ref: '11,500',
    right: ['about 11,500 years ago', 'about eleven thousand five hundred years ago'],
    wrong: ['about 5,000 years ago', 'about five thousand years ago'],
    subject: 'the last deglaciation', name: 'the last deglaciation',
    verb: (n) => `ended ${n}`,
    passive: (n) => `The end of the last deglaciation is dated to ${n}`,
    fronted: (n) => `In the ice-core records, the last deglaciation ended ${n}`,
    apposition: 'the way out of the last ice age',
    paren: (n) => `The end of the last deglaciation (${n}) opened the Holocene`,
    rest: 'opened the Holocene',
    lead: 'The last deglaciation in brief:', item: (n) => `it ended ${n}`,
    intro: 'The last deglaciation took the world out of the ice age.', pronoun: 'It',
    cleft: (n) => `It is ${n} that the last deglaciation ended`,
  },
  {
    // Antarctic temperature and CO2 moved within a few centuries of each other in the last
    // deglaciation (Pedro et al. 2012, doi:10.5194/cp-8-1213-2012; Parrenin et al. 2013,
    // doi:10.1126/science.1226368; Chowdhry Beeman et al. 2019, doi:10.5194/cp-15-913-2019).
    key: 'antarctic-lag', ids: ['antarctic-co2-phasing-termination-1-consensus', 'lag-pedro2012', 'lag-parrenin2013'], ref: '200',
    right: ['about 300 years', 'about three hundred years'],
    wrong: ['about 2,000 years', 'about two thousand years'],
    subject: 'carbon dioxide in the last deglaciation', name: 'carbon dioxide',
    verb: (n) => `lagged Antarctic warming by ${n}`,
    passive: (n) => `Antarctic warming was trailed by the carbon dioxide rise by ${n} in the last deglaciation`,
    fronted: (n) => `In the last deglaciation, carbon dioxide lagged Antarctic warming by ${n}`,
    apposition: 'the gas in the bubbles',
    paren: (n) => `In the last deglaciation the carbon dioxide lag behind Antarctic warming (${n}) was short`,
    rest: 'rose with Antarctic temperature',
    lead: 'Carbon dioxide and Antarctic warming in the last deglaciation:', item: (n) => `carbon dioxide lagged Antarctic warming by ${n}`,
    intro: 'In the last deglaciation Antarctic warming and carbon dioxide rose together.', pronoun: 'The gas',
    cleft: (n) => `It is carbon dioxide that lagged Antarctic warming by ${n} in the last deglaciation`,
  },
  {
    // The obliquity period is about 41,000 years (Berger 1978,
    // doi:10.1175/1520-0469(1978)035<2362:LTVODI>2.0.CO;2; Hays et al. 1976, doi:10.1126/science.194.4270.1121).
    key: 'obliquity', ids: ['milankovitch-obliquity-period'], ref: '41,000',
    right: ['about 41,000 years', 'about forty-one thousand years'],
    wrong: ['about 100,000 years', 'about one hundred thousand years'],
    subject: 'the tilt of Earth’s axis', name: 'obliquity',
    verb: (n) => `completes a cycle in ${n}`,
    passive: (n) => `A period of ${n} is found for obliquity`,
    fronted: (n) => `In the orbital theory of the ice ages, the tilt of Earth’s axis completes a cycle in ${n}`,
    apposition: 'the tilt of the axis',
    paren: (n) => `Obliquity (a period of ${n}) paces the older ice ages`,
    rest: 'paced the older ice ages',
    lead: 'The tilt of Earth’s axis:', item: (n) => `it completes a cycle in ${n}`,
    intro: 'The tilt of Earth’s axis changes slowly.', pronoun: 'It',
    cleft: (n) => `It is the tilt of Earth’s axis that completes a cycle in ${n}`,
  },
  {
    // The eccentricity period is about 100,000 years (Hays et al. 1976, doi:10.1126/science.194.4270.1121;
    // Berger 1978, doi:10.1175/1520-0469(1978)035<2362:LTVODI>2.0.CO;2).
    key: 'eccentricity', ids: ['milankovitch-eccentricity-period'], ref: '100,000',
    right: ['about 100,000 years', 'about one hundred thousand years'],
    wrong: ['about 41,000 years', 'about forty-one thousand years'],
    subject: 'the shape of Earth’s orbit', name: 'eccentricity',
    verb: (n) => `completes a cycle in ${n}`,
    passive: (n) => `A period of ${n} is found for eccentricity`,
    fronted: (n) => `In the orbital theory of the ice ages, the shape of Earth’s orbit completes a cycle in ${n}`,
    apposition: 'the stretch of the orbit',
    paren: (n) => `Eccentricity (a period of ${n}) is the slowest of the three`,
    rest: 'is the slowest of the three',
    lead: 'The shape of Earth’s orbit:', item: (n) => `it completes a cycle in ${n}`,
    intro: 'The shape of Earth’s orbit changes slowly.', pronoun: 'It',
    cleft: (n) => `It is the shape of Earth’s orbit that completes a cycle in ${n}`,
  },
];

const byKey = new Map(CLAIMS.map((c) => [c.key, c]));
const claim = (key: string): Claim => {
  const found = byKey.get(key);
  if (!found) throw new Error(`no claim ${key}`);
  return found;
};

/** A draft with numbered slots ⟦0⟧, ⟦1⟧ for the numbers and the claim each one states. */
interface Case { frame: string; template: string; claims: Claim[]; wrong: boolean[]; words?: boolean }

const SINGLE: Record<string, (c: Claim, n: string) => string> = {
  active: (c, n) => `${cap(c.subject)} ${c.verb(n)}.`,
  passive: (c, n) => `${c.passive(n)}.`,
  fronted: (c, n) => `${c.fronted(n)}.`,
  apposition: (c, n) => `${cap(c.subject)}, ${c.apposition}, ${c.verb(n)}.`,
  parenthesis: (c, n) => `${c.paren(n)}.`,
  relative: (c, n) => `${cap(c.subject)}, which ${c.verb(n)}, ${c.rest}.`,
  'lead-in list': (c, n) => `${c.lead}\n\n- ${c.item(n)};\n- it is read in many explainers.`,
  'carried subject': (c, n) => `${c.intro} ${c.pronoun} ${c.verb(n)}.`,
  question: (c, n) => `Did you know that ${c.subject} ${c.verb(n)}?`,
  cleft: (c, n) => `${c.cleft(n)}.`,
  'in words': (c, n) => `${cap(c.subject)} ${c.verb(n)}.`,
};

/** Two claims in one sentence; `gapped` and `respectively` are worded per pair. */
interface Pair {
  a: string;
  b: string;
  /** The two state one measure, so "X, against Y for Z" compares them. */
  comparable: boolean;
  /** The two have subjects of their own (not one subject's start and end). */
  distinct: boolean;
  gapped?: (x: string, y: string) => string;
  respectively?: (x: string, y: string) => string;
  /** A lead-in sentence and a list with one item per subject. */
  list?: (x: string, y: string) => string;
}

const PAIRS: Pair[] = [
  {
    a: 'vostok-span', b: 'edc-span', comparable: true, distinct: true,
    gapped: (x, y) => `Vostok covers ${x} and EPICA Dome C ${y}.`,
    respectively: (x, y) => `The Vostok and EPICA Dome C records reach back ${x} and ${y} respectively.`,
    list: (x, y) => `How far back the two cores reach:\n\n- Vostok: ${x}\n- EPICA Dome C: ${y}`,
  },
  {
    a: 'vostok-depth', b: 'edc-depth', comparable: true, distinct: true,
    gapped: (x, y) => `The drill reached ${x} at Vostok and ${y} at EPICA Dome C.`,
    respectively: (x, y) => `The Vostok and EPICA Dome C boreholes were drilled down to ${x} and ${y}, respectively.`,
    list: (x, y) => `How deep the two boreholes were drilled:\n\n- Vostok, ${x};\n- EPICA Dome C, ${y}.`,
  },
  {
    a: 'co2-glacial', b: 'co2-interglacial', comparable: true, distinct: true,
    gapped: (x, y) => `Carbon dioxide sat at ${x} in the glacial periods and at ${y} in the interglacials.`,
    respectively: (x, y) => `In glacials and interglacials carbon dioxide stood at ${x} and ${y} respectively.`,
    list: (x, y) => `Carbon dioxide over the ice-age cycle:\n\n- in the glacial periods, ${x}\n- in the interglacials, ${y}`,
  },
  {
    a: 'deglaciation-start', b: 'deglaciation-end', comparable: false, distinct: false,
    gapped: (x, y) => `The last deglaciation began ${x} and ended ${y}.`,
    respectively: (x, y) => `The last deglaciation began and ended ${x} and ${y} respectively.`,
    list: (x, y) => `The last deglaciation:\n\n- it began ${x};\n- it ended ${y}.`,
  },
  {
    a: 'obliquity', b: 'eccentricity', comparable: true, distinct: true,
    gapped: (x, y) => `Obliquity completes a cycle in ${x} and eccentricity in ${y}.`,
    respectively: (x, y) => `Obliquity and eccentricity have periods of ${x} and ${y}, respectively.`,
    list: (x, y) => `The orbital periods:\n\n1. obliquity, ${x}\n2. eccentricity, ${y}`,
  },
  { a: 'deglaciation-length', b: 'antarctic-lag', comparable: false, distinct: true },
];

const PAIRED: Record<string, (a: Claim, b: Claim, x: string, y: string, p: Pair) => string | undefined> = {
  'two subjects': (_a, _b, x, y, p) => p.gapped?.(x, y),
  respectively: (_a, _b, x, y, p) => p.respectively?.(x, y),
  'coordinated clauses': (a, b, x, y) => `${cap(a.subject)} ${a.verb(x)}, and ${b.subject} ${b.verb(y)}.`,
  comparison: (a, b, x, y, p) => (p.comparable ? `${cap(a.subject)} ${a.verb(x)}, against ${y} for ${b.name}.` : undefined),
  'list of subjects': (_a, _b, x, y, p) => p.list?.(x, y),
  'turn (while)': (a, b, x, y, p) => (p.distinct ? `${cap(a.subject)} ${a.verb(x)}, while ${b.subject} ${b.verb(y)}.` : undefined),
  'other in a relative clause': (a, b, x, y, p) => (p.distinct ? `Unlike ${b.subject}, which ${b.verb(y)}, ${a.subject} ${a.verb(x)}.` : undefined),
  'other in brackets': (a, b, x, y, p) => (p.comparable ? `${cap(a.subject)} ${a.verb(x)} (${b.name}: ${y}).` : undefined),
  'gap after a semicolon': (a, b, x, y, p) => (p.comparable ? `${cap(a.subject)} ${a.verb(x)}; ${b.name}, ${y}.` : undefined),
  'two sentences, by contrast': (a, b, x, y, p) => (p.distinct ? `${cap(b.subject)} ${b.verb(y)}. ${cap(a.subject)}, by contrast, ${a.verb(x)}.` : undefined),
};

const slot = (i: number): string => `⟦${i}⟧`;

function cases(): Case[] {
  const out: Case[] = [];
  for (const [frame, render] of Object.entries(SINGLE)) {
    for (const c of CLAIMS) {
      for (const wrong of [true, false]) out.push({ frame, template: render(c, slot(0)), claims: [c], wrong: [wrong], words: frame === 'in words' });
    }
  }
  for (const [frame, render] of Object.entries(PAIRED)) {
    for (const p of PAIRS) {
      const a = claim(p.a);
      const b = claim(p.b);
      const template = render(a, b, slot(0), slot(1), p);
      if (template === undefined) continue;
      for (const wrong of [[true, false], [false, true], [false, false], [true, true]]) out.push({ frame, template, claims: [a, b], wrong });
    }
  }
  return out;
}

/** The draft's text and where each number stands in it. */
function fill(c: Case): { text: string; at: [number, number][] } {
  let text = c.template;
  const at: [number, number][] = c.claims.map(() => [0, 0]);
  // Slots are filled in the order they stand, so a number filled later never moves one filled before.
  const order = c.claims.map((_, i) => i).sort((a, b) => c.template.indexOf(slot(a)) - c.template.indexOf(slot(b)));
  for (const i of order) {
    const cl = c.claims[i]!;
    const written = c.wrong[i] ? cl.wrong : cl.right;
    const n = written[c.words ? 1 : 0];
    const start = text.indexOf(slot(i));
    text = text.slice(0, start) + n + text.slice(start + slot(i).length);
    at[i] = [start, start + n.length];
  }
  // A sentence that opens with a number in words still opens with a capital.
  return { text: text.charAt(0).toUpperCase() + text.slice(1), at };
}

type Outcome = 'hit' | 'miss' | 'cross';

/** One number's outcome: flagged right (or clean when right), missed, or bound to the other subject. */
function judge(flags: Flag[], [start, end]: [number, number], own: Claim, other: Claim | undefined, wrong: boolean): Outcome {
  const mine = flags.filter((f) => f.span.start.offset < end && f.span.end.offset > start);
  if (other && mine.some((f) => other.ids.some((id) => f.ruleId === `value.${id}`) && !own.ids.some((id) => f.ruleId === `value.${id}`))) return 'cross';
  if (!wrong) return mine.length === 0 ? 'hit' : 'miss';
  return mine.some((f) => own.ids.some((id) => f.ruleId === `value.${id}`) && (f.correction ?? '').includes(own.ref)) ? 'hit' : 'miss';
}

interface Tally { hits: number; total: number; cross: number; misses: string[] }

async function runGrid(): Promise<Map<string, Tally>> {
  const tallies = new Map<string, Tally>();
  for (const c of cases()) {
    const { text, at } = fill(c);
    const { flags } = await checkText(text, { packs, path: 'grid.md' });
    const tally = tallies.get(c.frame) ?? { hits: 0, total: 0, cross: 0, misses: [] };
    c.claims.forEach((own, i) => {
      const outcome = judge(flags, at[i]!, own, c.claims[1 - i], c.wrong[i]!);
      tally.total += 1;
      if (outcome === 'hit') tally.hits += 1;
      else {
        if (outcome === 'cross') tally.cross += 1;
        tally.misses.push(`${outcome} ${c.wrong[i] ? 'wrong' : 'right'} ${own.key}: ${text.replace(/\n+/gu, ' ')}`);
      }
    });
    tallies.set(c.frame, tally);
  }
  return tallies;
}

/**
 * Floors per frame (hits of the numbers read), at what the binder reaches. Before this round's
 * structure rules the grid read 13/26 in the lead-in list, 25/26 in parentheses, 36/40 with
 * "respectively", 30/40 in the list of subjects and 28/40 with the other subject in a relative
 * clause, and bound 4 numbers of the brackets and semicolon frames to the other subject. Left: a
 * subject carried by "then" ("The world then was ...") and a second list item with no subject of its
 * own ("- it ended ..."), which is not read at all (its block names no subject and is not beside one).
 */
const FLOORS: Record<string, number> = {
  active: 1, passive: 1, fronted: 1, apposition: 1, parenthesis: 1, relative: 1, 'lead-in list': 1,
  'carried subject': 25 / 26, question: 1, cleft: 1, 'in words': 1,
  'two subjects': 1, respectively: 1, 'coordinated clauses': 1, comparison: 1, 'list of subjects': 38 / 40,
  'turn (while)': 1, 'other in a relative clause': 1, 'other in brackets': 1, 'gap after a semicolon': 1, 'two sentences, by contrast': 1,
};

describe('the frames grid: numbers attach through sentence structure', () => {
  it('holds each frame at its floor and never binds a number to the other subject', async () => {
    const tallies = await runGrid();
    const lines: string[] = [];
    let hits = 0;
    let total = 0;
    let cross = 0;
    for (const [frame, t] of tallies) {
      hits += t.hits;
      total += t.total;
      cross += t.cross;
      lines.push(`  ${frame.padEnd(20)} ${String(t.hits).padStart(3)}/${String(t.total).padEnd(3)} ${((100 * t.hits) / t.total).toFixed(1).padStart(5)}%  bound to the other subject: ${t.cross}`);
    }
    console.log(`frames grid, hit rate per frame:\n${lines.join('\n')}\n  total ${hits}/${total} (${((100 * hits) / total).toFixed(1)}%), bound to the other subject ${cross}`);
    if (process.env.FRAMES_GRID_MISSES) for (const t of tallies.values()) for (const m of t.misses) console.log(m);
    for (const [frame, t] of tallies) expect(t.hits / t.total, frame).toBeGreaterThanOrEqual(FLOORS[frame] ?? 1);
    expect(cross).toBe(0);
  }, 120_000);
});
