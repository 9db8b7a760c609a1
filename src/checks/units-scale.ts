/**
 * Thousand-for-million slips: a date or span of the ice ages written in millions of years where
 * thousands were meant. "The Last Glacial Maximum, some [twenty-one million years ago]" (21,000
 * years ago); "the Vostok core reaches back [420 Ma]" (420 ka). Each subject in the table has a
 * ceiling no reading of the literature comes near; a figure in millions above it is the same
 * number in thousands, and the correction swaps the scale word (million → thousand, Ma → ka,
 * Myr → kyr). The subject must be named shortly before the figure, and words of deep time or of
 * another record (a lake, rock, sediment, the ice sheet's birth) keep the rule quiet.
 */
import type { Quantity, Source } from '../types.js';
import { CLARK_2009, HAYS_1976, LUTHI_2008, NIST_SP_811, YAN_2019, ZACHOS_2001 } from './standard-sources.js';
import type { UnitFinding } from './units-rules.js';

/** A kind of subject with the oldest age or longest span it can have, in years. */
export interface TimescaleSubject {
  what: string;
  names: string[];
  /** Words anywhere in the sentence that make a figure in millions of years plausible after all. */
  unless: string[];
  ceiling: number;
  sources: Source[];
  /** When given, the figure counts only right after one of these words ("a cycle of", "every"). */
  lead?: string[];
  /** Phrases that hold a name but name another thing ("ice age", "ice sheet" for "ice"): no name where they stand. */
  others?: string[];
  /** When true, only the thing's own age or the span it holds counts ("800 million years old", "holds 800 million years"), never a date ("... years ago"). */
  spansOnly?: boolean;
}

/** Periods before the ice ages and other records whose ages run to millions of years. */
const DEEP_TIME = ['Pliocene', 'Miocene', 'Oligocene', 'Eocene', 'Paleocene', 'Palaeocene', 'Cretaceous', 'Jurassic', 'Triassic', 'Permian', 'Cenozoic', 'Mesozoic', 'dinosaur', 'dinosaurs', 'sediment', 'sediments', 'rock', 'rocks', 'seafloor', 'sea floor', 'marine', 'fossil', 'fossils'];

/**
 * The subjects. The last glacial cycle and its events lie within the last 130,000 years (the
 * Last Glacial Maximum about 26,500-19,000 years ago, Clark et al. 2009); the oldest ice ever
 * dated is about 2.7 million years old (Yan et al. 2019), so no ice core reaches back 10 million.
 */
export const TIMESCALE_SUBJECTS: readonly TimescaleSubject[] = [
  {
    what: 'the last glacial cycle',
    names: ['Last Glacial Maximum', 'LGM', 'Younger Dryas', 'Holocene', 'last ice age', 'last glacial period', 'last glaciation', 'last deglaciation', 'Termination I', 'Bølling', 'Allerød', 'Heinrich event', 'Heinrich events', 'Antarctic Cold Reversal', 'Eemian', 'last interglacial'],
    unless: DEEP_TIME,
    ceiling: 1e6,
    sources: [CLARK_2009, NIST_SP_811],
  },
  {
    what: 'an ice core',
    // A core named by its head noun alone ("Antarctic cores tell us", "the real core", "those cores")
    // is an ice core in this writing; a sediment core, a rock core or the Earth's core is kept out below.
    names: ['ice core', 'ice cores', 'ice-core', 'Vostok core', 'Vostok record', 'Vostok ice', 'EPICA', 'Dome C', 'Dome Fuji', 'Dome A', 'GRIP', 'GISP2', 'NGRIP', 'NEEM', 'Law Dome', 'WAIS Divide', 'Talos Dome', 'Siple Dome', 'oldest ice', 'core', 'cores'],
    unless: [...DEEP_TIME, 'lake', 'ice sheet', 'ice sheets', 'ice cap', 'formed', 'began to form', 'first formed', 'glaciation of Antarctica', "Earth's core", 'Earth’s core', 'inner core', 'outer core', 'core of the Earth', 'planet', 'planets', 'star', 'stars'],
    ceiling: 1e7,
    sources: [YAN_2019, NIST_SP_811],
  },
  {
    // A numbered glacial termination ("Termination V, about 430 ka"): the ends of the glacial
    // periods of the ice-core record, Termination I about 18-11 ka to Termination IX about 800 ka
    // (Lüthi et al. 2008); none of the Pleistocene's numbered terminations is two million years old.
    what: 'a glacial termination',
    names: ['I', 'II', 'III', 'IV', 'V', 'VI', 'VII', 'VIII', 'IX', 'X', 'XI', 'XII'].flatMap((n) => [`Termination ${n}`, `Terminations ${n}`, `T-${n}`]),
    unless: DEEP_TIME,
    ceiling: 2e6,
    sources: [LUTHI_2008, NIST_SP_811],
  },
  {
    // The orbital cycles that pace the ice ages last about 19,000 to 100,000 years (Hays et al. 1976),
    // the longest regular one about 405,000 years; none in this writing runs to ten million.
    what: 'an orbital cycle of the ice ages',
    names: ['tilt', 'axial tilt', 'obliquity', 'precession', 'eccentricity', 'orbital cycle', 'orbital cycles', 'Milankovitch', 'wobble', 'wobbles'],
    // Only the length of the cycle itself: a figure after "a cycle of" or "every" is no rock's age,
    // so "rocks" (also a verb: "the axis rocks") does not silence it; the named periods still do.
    unless: DEEP_TIME.filter((w) => !['rock', 'rocks'].includes(w)),
    lead: ['cycle of', 'cycles of', 'period of', 'periods of', 'every', 'repeats every', 'recurs every', 'rhythm of'],
    ceiling: 1e7,
    sources: [HAYS_1976, NIST_SP_811],
  },
  {
    // Ice itself, as an archive: its own age or the span of history it holds ("ice can be 800
    // million years old", "Antarctic ice holds 800 million years of history"). No ice on Earth is
    // older than the first lasting Antarctic ice sheet, about 34 million years ago (Zachos et al.
    // 2001), so a span in millions above 40 is the same number in thousands. Dates are left to the
    // named subjects above: ice reaching a place in deep time is an event, no age of the ice.
    what: 'ice on Earth today',
    names: ['ice'],
    others: ['ice age', 'ice ages', 'ice-age', 'ice sheet', 'ice sheets', 'ice cap', 'ice caps', 'ice shelf', 'ice shelves', 'sea ice', 'ice-free', 'ice free', 'icehouse', 'ice house', 'snowball'],
    unless: [...DEEP_TIME, 'Snowball', 'Cryogenian', 'glaciation', 'glaciations', 'Mars', 'Martian', 'comet', 'comets', 'moon', 'moons', 'planet', 'planets'],
    ceiling: 4e7,
    spansOnly: true,
    sources: [ZACHOS_2001, YAN_2019, NIST_SP_811],
  },
];

const S = String.raw`[\s\u00A0]`;
const words = (list: readonly string[]): RegExp =>
  new RegExp(String.raw`(?:^|[^\p{L}])(?:${list.map((w) => w.replace(/[.*+?^${}()|[\]\\]/g, '\\$&').replace(/ /g, `${S}+`)).join('|')})(?![\p{L}])`, 'iu');
const COMPILED = TIMESCALE_SUBJECTS.map((s) => ({
  subject: s,
  name: words(s.names),
  others: s.others === undefined ? undefined : new RegExp(words(s.others).source, 'giu'),
  unless: words(s.unless),
  lead: s.lead === undefined ? undefined : new RegExp(String.raw`(?:^|[^\p{L}])(?:${s.lead.map((w) => w.replace(/ /g, `${S}+`)).join('|')})${S}+(?:(?:about|around|roughly|some|nearly)${S}+)?$`, 'iu'),
}));
/** The scale word of a figure in millions, and the word for the same number in thousands. */
const SWAPS: [RegExp, string][] = [
  [/million/iu, 'thousand'],
  [/(?<![\p{L}])Ma(?![\p{L}])/u, 'ka'],
  [/(?<![\p{L}])Myr(?![\p{L}])/u, 'kyr'],
  [/(?<![\p{L}])My(?![\p{L}])/u, 'ky'],
];
/** A date counted back from now, right after its figure. */
const AGO = /^[\s\u00A0]*(?:ago|before[\s\u00A0]+(?:present|now|today))(?![\p{L}])/iu;
/** How far before the figure its subject may be named. */
const REACH = 120;

/** Words that refer back to the subject of the sentence before: "That core's record", "This cylinder", "Imagine it". */
const REFERS_BACK = /(?:^|[^\p{L}])(?:this|that|these|those|it|its|their|there)(?![\p{L}])/iu;

/**
 * Every figure in millions of years above the ceiling of the subject named before it. A sentence
 * that names no subject but refers back ("That core's record reaches back 800 Ma") takes the
 * subject of `previous`, the sentence before.
 */
export function scaleSlips(text: string, qs: Quantity[], previous?: string): UnitFinding[] {
  return qs.flatMap((q) => {
    if ((q.dimension !== 'age' && q.dimension !== 'duration') || q.value <= 0) return [];
    const swap = SWAPS.find(([re]) => re.test(q.text));
    if (swap === undefined) return [];
    const own = text.slice(Math.max(0, q.start - REACH), q.start);
    // A phrase that holds the name but names another thing ("the last ice age" for "ice") is blanked first.
    const names = (name: RegExp, others: RegExp | undefined, where: string): boolean => name.test(others === undefined ? where : where.replace(others, (m) => ' '.repeat(m.length)));
    const named = COMPILED.some(({ name, others }) => names(name, others, text));
    const before = !named && previous !== undefined && REFERS_BACK.test(own) ? previous : own;
    const led = (lead: RegExp | undefined): boolean => lead === undefined || lead.test(text.slice(Math.max(0, q.start - 40), q.start));
    const span = q.dimension === 'duration' && !AGO.test(text.slice(q.end, q.end + 12));
    const hit = COMPILED.find(({ subject, name, others, unless, lead }) => q.low > subject.ceiling && (subject.spansOnly !== true || span) && names(name, others, before) && !unless.test(text) && !unless.test(before) && led(lead));
    if (hit === undefined) return [];
    const correction = q.text.replace(swap[0], swap[1]);
    const k = 1e-3;
    return [{
      stated: q,
      computed: { value: q.value * k, low: q.low * k, high: q.high * k },
      reason: `${q.text} is more than ${hit.subject.what} can span; the same figure in thousands of years (${correction}) fits. A million years is a thousand thousand (SI prefixes: k = 10^3, M = 10^6).`,
      correction,
      level: 'error',
      sources: hit.subject.sources,
    }];
  });
}
