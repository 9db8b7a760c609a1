/**
 * The reference check: a bound claim's interval against its reference interval. Overlapping
 * intervals agree; disjoint ones conflict, and the level grows with the distance by the value's
 * `levels`. A flag carries the claimed value and the reference range in the draft's own unit, the
 * correction, the citations, and the as-of date of values that change with time.
 */
import { findTerms } from '../claims/bind.js';
import { boundInterval, boundReadings } from '../claims/bind-bound.js';
import { createTopicMatcher, type TopicMatcher } from '../prose/topic-matcher.js';
import { entityWordsOf } from '../propositions/lexicon.js';
import { isOneYearMeasurement, oneYearInterval } from './reference-dated.js';
import { readsBack } from './reads-back.js';
import { midSentence } from '../rulepack/describe-range.js';
import { levelAt } from '../rulepack/resolve-reference.js';
import { NIST_SP_811 } from './standard-sources.js';
import type { LoadedPacks, ReferenceValue } from '../rulepack/types.js';
import type { Binding, FlagDraft, Quantity, Verdict } from '../types.js';
import { correctionFor, shownClaim, shownReference } from './reference-format.js';
import { factorOff, levelWithDistance } from './distance-level.js';
import { unitSlip } from './reference-slips.js';
import { relativeDistance } from './reference-distance.js';

export { relativeDistance };
import { checkEnds } from './reference-ends.js';
import { isDeniedFigure } from './denied-figure.js';
import { datedAfterReplacement, toldOfItsDay } from './dated-after.js';
import { endpointPairs } from '../claims/bind-role.js';
import { statesRange } from '../quantities/range-ends.js';
import { findUnit, writtenInterval } from '../quantities/index.js';
import { findRestatements } from './units-pairs.js';

/** The pack term whose words mark a claim about the present ("today", "now"...). */
export const TODAY_TERM = 'today';

/** Checks each binding; returns the flags of conflicting claims and a verdict per binding. */
export function checkReferences(sentence: string, quantities: Quantity[], bindings: Binding[], packs: LoadedPacks, before: readonly string[] = []): { flags: FlagDraft[]; verdicts: Verdict[] } {
  const flags: FlagDraft[] = [];
  const verdicts: Verdict[] = [];
  let aboutToday: boolean | undefined;
  // "never got above 250 ppm": a number stated as a bound is the extreme itself (claims/bind-bound.ts).
  const bounds = bindings.length === 0 ? [] : boundReadings(sentence, quantities, packs, findTerms(sentence, packs));
  const shares = bindings.length === 0 ? new Set<Quantity>() : restatedShares(sentence, quantities);
  for (const binding of bindings) {
    const stated = quantities[binding.quantityIndex];
    const r = packs.reference(binding.referenceId);
    // "420 ppm is only 0.042% of the air", "past 420 ppm (about 0.042 percent)": the share restates
    // the level beside it; the unit check holds it to that level, whose own value check speaks for both.
    if (stated !== undefined && shares.has(stated)) {
      verdicts.push('no reference');
      continue;
    }
    // "In 2023 the global average was around 410 ppm": one year's measurement leaves little slack.
    const dated = stated === undefined || r === undefined || !isOneYearMeasurement(r, packs) ? stated : { ...stated, ...oneYearInterval(stated) };
    const q = dated === undefined || bounds[binding.quantityIndex] === undefined ? dated : { ...dated, ...boundInterval(dated) };
    // "not 420,000 years long but 800,000": the draft denies the figure; it claims the other one.
    if (q === undefined || r === undefined || isDeniedFigure(sentence, q)) {
      verdicts.push('no reference');
      continue;
    }
    // "CO2 moved between 180 and 380 ppm over the ice ages": a range told for a span, end by end.
    // The right figures in the wrong unit ("180 and 300 parts per billion") are a unit slip, read below.
    const byEnds = r.ends === undefined ? undefined : checkEnds(r, q, packs, pairedEnd(sentence, quantities, bindings, binding));
    if (byEnds !== undefined && (byEnds.agrees || unitSlip(r, q) === undefined)) {
      verdicts.push(byEnds.agrees ? 'agrees' : 'conflicts');
      if (byEnds.flag !== undefined) flags.push(byEnds.flag);
      continue;
    }
    const distance = relativeDistance(q.low, q.high, r);
    // "about 6 °F colder" of a 3.5-7.5 °C cooling: only the hedge reaches the range; the number as
    // written lies outside it, and may be the reference's own figure in a confused unit.
    const hedgedIn = distance === 0 && q.hedge !== undefined && writtenOutside(q, r);
    const hedgedSlip = hedgedIn ? unitSlip(r, q) : undefined;
    verdicts.push(distance === 0 && hedgedSlip === undefined ? 'agrees' : 'conflicts');
    // A superseded figure is right for its day. A figure that only aged (the 2019 level, when the
    // value changes with time and carries an as-of date) stays a note when told as today's; a figure
    // that later work corrected ("currently reaches back about 740,000 years") is an error when the
    // draft gives it as today's.
    const matched = distance === 0 ? undefined : supersededMatch(r, q, packs);
    if (matched !== undefined && r.asOf === undefined) aboutToday ??= findTerms(sentence, packs).has(TODAY_TERM);
    // "The Vostok record, published in 1999, covers 160,000 years": dated after the newer value's
    // sources, an older figure is no longer right for its day.
    // A figure told in the present with no date of its own ("Vostok's record goes back about 160,000
    // years") is given as today's, as "currently" gives it; a figure that only aged keeps its note.
    const older = matched !== undefined && (r.asOf !== undefined || (aboutToday !== true && toldOfItsDay(sentence, quantities, q, r, before))) && !datedAfterReplacement(quantities, r) ? matched : undefined;
    // A global figure that is the size of a regional change ("the whole Earth was 9 °C colder": the
    // Antarctic warming) is the regional record told as global: the scope check's flag, not a value's.
    const regional = distance === 0 || matched !== undefined ? undefined : regionalMatch(r, q, packs);
    const namesRegion = regional !== undefined && namesRegionalRecord(sentence, packs);
    // The right number in the wrong unit ("3,270 feet" for the 3,270 m core): a unit flag says so.
    // A figure that is a regional record's own value as written is no unit slip when the sentence
    // names that record; when it names none ("the world as a whole was about 11 °C colder"), the
    // regional size is a coincidence and a reading in the confusable unit (11 °F, 6.1 °C) explains it.
    const slip = hedgedSlip ?? (distance === 0 || matched !== undefined || namesRegion ? undefined : unitSlip(r, q));
    if (slip !== undefined) {
      flags.push({
        ruleId: 'unit.scale-slip',
        level: 'error',
        start: q.start,
        end: q.end,
        reason: `${q.text} is out of range for the ${midSentence(r.measures, packs)}, but ${slip.correction} fits it: ${slip.what}.`,
        claimed: shownClaim(q),
        reference: shownReference(r, q),
        correction: slip.correction,
        sources: [NIST_SP_811, ...r.sources],
      });
      continue;
    }
    // Only a sentence that names a regional record presents that record as global; one that names
    // none ("At the LGM the planet was some 12 °C colder") states a wrong global value, whose reason
    // says whose size it is.
    if (regional !== undefined && namesRegion) {
      flags.push(regional);
      continue;
    }
    const level = older !== undefined ? 'note' : distance === 0 ? undefined : levelWithDistance(levelAt(r.levels, distance), factorOff(q.low, q.high, r));
    if (level === undefined) continue;
    aboutToday ??= findTerms(sentence, packs).has(TODAY_TERM);
    const reference = shownReference(r, q);
    flags.push({
      ruleId: `value.${r.id}`,
      level,
      start: q.start,
      end: q.end,
      reason: older !== undefined ? supersededReason(r, q, older, reference.text, packs) : matched !== undefined ? supersededAsCurrent(r, q, matched, reference.text, packs) : regional !== undefined ? regional.reason : reasonFor(r, q, reference.text, aboutToday, packs),
      claimed: shownClaim(q),
      reference,
      correction: correctionFor(r, q),
      sources: regional !== undefined ? regional.sources : matched === undefined ? r.sources : [...r.sources, ...matched.sources.filter((s) => !r.sources.includes(s))],
    });
  }
  return { flags, verdicts };
}

/** Whether the figure as written, without its hedge or its last digit's rounding, lies outside the reference. */
function writtenOutside(q: Quantity, r: ReferenceValue): boolean {
  // A figure read as another dimension than its words ("rose 1.2 ppm in 2024" as a rate) has no written reading here.
  if (findUnit(q.statedUnit, q.dimension) === undefined) return false;
  const w = writtenInterval(q);
  return relativeDistance(w.value, w.value, r) > 0;
}

/** The percentages of a sentence that restate a CO2 level in ppm beside them (units-pairs.ts). */
function restatedShares(sentence: string, quantities: Quantity[]): Set<Quantity> {
  const shares = new Set<Quantity>();
  for (const { first, second } of findRestatements(sentence, quantities)) {
    if (first.dimension === 'concentration' && second.dimension === 'percent') shares.add(second);
    if (first.dimension === 'percent' && second.dimension === 'concentration') shares.add(first);
  }
  return shares;
}

/**
 * Which end of a span a figure is when the draft writes the span as two figures ("swung from 120 to
 * 300 ppm") and both bind the same value: the smaller is the low end. Undefined for a range written
 * as one quantity ("between 120 and 300 ppm") and for a figure alone.
 */
function pairedEnd(sentence: string, quantities: Quantity[], bindings: Binding[], binding: Binding): 'low' | 'high' | undefined {
  const q = quantities[binding.quantityIndex];
  if (q === undefined || statesRange(q)) return undefined;
  for (const pair of endpointPairs(sentence, quantities)) {
    const other = pair.first === binding.quantityIndex ? pair.second : pair.second === binding.quantityIndex ? pair.first : undefined;
    const o = other === undefined ? undefined : quantities[other];
    if (o === undefined || !bindings.some((b) => b.quantityIndex === other && b.referenceId === binding.referenceId)) continue;
    return q.value <= o.value ? 'low' : 'high';
  }
  return undefined;
}

const recordMatchers = new WeakMap<LoadedPacks, TopicMatcher>();

/** Whether the sentence names a regional record: an ice core, or the Antarctic, Greenland or the poles. */
function namesRegionalRecord(sentence: string, packs: LoadedPacks): boolean {
  let matcher = recordMatchers.get(packs);
  if (matcher === undefined) {
    const regions = packs.lexicon['regions'] ?? {};
    matcher = createTopicMatcher([...entityWordsOf(packs.lexicon, ['ice-core']), ...['antarctic', 'greenland', 'polar'].flatMap((k) => regions[k] ?? [])]);
    recordMatchers.set(packs, matcher);
  }
  return matcher.test(sentence) || readsBack(sentence);
}

/** The scope check whose flag a regional figure told as global gets. */
const REGIONAL_AS_GLOBAL = 'scope.regional-record-as-global';

/**
 * A regional value (`regional_version_of: r`) whose range holds the claim, flagged by the scope
 * check when the packs have it enabled; the correction is the global value's.
 */
function regionalMatch(r: ReferenceValue, q: Quantity, packs: LoadedPacks): FlagDraft | undefined {
  const check = packs.reasoning.find((c) => c.id === REGIONAL_AS_GLOBAL && c.enabled);
  const local = check === undefined ? undefined : packs.references.find((v) => v.regionalVersionOf === r.id && relativeDistance(q.low, q.high, v) === 0);
  if (check === undefined || local === undefined) return undefined;
  const reference = shownReference(r, q);
  return {
    ruleId: check.id,
    level: check.level,
    start: q.start,
    end: q.end,
    reason: `The draft gives ${q.text} for the ${midSentence(r.measures, packs)}, the size of the ${midSentence(local.measures, packs)} (${shownReference(local, q).text}); the sources give ${reference.text} for the globe.`,
    claimed: shownClaim(q),
    reference,
    correction: correctionFor(r, q),
    sources: [...r.sources, ...local.sources.filter((s) => !r.sources.includes(s))],
  };
}

/**
 * An older figure the claim matches: a value that `r` superseded (e.g. the 740,000 years EPICA
 * published in 2004, extended to 800,000 in 2007). Such a claim was right when first published,
 * so it gets a note naming the newer value rather than a warning.
 */
function supersededMatch(r: ReferenceValue, q: Quantity, packs: LoadedPacks): ReferenceValue | undefined {
  return packs.references.find((old) => old.supersededBy === r.id && relativeDistance(q.low, q.high, old) === 0);
}

function supersededReason(r: ReferenceValue, q: Quantity, older: ReferenceValue, range: string, packs: LoadedPacks): string {
  const when = older.asOf === undefined ? 'an earlier figure' : `the figure of ${older.asOf.slice(0, 4)}`;
  const now = r.asOf === undefined ? '' : ` (as of ${r.asOf})`;
  return `The draft gives ${q.text} for the ${midSentence(r.measures, packs)}: ${when}, right when published and since superseded; the sources now give ${range}${now}`;
}

function supersededAsCurrent(r: ReferenceValue, q: Quantity, older: ReferenceValue, range: string, packs: LoadedPacks): string {
  const when = older.asOf === undefined ? 'an earlier figure' : `the figure of ${older.asOf.slice(0, 4)}`;
  return `The draft gives ${q.text} for the ${midSentence(r.measures, packs)} as today's figure: that is ${when}, since superseded; the sources now give ${range}${r.asOf === undefined ? '' : ` (as of ${r.asOf})`}.`;
}

function reasonFor(r: ReferenceValue, q: Quantity, range: string, aboutToday: boolean, packs: LoadedPacks): string {
  const measures = midSentence(r.measures, packs);
  const base = `The draft gives ${q.text} for the ${measures}; the sources give ${range}`;
  if (r.asOf === undefined) return `${base}.`;
  const today = aboutToday ? ` The draft speaks of today; the reference value is dated ${r.asOf} and changes with time.` : '';
  return `${base} as of ${r.asOf}.${today}`;
}
