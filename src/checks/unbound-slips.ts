/**
 * A figure that binds nothing, whose passage names what it measures, and whose number fits that
 * measure only in the unit a writer confuses with the one written:
 *
 *   "The Vostok hole went down 3,623 ft."      Vostok named, no word for depth: the drilled depth
 *                            ^^^^^^^^^         and the borehole into the lake are both Vostok
 *                                              lengths, so nothing binds; read as metres, 3,623
 *                                              fits the drilled depth alone (unit.scale-slip)
 *   "Sea level fell by roughly 120 feet." (after a sentence on the glacial peak)
 *
 * The figure's candidates are the pack's values of its dimension whose binding groups the sentence
 * and its passage (the sentences before, a question above) fill: every subject group (a core, the
 * sea level, a period: bind-implied.ts termSorts) and every attribute group but one at most, with a
 * term of one group in the sentence itself (or the sentence, naming no term, answers a question),
 * no veto in the sentence, and no other attribute of the dimension named (in the sentence, or in
 * the passage too when the value's own attribute is unnamed). The figure is held to them as written first: when it fits one, it is
 * a right figure that merely did not bind, and nothing is said. Otherwise, when exactly one
 * candidate takes the figure read in a confused unit (reference-slips.ts unitSlip, with its guards
 * for near units and hedges), the slip is flagged against that value; two or more: nothing.
 * Unlike a binding, the reading decides only between the values the passage names, and the number
 * as written must miss every one of them: it names the slip, never a wrong value.
 */
import { findTerms } from '../claims/bind.js';
import { termSorts } from '../claims/bind-implied.js';
import type { LoadedPacks, ReferenceValue } from '../rulepack/types.js';
import type { Binding, FlagDraft, Quantity } from '../types.js';
import { checkReferences } from './reference.js';
import { relativeDistance } from './reference-distance.js';
import { unitSlip } from './reference-slips.js';
import { isVagueTime } from './arithmetic-vague.js';
import { writtenInterval } from '../quantities/index.js';

/** A sentence that ends as a question, past closing quotes, brackets and emphasis marks. */
const QUESTION = /\?[\s"'”’)\]*_]*$/u;

/**
 * The values `q`'s passage names: every subject group filled (in the sentence or its passage), one
 * attribute group missing at most, one group named in the sentence itself (unless it answers a
 * question), no veto in the sentence, and no attribute of the dimension named in the sentence that
 * the value lacks ("a lag of 800 years" beside Dome C is no record span of Dome C).
 */
function candidatesOf(q: Quantity, terms: NamedTerms, packs: LoadedPacks): ReferenceValue[] {
  const { subjects, attributes } = termSorts(packs, q.dimension);
  const { own, named, answers } = terms;
  return packs.references.filter((r) => {
    if (r.dimension !== q.dimension || r.binding.implied === false || r.binding.none.some((id) => own.has(id))) return false;
    const groups = r.binding.all;
    const missing = groups.filter((g) => !g.some((id) => named.has(id)));
    if (missing.length > 1 || missing.some((g) => g.some((id) => subjects.has(id))) || missing.length === groups.length) return false;
    // With its own attribute unnamed, an attribute the passage names speaks for the figure too ("The
    // lag ... Older estimates, such as 800 ± 600 years from Dome C").
    const its = new Set(groups.flat());
    const speaking = missing.length === 0 ? own : named;
    if ([...speaking].some((id) => attributes.has(id) && !subjects.has(id) && !its.has(id))) return false;
    return answers || groups.some((g) => g.some((id) => own.has(id)));
  });
}

/**
 * The unit-slip flags of the figures of `sentence` that bind nothing and fit, in a confused unit, the
 * one value their passage names. `taken` holds the flags already made on the sentence's figures. `passage` is the text before the sentence (its last sentences, the
 * lead-in or the question it answers).
 */
export function unboundSlips(sentence: string, quantities: Quantity[], bindings: readonly Binding[], taken: readonly FlagDraft[], packs: LoadedPacks, passage: readonly string[]): FlagDraft[] {
  const flags: FlagDraft[] = [];
  let terms: NamedTerms | undefined;
  quantities.forEach((q, i) => {
    if (q.statedUnit === '' || q.statedUnit === 'CE' || q.dimension === 'number' || q.dimension === 'ratio' || bindings.some((b) => b.quantityIndex === i)) return;
    // A figure another reading has already flagged (a rebound slip) is not read twice.
    if (taken.some((f) => f.start <= q.start && q.end <= f.end)) return;
    // "a few thousand years", "centuries": a time told vaguely names no figure to mistake.
    if (isVagueTime(q.text)) return;
    // "20 °C colder is a 36 °F drop": a figure that restates another of its sentence is that figure's
    // (tested before the passage's terms are looked up, which costs more).
    if (quantities.some((o) => o !== q && o.dimension === q.dimension && o.low <= q.high && q.low <= o.high)) return;
    terms ??= termsOf(sentence, passage, packs);
    const candidates = candidatesOf(q, terms, packs);
    // A figure that fits a value it may speak of as written is right, only unbound; and a figure of
    // its sentence that fits the value as written is the writer's own right one ("3,270 feet can't
    // be right: Dome C is 3,270 metres") or the figure it restates, which the restatement check reads.
    const fitsAsWritten = (r: ReferenceValue) => quantities.some((o) => o.dimension === q.dimension && relativeDistance(o.low, o.high, r) === 0);
    if (candidates.some(fitsAsWritten)) return;
    // With no value its passage names in full that a confused reading fits, the figure may still be
    // one value's own figure in a confused unit, a value the sentence names in part ("Peak ice was around 21 Ma").
    const named = candidates.filter((r) => unitSlip(r, q) !== undefined);
    const fitting = named.length > 0 ? named : ownFigureValues(q, terms, packs);
    // A value the number as written fits (its hedge apart, reference.ts writtenOutside), or another
    // figure of the sentence fits, is no slip's.
    const written = writtenInterval(q).value;
    const fitsOwn = (r: ReferenceValue) => relativeDistance(written, written, r) === 0 || quantities.some((o) => o !== q && o.dimension === q.dimension && relativeDistance(o.low, o.high, r) === 0);
    if (named.length === 0 && fitting.some(fitsOwn)) return;
    const [only] = fitting;
    if (only === undefined || fitting.length > 1) return;
    const slip = checkReferences(sentence, quantities, [{ quantityIndex: i, referenceId: only.id }], packs).flags.find((f) => f.ruleId === 'unit.scale-slip');
    if (slip !== undefined) flags.push(slip);
  });
  return flags;
}

/**
 * How close a confused reading must come to a value's own figure, as a share of that figure: "about
 * 6 °F" read as °C (5.35-6.65) holds the 6 °C of the global glacial cooling; "some 4 km" read as
 * miles (6.0-6.9 km) is no figure's own reading but a wrong number.
 */
const OWN_FIGURE_WIDTH = 0.25;

/**
 * The values a figure that its passage leaves unbound is the own figure of, read in a confused unit:
 * the value's best estimate, or its one figure, lies inside the figure's other reading, which is
 * narrow, and the sentence names one of the value's groups with no veto and no other attribute of
 * the dimension. "Peak ice was around 21 Ma" (the glacial peak, 21 ka; "peak" names it only in
 * part), "a long run of ice ages that started about 2.58 thousand years ago" (the base of the
 * Quaternary, 2.58 million). Of several such values, those the passage leaves fewest groups of
 * unnamed are kept, then those it names most groups of, and only one of them may be left: a figure that is the own figure of two values says nothing.
 * A share written in percent is left alone: it is as often a relative change as a share of the air.
 */
function ownFigureValues(q: Quantity, terms: NamedTerms, packs: LoadedPacks): ReferenceValue[] {
  if (q.statedUnit === '%') return [];
  const { subjects, attributes } = termSorts(packs, q.dimension);
  const { own, named } = terms;
  const written = writtenInterval(q).value;
  const unnamed = (r: ReferenceValue) => r.binding.all.filter((g) => !g.some((id) => named.has(id))).length;
  // "that 800 yr number is old" in a thread on the lag: a value the number fits as written, which
  // the passage names as fully as the slip's value, may be what the figure speaks of.
  const asWritten = packs.references.filter((r) => r.dimensions.includes(q.dimension) && relativeDistance(written, written, r) === 0 && unnamed(r) < r.binding.all.length);
  const scored = packs.references.flatMap((r) => {
    if (!r.dimensions.includes(q.dimension) || r.binding.implied === false || r.binding.none.some((id) => own.has(id))) return [];
    const groups = r.binding.all;
    if (!groups.some((g) => g.some((id) => own.has(id)))) return [];
    if (asWritten.some((w) => unnamed(w) <= unnamed(r))) return [];
    const its = new Set(groups.flat());
    if ([...own].some((id) => attributes.has(id) && !subjects.has(id) && !its.has(id))) return [];
    const figure = r.central ?? (r.low === r.high ? r.low : undefined);
    if (figure === undefined || figure === 0) return [];
    const slip = unitSlip(r, q);
    if (slip === undefined || figure < slip.low || slip.high < figure || slip.high - slip.low > Math.abs(figure) * OWN_FIGURE_WIDTH) return [];
    const filled = groups.filter((g) => g.some((id) => named.has(id))).length;
    return [{ r, missing: groups.length - filled, filled }];
  });
  const fewest = Math.min(...scored.map((s) => s.missing));
  const most = Math.max(...scored.filter((s) => s.missing === fewest).map((s) => s.filled));
  return scored.filter((s) => s.missing === fewest && s.filled === most).map((s) => s.r);
}

/** The terms the sentence names, those it and its passage name, and whether it answers a question naming nothing itself. */
interface NamedTerms {
  own: ReadonlySet<string>;
  named: ReadonlySet<string>;
  answers: boolean;
}

function termsOf(sentence: string, passage: readonly string[], packs: LoadedPacks): NamedTerms {
  const own = new Set(findTerms(sentence, packs).keys());
  const named = new Set([...own, ...passage.flatMap((text) => [...findTerms(text, packs).keys()])]);
  // "How deep did the drill reach?" over "3,623 feet.": an answer that names nothing reads on from its question.
  const last = passage.at(-1);
  const answers = own.size === 0 && last !== undefined && QUESTION.test(last);
  return { own, named, answers };
}
