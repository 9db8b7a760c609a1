/**
 * CO2 levels written in the wrong unit, caught on their own (with no restatement beside them):
 *   "CO2 is [0.4 percent] of the air"   → 4,000 ppm, never measured: 0.04 percent;
 *   "CO2 stood at [280 percent]"        → a level in ppm written as a percentage: 280 ppm;
 *   "CO2 was [0.028 ppm]"               → a percentage written as ppm: 0.028%.
 * A percentage is a CO2 share only when the nearest gas named before it is CO2 and the words
 * around it state a level ("is", "made up", "of the air"), not a change, a rate or a share of
 * something else ("30 percent of emissions"), nor the size of a change named before it ("the rise
 * in CO2 since 1750 was 47 percent").
 */
import { formatNumber, rewriteEnds, rewriteQuantity } from '../quantities/index.js';
import type { Quantity } from '../types.js';
import { comparesToNext, isStatedChange } from './arithmetic-frames.js';
import { LUTHI_2008, NIST_SP_811, NOAA_2024 } from './standard-sources.js';
import type { UnitFinding } from './units-rules.js';

/**
 * Every CO2 level a draft on ice ages can mean, in ppm: below the 800,000-year ice-core minimum
 * (172 ppm, Lüthi et al. 2008) and far above today's global mean (419.3 ppm in 2023, NOAA), with
 * room for emission scenarios (1,000 ppm). A share outside it is a slip of a power of ten.
 */
export const PLAUSIBLE_CO2_PPM = { low: 150, high: 2000 } as const;

/**
 * The CO2 levels of the ice-core era before industry, in ppm: the 800,000-year record's range
 * (172-300 ppm, Lüthi et al. 2008). A share the draft places in a glacial, an interglacial or the
 * pre-industrial air must read inside it.
 */
export const ICE_CORE_CO2_PPM = { low: 172, high: 300 } as const;
/** Words that place a level in the ice-core era before industry; a time of today's air does not. */
const ICE_AGE_TIME = /(?:^|[^\p{L}])(?:glacials?|interglacials?|glacial[\s\u00A0-]+maximum|LGM|ice[\s\u00A0-]+ages?|pre-?industrial|deglaciation|stadials?|interstadials?)(?![\p{L}])/iu;
const PRESENT_TIME = /(?:^|[^\p{L}])(?:today|today's|today’s|now|nowadays|modern|present|current|currently|(?:19[5-9]|20[0-9])\d)(?![\p{L}\p{N}])/iu;

const PPM_PER_PERCENT = 1e4;
/**
 * Deep time, before the ice ages began (2.58 million years ago, the base of the Quaternary): CO2
 * was far higher in some of it, so a large share there is a claim for the reference values, not a
 * unit slip. Named periods, "millions of years ago", or a date before the Quaternary.
 */
const DEEP_TIME = /(?:Pliocene|Miocene|Oligocene|Eocene|Palaeocene|Paleocene|PETM|Cretaceous|Jurassic|Triassic|Permian|Carboniferous|Devonian|Silurian|Ordovician|Cambrian|Mesozoic|Paleozoic|Palaeozoic|Cenozoic|dinosaurs?|million[\s\u00A0]+years[\s\u00A0]+ago)/iu;
const QUATERNARY_BASE_YR = 2.58e6;
const S = String.raw`[\s\u00A0]`;
const CO2 = /(?:CO2|CO₂|carbon dioxide)/iu;
const GAS = /(?<co2>CO2|CO₂|carbon[\s\u00A0]+dioxide)|methane|CH4|CH₄|nitrous[\s\u00A0]+oxide|N2O|N₂O|nitrogen|oxygen|argon|water[\s\u00A0]+vapou?r|ozone|neon|helium|hydrogen/giu;
const OTHER_GAS = /(?:methane|CH4|CH₄|nitrous|N2O|N₂O)/iu;
/**
 * The air, named as such or as what people breathe: "of the air", "of the atmosphere", "of every
 * breath", "of everything you breathe in", "of what we breathe" (common practice of plain speech).
 */
const AIR = String.raw`(?:(?:the${S}+|today's${S}+|today’s${S}+|Earth's${S}+|Earth’s${S}+|dry${S}+)?(?:air|atmosphere)|(?:every|each|a|your|our)${S}+breath|(?:everything|all|what|whatever)${S}+(?:that${S}+)?(?:you|we|people|they|i)${S}+breathe(?:${S}+in)?)`;
const SHARE_AFTER = new RegExp(String.raw`^${S}*(?:of${S}+${AIR}|by${S}+volume)`, 'iu');
const GAS_AFTER = new RegExp(String.raw`^${S}*(?:of${S}+)?(?:CO2|CO₂|carbon${S}+dioxide)(?![\p{L}\d])`, 'iu');
const OF_SOMETHING_ELSE = new RegExp(String.raw`^${S}*of(?!${S}+${AIR})(?![\p{L}])`, 'iu');
/**
 * A change named as the subject ("the rise in CO2 ... at 47 percent", "the growth of carbon dioxide
 * was 50 percent"): a percentage of it is relative to the start, not a share of the air.
 */
const CHANGE_SUBJECT = /(?:^|[^\p{L}])(?:rise|increase|growth|gain|jump|climb|drop|fall|decline|decrease|change|loss|reduction)[\s\u00A0]+(?:in|of)[\s\u00A0]+(?:[\p{L}-]+[\s\u00A0]+){0,2}(?:CO2|CO₂|carbon[\s\u00A0]+dioxide)(?![\p{L}\d])[^;:.!?]*$/iu;
const RATE_AFTER = new RegExp(String.raw`^${S}*(?:(?:per|a|an|each|every)${S}+(?:year|decade|century|annum|millennium)|annually|yearly)`, 'iu');
/** The words before a share that state a level, with a time adverb after the verb ("which is now about 0.42 percent carbon dioxide"). */
const LEVEL_BEFORE = new RegExp(
  String.raw`(?:^|[^\p{L}])(?:at|of|reached|reaching|was|were|is|are|stood${S}+at|to|hit|peaked${S}+at|near|around|about|from|between|and|made${S}+up|makes${S}+up|make${S}+up|only|just|holds|held|hold|carries|carried|carry|contains|contained|contain|forms|comprises|constitutes|amounts${S}+to|accounts${S}+for)(?:${S}+(?:now|today|currently|presently|still|already|nowadays))?${S}*$`,
  'iu',
);

/** True when the nearest gas named before `at` is CO2, or no gas is named and the paragraph's CO2 is meant. */
function nearestGasIsCo2(text: string, at: number, co2ByContext = false): boolean {
  const named = [...text.slice(0, at).matchAll(GAS)];
  if (named.length === 0 && co2ByContext) return true;
  return named[named.length - 1]?.groups?.['co2'] !== undefined;
}

/** "Expressed as a share of the air, today's level is ...": a share of the air named in words. */
const SHARE_OF_AIR = new RegExp(String.raw`(?:share|fraction|proportion|percentage)${S}+of${S}+${AIR}|of${S}+${AIR}`, 'iu');
/** The air named as what holds the gas: "today's air holds", "the atmosphere contains". */
const AIR_HOLDS = String.raw`(?:^|[^\p{L}])${AIR}${S}+(?:(?:now|today|still|only)${S}+)?(?:holds|held|contains|contained|has|had|carries|carried)(?![\p{L}])`;
/**
 * "today's air holds a mere 0.42 per cent of it": a figure the air holds, up to two words after
 * the verb, is a share of the air; the gas is the one named after it, or by "it", the sentence's
 * or the passage's gas.
 */
const HELD_BY_AIR = new RegExp(String.raw`${AIR_HOLDS}(?:${S}+[\p{Ll}]+){0,2}${S}*$`, 'iu');
const GAS_PRONOUN_AFTER = new RegExp(String.raw`^${S}*of${S}+(?:it|them|this|that|the${S}+gas|that${S}+gas|this${S}+gas)(?![\p{L}])`, 'iu');
/**
 * "and today's level is 0.42%": a level or concentration, with no other thing named before it,
 * completed by the figure through a copula: the gas it is of is the passage's.
 */
const LEVEL_IS = new RegExp(String.raw`(?:^|[^\p{L}])(?:the|its|today's|today’s|current|present|modern|our)${S}+(?:level|concentration)(?:${S}+(?:now|today|currently))?${S}+(?:is|was|sits${S}+at|stands${S}+at|stood${S}+at)${S}*(?:(?:about|around|roughly|like|only|just|some|nearly|almost)${S}+)?$`, 'iu');
const PPM_WORDS = /(?:ppmv?|parts[\s\u00A0]+per[\s\u00A0]+million)(?![\p{L}])/iu;

/**
 * True when a sentence that names no gas speaks of CO2 by context: it states a share of the air,
 * and the nearest sentence before that gives a level in ppm or names a gas (up to three back) gives
 * a level in ppm or names CO2 alone, and names no other gas ("... the annual increase was under one ppm. Expressed as a
 * share of the air, today's level is about 0.42 percent."; "... never above three hundred parts
 * per million. - And before industry? - Two-eighty, and that's about 2.8 percent of the air.").
 */
function co2FromContext(text: string, earlier: readonly string[]): boolean {
  const levelIs = (q: RegExpMatchArray): boolean => LEVEL_IS.test(text.slice(0, q.index ?? 0));
  const statesShare = SHARE_OF_AIR.test(text) || new RegExp(AIR_HOLDS, 'iu').test(text) || [...text.matchAll(/\d/gu)].some(levelIs);
  if ([...text.matchAll(GAS)].length > 0 || !statesShare) return false;
  const nearest = [...earlier].reverse().find((s) => PPM_WORDS.test(s) || [...s.matchAll(GAS)].length > 0);
  if (nearest === undefined || OTHER_GAS.test(nearest)) return false;
  // "CO2 tags along after. It's a trace gas anyway, like 0.4% of the air.": the gas the sentence
  // before names is what a share of the air with no gas of its own speaks of.
  const gases = [...nearest.matchAll(GAS)];
  return PPM_WORDS.test(nearest) || (gases.length > 0 && gases.every((g) => g.groups?.['co2'] !== undefined));
}

/** True when percentage `q` states CO2's share of the air. */
function isCo2Share(text: string, q: Quantity, byContext = false): boolean {
  const before = text.slice(Math.max(0, q.start - 24), q.start);
  const after = text.slice(q.end, q.end + 40);
  if (isStatedChange(text, q) || comparesToNext(text, q) || RATE_AFTER.test(after)) return false;
  // A share the air holds: the gas is named after it ("of CO2"), pointed to ("of it"), or the sentence's or passage's.
  if (HELD_BY_AIR.test(text.slice(Math.max(0, q.start - 60), q.start))) {
    if (GAS_AFTER.test(after.replace(/^[\s\u00A0]*of(?=[\s\u00A0])/u, ''))) return true;
    return (GAS_PRONOUN_AFTER.test(after) || !/^[\s\u00A0]*of(?![\p{L}])/u.test(after)) && nearestGasIsCo2(text, q.start, byContext);
  }
  if (OF_SOMETHING_ELSE.test(after)) return false;
  if (LEVEL_IS.test(text.slice(Math.max(0, q.start - 60), q.start)) && byContext) return true;
  if (SHARE_AFTER.test(after)) return nearestGasIsCo2(text, q.start, byContext);
  // "the air holds about 0.42 percent carbon dioxide": the gas named right after the share.
  if (GAS_AFTER.test(after)) return LEVEL_BEFORE.test(before) && !CHANGE_SUBJECT.test(text.slice(0, q.start));
  return nearestGasIsCo2(text, q.start, byContext) && LEVEL_BEFORE.test(before) && !CHANGE_SUBJECT.test(text.slice(0, q.start));
}

/** The power of ten, nearest first, that brings `ppm` into the plausible range (0 when none does). */
function nearestPlausible(ppm: number): number {
  const inRange = (x: number): boolean => x >= PLAUSIBLE_CO2_PPM.low && x <= PLAUSIBLE_CO2_PPM.high;
  return [-1, 1, -2, 2, -3, 3, -4, 4].find((k) => inRange(ppm * 10 ** k)) ?? 0;
}

/** The power of ten, nearest first, that brings `ppm` into the ice-core range (0 when none does). */
function nearestIceCore(ppm: number): number {
  return [-1, 1, -2, 2, -3, 3, -4, 4].find((k) => ppm * 10 ** k >= ICE_CORE_CO2_PPM.low && ppm * 10 ** k <= ICE_CORE_CO2_PPM.high) ?? 0;
}

/**
 * "At the glacial maximum the air held about 0.19 percent CO2": 1,900 ppm is a level some
 * scenario could reach, but never one of the ice-core era, where this sentence places it; 0.019
 * percent (190 ppm) is. A share placed in that era is held to its range.
 */
function iceAgeSlip(q: Quantity, ppm: number): UnitFinding | undefined {
  if (ppm >= ICE_CORE_CO2_PPM.low && ppm <= ICE_CORE_CO2_PPM.high) return undefined;
  const k = nearestIceCore(ppm);
  if (k === 0) return undefined;
  const value = q.value * 10 ** k;
  const correction = tenfold(q, k) ?? rewriteQuantity(q, value);
  return { stated: q, computed: { value, low: q.low * 10 ** k, high: q.high * 10 ** k }, level: 'error', sources: [NIST_SP_811, LUTHI_2008], correction,
    reason: `${q.text} of the air would be ${formatNumber(ppm)} ppm of CO2 (1% = 10,000 ppm), outside the ${ICE_CORE_CO2_PPM.low}-${ICE_CORE_CO2_PPM.high} ppm of 800,000 years of ice cores, where the sentence places it; ${correction} is ${formatNumber(value * PPM_PER_PERCENT)} ppm.` };
}

/** A range of shares put right end by end, each `10 ** k` times its figure: "between 0.18% and 0.28%" → "between 0.018% and 0.028%". */
function tenfold(q: Quantity, k: number): string | undefined {
  return rewriteEnds(q, (x) => x * 10 ** k);
}

function percentSlip(q: Quantity, iceAge = false): UnitFinding | undefined {
  const ppm = q.value * PPM_PER_PERCENT;
  if (iceAge && ppm < PLAUSIBLE_CO2_PPM.high * 10) return iceAgeSlip(q, ppm);
  if (ppm >= PLAUSIBLE_CO2_PPM.low && ppm <= PLAUSIBLE_CO2_PPM.high) return undefined;
  const sources = [NIST_SP_811, LUTHI_2008, NOAA_2024];
  const range = `${PLAUSIBLE_CO2_PPM.low}-${formatNumber(PLAUSIBLE_CO2_PPM.high)} ppm`;
  if (q.value >= PLAUSIBLE_CO2_PPM.low && q.value <= PLAUSIBLE_CO2_PPM.high) {
    return { stated: q, computed: { value: q.value, low: q.low, high: q.high }, unit: 'ppm', level: 'error', sources,
      reason: `CO2 has never made up ${q.text} of the air; ${q.value} reads as a level in ppm (1% = 10,000 ppm).`,
      correction: q.text.replace(/[\s\u00A0]*(?:%|per[\s\u00A0]?cent)$/iu, ' ppm') };
  }
  const k = nearestPlausible(ppm);
  if (k === 0) return undefined;
  const value = q.value * 10 ** k;
  const correction = tenfold(q, k) ?? rewriteQuantity(q, value);
  return { stated: q, computed: { value, low: q.low * 10 ** k, high: q.high * 10 ** k }, level: 'error', sources, correction,
    reason: `${q.text} of the air would be ${formatNumber(ppm)} ppm of CO2 (1% = 10,000 ppm), outside every level measured or projected (${range}: 172-300 ppm in 800,000 years of ice cores, about 420 ppm today); ${correction} is ${formatNumber(value * PPM_PER_PERCENT)} ppm.` };
}

/** CO2 levels in the wrong unit, except the quantities in `restated` (the restatement check has them). */
export function co2UnitSlips(text: string, qs: Quantity[], restated: ReadonlySet<Quantity>, earlier: readonly string[] = []): UnitFinding[] {
  const byContext = co2FromContext(text, earlier);
  if (!CO2.test(text) && !byContext) return [];
  const deepTime = DEEP_TIME.test(text) || qs.some((q) => q.dimension === 'age' && q.low >= QUATERNARY_BASE_YR);
  const iceAge = ICE_AGE_TIME.test(text) && !PRESENT_TIME.test(text);
  const counted = countedShares(text, qs, restated, deepTime);
  return [...counted, ...qs.flatMap((q): UnitFinding[] => {
    if (restated.has(q) || counted.some((c) => c.stated === q)) return [];
    if (q.dimension === 'percent') {
      const slip = isCo2Share(text, q, byContext) && !deepTime ? percentSlip(q, iceAge) : undefined;
      return slip === undefined ? [] : [slip];
    }
    const before = text.slice(Math.max(0, q.start - 24), q.start);
    if (q.dimension === 'concentration' && q.statedUnit === 'ppm' && LEVEL_BEFORE.test(before) && !isStatedChange(text, q) && q.high < 1 && !OTHER_GAS.test(text)) {
      return [{ stated: q, computed: { value: q.value, low: q.low, high: q.high }, unit: '%', level: 'warning', sources: [NIST_SP_811],
        reason: `A CO2 level of ${q.text} is far below any measured value; ${q.value} reads as a percentage of the air (${q.value}% = ${formatNumber(q.value * PPM_PER_PERCENT)} ppm).`,
        correction: q.text.replace(/[\s\u00A0]*(?:ppmv?|parts per million)$/iu, '%') }];
    }
    return [];
  })];
}

/** Scale words a share of molecules is counted in: "every thousand molecules", "each million". */
const SCALE: Record<string, number> = { hundred: 1e2, thousand: 1e3, million: 1e6, billion: 1e9 };
const UNIT_NOUN = String.raw`(?:molecules?|parts?|particles?)`;
/** "in every thousand molecules of air", "out of each million", "per ten thousand": the whole a count is taken of. */
const WHOLE = new RegExp(String.raw`(?:^|[^\p{L}])(?:in|out${S}+of|per|for|of)?${S}*(?:every|each)${S}+(?:(?:a|one|ten|a${S}+hundred)${S}+)?(hundred|thousand|million|billion)${S}+(?:${UNIT_NOUN}${S}+)?(?:of${S}+${AIR})?`, 'giu');
/** "4.2 molecules of CO2", "about 4 parts carbon dioxide": a count of CO2 in that whole. */
const CO2_COUNT_AFTER = new RegExp(String.raw`^${S}+${UNIT_NOUN}${S}+(?:of${S}+)?(?:CO2|CO₂|carbon${S}+dioxide)(?![\p{L}\d])`, 'iu');

/** A concentration the quantity reader made from a count: "about 42 molecules of CO2". */
const COUNTED = new RegExp(String.raw`\d${S}*${UNIT_NOUN}${S}+(?:of${S}+)?(?:CO2|CO₂|carbon${S}+dioxide)`, 'iu');

/**
 * The number of a counted concentration, as written ("about 4.2" of "about 4.2 molecules of CO2"),
 * holding the count: the quantity reader has already made it ppm (4,200 ppm for 4.2 in every
 * thousand), so the count is that share taken back to the whole.
 */
function countOf(q: Quantity, per: number): Quantity {
  const number = /^.*?\d[\d,.]*/u.exec(q.text)?.[0] ?? q.text;
  const k = per / 1e6;
  return { ...q, text: number, end: q.start + number.length, value: q.value * k, low: q.low * k, high: q.high * k, dimension: 'number', unit: 'number', statedUnit: '' };
}

/**
 * A CO2 share written as a count in a whole: "every thousand molecules of air held about 4.2
 * molecules of CO2" (4,200 ppm: 0.42 per thousand is today's air), "3 molecules of carbon dioxide
 * in each ten thousand" (300 ppm). The share N ÷ M is held to the plausible range (or the ice-core
 * range, where the sentence places it in that era), and the power of ten that fixes it is offered.
 */
function countedShares(text: string, qs: Quantity[], restated: ReadonlySet<Quantity>, deepTime: boolean): UnitFinding[] {
  if (deepTime) return [];
  const wholes = [...text.matchAll(WHOLE)];
  if (wholes.length !== 1) return [];
  const whole = wholes[0] as RegExpMatchArray;
  const words = whole[0].toLowerCase();
  const per = (SCALE[(whole[1] as string).toLowerCase()] ?? 0) * (/(?:^|[^\p{L}])ten[\s\u00A0]/u.test(words) ? 10 : /hundred[\s\u00A0]+(?:thousand|million)/u.test(words) ? 100 : 1);
  const counts = qs.filter((q) => !restated.has(q) && (q.dimension === 'number' || q.dimension === 'count') && CO2_COUNT_AFTER.test(text.slice(q.end)) && (q.end <= (whole.index ?? 0) || q.start >= (whole.index ?? 0) + whole[0].length));
  // The quantity reader already turns a count in every million into ppm ("about 42 molecules of CO2",
  // quantities/per-million.ts): its number, as written, is the count.
  const parsed = counts.length > 0 ? [] : qs.filter((q) => !restated.has(q) && q.dimension === 'concentration' && COUNTED.test(q.text)).map((q) => countOf(q, per));
  const found = counts.length > 0 ? counts : parsed;
  const q = found.length === 1 ? found[0] : undefined;
  if (q === undefined || per === 0) return [];
  const ppm = (q.value / per) * 1e6;
  const iceAge = ICE_AGE_TIME.test(text) && !PRESENT_TIME.test(text);
  const range = iceAge ? ICE_CORE_CO2_PPM : PLAUSIBLE_CO2_PPM;
  if (ppm >= range.low && ppm <= range.high) return [];
  const k = [-1, 1, -2, 2, -3, 3].find((n) => ppm * 10 ** n >= range.low && ppm * 10 ** n <= range.high);
  if (k === undefined) return [];
  const value = q.value * 10 ** k;
  const correction = rewriteQuantity(q, value);
  const scale = (x: number): number => (x / per) * 1e6;
  return [{ stated: q, computed: { value, low: q.low * 10 ** k, high: q.high * 10 ** k }, unit: q.unit, level: 'error', sources: [NIST_SP_811, LUTHI_2008, NOAA_2024], correction,
    reason: `${q.text} in every ${formatNumber(per)} molecules of air is ${formatNumber(ppm)} ppm of CO2 (1 ppm is one molecule in a million), outside every level ${iceAge ? 'of 800,000 years of ice cores' : 'measured or projected'} (${range.low}-${formatNumber(range.high)} ppm); ${correction} is ${formatNumber(scale(value))} ppm.` }];
}

/** A figure's unit written as parts per billion, in any of its forms. */
const PPB_WORDS = /ppbv?|parts?[\s\u00A0]+per[\s\u00A0]+billion/iu;
/** The gas an earlier sentence names last is CO2 (and none names another gas): a figure with no gas of its own is CO2's. */
function co2Before(earlier: readonly string[]): boolean {
  const nearest = [...earlier].reverse().find((s) => [...s.matchAll(GAS)].length > 0);
  return nearest !== undefined && !OTHER_GAS.test(nearest) && [...nearest.matchAll(GAS)].every((g) => g.groups?.['co2'] !== undefined);
}

/**
 * A CO2 level or change written in parts per billion where parts per million were meant: "today's
 * level is about 420 ppb", "a decade adds some 24 ppb". CO2 is a few hundred ppm (NOAA); methane and
 * nitrous oxide are the gases given in ppb, so a sentence naming one of them is left alone. A level
 * is read so only when its number is a plausible CO2 level in ppm, a change when its number is a
 * plausible change in ppm; the correction keeps the number and writes ppm.
 */
export function co2PpbSlips(text: string, qs: Quantity[], earlier: readonly string[] = []): UnitFinding[] {
  if (OTHER_GAS.test(text) || (!CO2.test(text) && !co2Before(earlier))) return [];
  return qs.flatMap((q): UnitFinding[] => {
    if (!q.statedUnit.startsWith('ppb') || (q.dimension !== 'concentration' && q.dimension !== 'concentration-rate')) return [];
    const written = q.value * 1e3;
    const change = q.dimension === 'concentration-rate' || isStatedChange(text, q);
    const fits = change ? written >= 0.5 && written <= 200 : written >= PLAUSIBLE_CO2_PPM.low && written <= PLAUSIBLE_CO2_PPM.high;
    if (!fits) return [];
    const correction = q.text.replace(PPB_WORDS, (unit) => (/^p/iu.test(unit) && !/\s/u.test(unit) ? 'ppm' : 'parts per million'));
    return [{ stated: q, computed: { value: written, low: q.low * 1e3, high: q.high * 1e3 }, unit: q.unit, level: 'error', sources: [NIST_SP_811, NOAA_2024], correction,
      reason: `${q.text} of CO2 is ${formatNumber(q.value)} ppm, a thousand times below any level or change of CO2 measured (about 420 ppm in the air today); CO2 is given in parts per million: ${correction}.` }];
  });
}
