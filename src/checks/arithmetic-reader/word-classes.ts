/**
 * The word classes the arithmetic reader sorts a sentence's figures by, as data: base forms only,
 * every inflection derived (propositions/inflect.ts), phrases as word sequences. A class names what
 * a word does to the figure beside it (a change word makes it a change, a link word presents it as
 * drawn from the figures before), never a sentence it was found in.
 */
import { inflect } from '../../propositions/inflect.js';

/** Verbs of a change of amount, with their direction (+1 up, -1 down, 0 either). */
const CHANGE_VERBS: Record<string, number> = {
  rise: 1, climb: 1, increase: 1, grow: 1, gain: 1, jump: 1, add: 1, warm: 1, soar: 1, surge: 1, mount: 1, spike: 1, swell: 1, thicken: 1, raise: 1, boost: 1, deepen: 1,
  fall: -1, drop: -1, decrease: -1, decline: -1, lose: -1, cool: -1, sink: -1, shrink: -1, thin: -1, plunge: -1, slide: -1, slip: -1, dip: -1, shed: -1, tumble: -1, ease: -1, lower: -1,
  change: 0, move: 0, swing: 0, shift: 0, vary: 0, range: 0,
};
/** Nouns of a change of amount (plurals derived), with their direction. */
const CHANGE_NOUNS: Record<string, number> = {
  rise: 1, increase: 1, climb: 1, gain: 1, growth: 1, jump: 1, leap: 1, surge: 1, warming: 1, addition: 1, hike: 1, uptick: 1, boost: 1, excess: 1,
  fall: -1, drop: -1, decrease: -1, decline: -1, loss: -1, cooling: -1, reduction: -1, plunge: -1, slide: -1, dip: -1, deficit: -1, shortfall: -1,
  change: 0, swing: 0, shift: 0, difference: 0, gap: 0, contrast: 0, spread: 0, amplitude: 0, excursion: 0, step: 0, span: 0, range: 0,
};
/** Words after a figure that set it against another of its kind ("140 ppm more", "20 times faster"). */
const COMPARATIVES: Record<string, number> = {
  more: 1, higher: 1, greater: 1, larger: 1, bigger: 1, above: 1, up: 1, extra: 1, warmer: 1, deeper: 1, longer: 1, faster: 1, quicker: 1, over: 1, older: 1,
  less: -1, fewer: -1, lower: -1, smaller: -1, below: -1, down: -1, colder: -1, cooler: -1, shallower: -1, shorter: -1, slower: -1, under: -1, younger: -1,
};
/** The comparatives that set one span of time against another ("380,000 years longer", "4,000 years younger"). */
const TIME_COMPARATIVES = ['longer', 'shorter', 'older', 'younger', 'more', 'less'];
/** Particles before a figure that state it as a change ("up 124 ppm", "down 6 °C", "net 40 ppm"). */
const CHANGE_PARTICLES: Record<string, number> = { up: 1, down: -1, net: 0 };
/** Verbs whose "up" or "down" makes a phrasal verb of taking or making ("taken up", "sums up"), not a change of the figure after it. */
const PHRASAL_HEADS = ['take', 'make', 'use', 'eat', 'build', 'pick', 'soak', 'mop', 'give', 'set', 'put', 'sum', 'end', 'show', 'turn', 'open', 'break', 'shut', 'back', 'line', 'draw', 'lock', 'tie', 'write', 'wind', 'slow', 'cut', 'tone', 'water', 'play'];
/** Words that name what is left of a whole once a part is taken ("the remaining 50", "the rest, 40 ppm"). */
const REMAINDER = ['remaining', 'remainder', 'rest', 'left', 'leftover', 'balance'];
/**
 * Words that present a figure as drawn from the figures before it: a consequence, a restatement,
 * an equation, a total.
 */
const LINKS = [
  'so', 'thus', 'hence', 'therefore', 'meaning', 'means', 'meant', 'i.e', 'ie', 'or', 'giving', 'gives', 'gave', 'making', 'makes', 'made',
  'leaving', 'leaves', 'left', 'equals', 'equalling', 'equaling', 'that is', "that's", 'that’s', 'which is', 'which was', "which's", 'this is', "it's", 'it’s',
  'comes to', 'came to', 'come to', 'works out', 'worked out', 'amounts to', 'amounted to', 'all told', 'in all', 'in total', 'total', 'totalling', 'totaling',
  'adds up to', 'add up to', 'added up to', 'comes out at', 'came out at', 'come out at', 'works out at', 'worked out at',
  'call it', 'in other words', 'put another way', 'put differently', 'that makes', 'which makes', 'net', 'altogether', 'overall',
  // The same contraction with its apostrophe left out, as informal posts write it ("280 to 424 thats +144").
  'thats',
];
/** Words after a span of time that place it between the date before and the date of its clause ("some 4,500 years later"). */
const LATER = ['later', 'earlier', 'afterwards', 'afterward', 'on'];
/** Words before a change that add it to another one ("another 140 ppm", "a further 2 °C"): a new quantity, not the figures' own. */
const ADDED = ['another', 'further', 'additional', 'extra', 'second', 'next'];
/** Words that make a span of time no interval between two dates ("the past 800,000 years", "every 100,000 years"). */
const NOT_A_SPAN = ['past', 'last', 'previous', 'preceding', 'next', 'first', 'every', 'each', 'per', 'ago', 'old', 'back', 'younger', 'older'];
/** Words that deny the figure after them ("not 87", "no adding 32"): a figure denied is no result the writer claims. */
const NEGATIONS = ['not', 'no', 'never', 'without', 'nor', "isn't", 'isn’t', "wasn't", 'wasn’t'];
/** Words after a figure that make it a place on the globe ("45° S"), not an amount. */
const BEARINGS = ['n', 's', 'e', 'w', 'north', 'south', 'east', 'west', 'latitude', 'longitude'];
/** Words right before a multiple that make it the unit of a measure ("per doubling", "each doubling", "half of a doubling"). */
const YARDSTICK = ['per', 'each', 'every', 'a', 'an', 'one'];
/** Words after a change that name the base it is counted from ("a rise of 40 ppm over the ice age", "80 ppm on 1750"). */
const BASE_AFTER = ['over', 'from', 'on', 'compared', 'relative', 'against'];
/**
 * Words of a named base that say what kind of figure it is, not which ("on pre-industrial levels",
 * "over the 1750 value"): the rest ("1750", "industrial") names the time the base was measured.
 */
const BASE_KIND = ['the', 'a', 'an', 'its', 'their', 'our', 'that', 'this', 'of', 'in', 'at', 'level', 'value', 'figure', 'mark', 'baseline', 'base', 'times', 'era', 'age', 'period', 'concentration', 'average', 'mean', 'reading', 'year', 'around', 'about', 'what', 'it', 'was', 'pre'];
/** Words that set what follows after what came before ("after which came 600 years"): a new stretch, not a restatement. */
const SEQUENCE = ['after', 'afterwards', 'then', 'which', 'followed', 'until', 'till', 'when', 'before', 'whereupon', 'next'];
/**
 * Words that refer back to what the sentence before said ("above that", "by then"). A pronoun for
 * the subject ("it", "its") is not enough: it carries the thing over, not the figure.
 */
const BACK_REFERENCES = ['that', 'this', 'those', 'these', 'then', 'such', 'from there', 'from here'];
/**
 * Words that make a result one part of the change before it ("with the sharpest jump of 40 ppm",
 * "including a rise of", "the first 1,500 years"): a part is no restatement of the whole.
 */
const PART = ['with', 'including', 'includes', 'included', 'among', 'within', 'of which', 'largest', 'biggest', 'sharpest', 'steepest', 'fastest', 'greatest', 'smallest', 'first', 'final', 'single', 'individual', 'each', 'every', 'part', 'portion', 'share', 'half'];
/** Verbs that set a figure as the complement of their subject ("the rise was 90 ppm"). */
const COPULAS = ['is', 'was', 'were', 'are', 'be', 'been', 'being', "'s", 'stood', 'stands', 'came', 'comes', 'amounted', 'amounts'];
/** Adjectives that make an amount one that recurs each year ("the yearly increase was 0.8 ppm"): a rate per year. */
const PER_YEAR = ['yearly', 'annual', 'annually', 'year-on-year'];
/** Nouns that name a figure after them as an age in years ("gas age 14,200", "an ice age of 17,500"). */
const AGE_NOUNS = ['age', 'ages'];
/** Units of time a change may recur in ("2 ppm a year"). */
const TIME_UNITS = ['year', 'decade', 'century', 'millennium', 'month', 'day', 'week', 'yr', 'annum'];
/** Words after a change that tie it to a recurring time or a start of its own ("2 ppm a year", "140 ppm since 1750"). */
const OWN_PERIOD = ['annually', 'yearly', 'since', 'per'];
/** Words that make a figure another time's ("today", "now"): the figures before are not its inputs. */
const OWN_TIME = ['today', "today's", 'today’s', 'now', 'nowadays', 'currently', 'current', 'modern', 'present', 'recent', 'recently', 'lately'];
/**
 * Words that set one figure against another named before ("today's rise compared with the
 * deglacial average", "relative to", "versus"): a multiple after them is the ratio of the two.
 */
const SET_AGAINST = ['compared with', 'compared to', 'comparing', 'relative to', 'set against', 'against', 'versus', 'vs', 'next to', 'beside'];
/** Words that give the multiple's measure a pace ("times faster", "as fast"). */
const PACE_WORDS = ['faster', 'slower', 'quicker', 'quickly', 'rapidly', 'fast', 'pace', 'rate', 'speed', 'tempo'];

/**
 * The operators of a sum written out between two numbers, in symbols and in words ("12,900 take
 * away 11,700", "80 divided by 7,000", "5.35 times 0.69"): each maps to its symbol.
 */
const OPERATORS: Record<string, string> = {
  '−': '−', '-': '−', '–': '−', '+': '+', '×': '×', x: '×', '*': '×', '÷': '÷', '/': '÷',
  minus: '−', 'take away': '−', 'takeaway': '−', less: '−', 'subtract': '−', plus: '+', 'added to': '+', times: '×', 'multiplied by': '×', 'divided by': '÷', 'over': '÷',
};
/**
 * Words between a written sum's second number and its result that state the result ("=", "≈",
 * "gives", "leaves", "works out at"); one may be followed by a name of the result ("leaves a cold
 * spell of", "gives an increase of").
 */
const EQUALS = [
  '=', '≈', '≃', '≅', '~', '→', 'gives', 'give', 'giving', 'gave', 'makes', 'make', 'making', 'made', 'comes to', 'come to', 'came to', 'equals', 'equal', 'equalling', 'equaling',
  'is', 'are', 'was', 'or', 'that is', 'which is', "that's", 'that’s', 'i.e.', 'i.e.,', 'leaves', 'leave', 'leaving', 'left',
  'works out at', 'works out to', 'worked out at', 'worked out to', 'comes out at', 'came out at', 'comes out to', 'is about', 'gets you', 'get you',
];

/**
 * Questions that ask for a result of figures: "how" with the measure asked for ("how long", "by how
 * much", "how many times"), or a measure noun ("what was the average rate?", "what is the
 * difference?"). "How did it happen?" and "What are the cycles?" ask for no figure.
 */
const ASKED_MEASURES = ['long', 'much', 'many', 'far', 'fast', 'quickly', 'slowly', 'big', 'large', 'high', 'low', 'deep', 'old', 'often', 'steep', 'great', 'wide'];
const ASKED_NOUNS = ['rate', 'pace', 'speed', 'difference', 'change', 'rise', 'increase', 'drop', 'fall', 'span', 'duration', 'length', 'ratio', 'total', 'sum', 'average', 'mean', 'percentage', 'percent', 'share', 'fraction', 'multiple', 'factor', 'gap'];

/** Words just before a span of time that make it the spacing of a series ("every 10,000 years", "each 50 years"). */
const SPACING_BEFORE = ['every', 'each', 'per', 'apiece'];
/** Nouns a span of time is the spacing of when written onto them ("a 50-year spacing", "100k-yr cycles"). */
const SPACING_NOUNS = ['spacing', 'interval', 'step', 'resolution', 'cycle', 'beat', 'rhythm', 'period', 'gap'];
/** Words after a figure that make it the length of each member of a series ("each one's about 150k long"). */
const EACH_LONG = ['long', 'apart', 'each', 'apiece'];
/** Words just before a span of time that make it the whole a series fills ("8 cycles in 800,000 years"). */
const SPAN_BEFORE = ['in', 'over', 'across', 'spanning', 'covering', 'within', 'of', 'through'];

/** A set of every form of the words (verb forms and plurals). */
const formsOf = (words: readonly string[]): Set<string> => new Set(words.flatMap((w) => (w.includes(' ') ? [w] : inflect(w))));
/** A map of every form to the base word's sign. */
const signedForms = (words: Record<string, number>): Map<string, number> => new Map(Object.entries(words).flatMap(([w, s]) => inflect(w).map((f) => [f, s] as [string, number])));

export const WORDS = {
  changeVerbs: signedForms(CHANGE_VERBS),
  changeNouns: signedForms(CHANGE_NOUNS),
  comparatives: new Map(Object.entries(COMPARATIVES)),
  timeComparatives: new Set(TIME_COMPARATIVES),
  particles: new Map(Object.entries(CHANGE_PARTICLES)),
  remainder: new Set(REMAINDER),
  phrasalHeads: formsOf(PHRASAL_HEADS),
  links: LINKS,
  later: new Set(LATER),
  added: new Set(ADDED),
  notASpan: new Set(NOT_A_SPAN),
  timeUnits: formsOf(TIME_UNITS),
  ownPeriod: new Set(OWN_PERIOD),
  negations: new Set(NEGATIONS),
  part: PART,
  baseAfter: new Set(BASE_AFTER),
  baseKind: formsOf(BASE_KIND),
  sequence: new Set(SEQUENCE),
  backReferences: BACK_REFERENCES,
  bearings: new Set(BEARINGS),
  yardstick: new Set(YARDSTICK),
  ownTime: new Set(OWN_TIME),
  pace: new Set(PACE_WORDS),
  setAgainst: SET_AGAINST,
  askedMeasures: new Set(ASKED_MEASURES),
  askedNouns: formsOf(ASKED_NOUNS),
  spacingBefore: new Set(SPACING_BEFORE),
  spacingNouns: formsOf(SPACING_NOUNS),
  eachLong: new Set(EACH_LONG),
  spanBefore: new Set(SPAN_BEFORE),
  copulas: new Set(COPULAS),
  perYear: new Set(PER_YEAR),
  ageNouns: new Set(AGE_NOUNS),
  operators: new Map(Object.entries(OPERATORS)),
  equals: EQUALS,
};

/** A word of the text with where it stands. */
export interface Word {
  text: string;
  start: number;
  end: number;
}

/** The words of `text` from `from` to `to`, lower case, apostrophes kept ("that's"), with their offsets. */
export function wordsIn(text: string, from: number, to: number): Word[] {
  const out: Word[] = [];
  for (const m of text.slice(from, to).matchAll(/[\p{L}][\p{L}'’.]*[\p{L}]|[\p{L}]/gu)) {
    out.push({ text: m[0].toLowerCase().replace(/\.$/u, ''), start: from + (m.index ?? 0), end: from + (m.index ?? 0) + m[0].length });
  }
  return out;
}

/** True when the words hold one of `phrases` (single words or word sequences) as whole words. */
export function holdsPhrase(words: readonly Word[], phrases: readonly string[]): boolean {
  const seq = words.map((w) => w.text);
  return phrases.some((p) => {
    const parts = p.split(' ');
    for (let i = 0; i + parts.length <= seq.length; i++) if (parts.every((x, k) => seq[i + k] === x)) return true;
    return false;
  });
}
