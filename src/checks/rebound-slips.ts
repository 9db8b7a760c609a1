/**
 * A figure whose wrong unit keeps it from binding: "today's air carries some 420 parts per billion
 * of the gas". The pack lets a unit name a term (`units: [ppm]` on `co2`: in this field a figure in
 * ppm is CO2), so the right number in a unit a writer confuses with that one ("ppb") names nothing
 * and binds no value, and the reference check never sees the slip.
 *
 *   "At Mauna Loa the 2024 average was about 424.6 parts per billion."
 *                                            ^^^^^^^^^^^^^^^^^^^^^^^ read as 424.6 ppm it binds the
 *                                            Mauna Loa 2024 mean, which it fits: ppm meant (unit.scale-slip)
 *
 * Each figure that binds nothing is read again in every unit it is confused with (CONFUSED_UNITS,
 * reference-slips.ts) that names a pack term of its own; when that reading binds a value, the figure
 * as written is checked against it, and only a unit slip is kept: the other reading only chose the
 * value, it claims nothing. A passage that names a gas the unit's term gives way to (`unless`:
 * methane and nitrous oxide, reported in ppb) keeps its figures as written.
 */
import { findTerms } from '../claims/bind.js';
import { convert } from '../quantities/convert.js';
import type { LoadedPacks } from '../rulepack/types.js';
import type { Binding, FlagDraft, Quantity } from '../types.js';
import { checkReferences } from './reference.js';
import { confusedWith } from './reference-slips.js';

/** Binds a sentence's quantities as the engine does, with the sentence's context. */
export type BindAgain = (quantities: Quantity[]) => Binding[];

/** The figure read in the unit `to` of its own dimension: the same number, another unit. */
function readAs(q: Quantity, to: string): Quantity {
  const read = (x: number) => convert(convert(x, q.unit, q.statedUnit, q.dimension), to, q.unit, q.dimension);
  const [low, high] = [read(q.low), read(q.high)].sort((a, b) => a - b) as [number, number];
  return { ...q, statedUnit: to, value: read(q.value), low, high };
}

/** The units that name a pack term, with the terms each gives way to (the term's `unless`). */
function termUnits(packs: LoadedPacks): Map<string, string[]> {
  const units = new Map<string, string[]>();
  for (const term of packs.terms) for (const u of term.units ?? []) units.set(u, [...(units.get(u) ?? []), ...(term.unless ?? [])]);
  return units;
}

/**
 * The unit-slip flags of the figures of `sentence` that bind nothing as written but bind a value
 * when read in a confused unit that names a term. `passage` is the text before the sentence that a
 * gas named there would speak for ("Methane rose too. It sat near 370 ppb.").
 */
export function reboundSlips(sentence: string, quantities: Quantity[], bindings: readonly Binding[], packs: LoadedPacks, bindAgain: BindAgain, passage: readonly string[]): FlagDraft[] {
  const units = termUnits(packs);
  const flags: FlagDraft[] = [];
  // The terms the sentence and its passage name, found once, on the first figure that needs them.
  let named: Set<string> | undefined;
  const names = (id: string): boolean => (named ??= new Set([sentence, ...passage].flatMap((text) => [...findTerms(text, packs).keys()]))).has(id);
  quantities.forEach((q, i) => {
    if (q.statedUnit === '' || units.has(q.statedUnit) || bindings.some((b) => b.quantityIndex === i)) return;
    for (const to of confusedWith(q.statedUnit, q.dimension)) {
      const unless = units.get(to);
      if (unless === undefined) continue;
      if (unless.some(names)) continue;
      const again = quantities.map((o, j) => (j === i ? readAs(q, to) : o));
      const bound = bindAgain(again).find((b) => b.quantityIndex === i);
      if (bound === undefined) continue;
      const slip = checkReferences(sentence, quantities, [bound], packs).flags.find((f) => f.ruleId === 'unit.scale-slip');
      if (slip !== undefined) {
        flags.push(slip);
        return;
      }
    }
  });
  return flags;
}
