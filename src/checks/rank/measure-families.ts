/**
 * Measure families: reference values that state one measure (a record's span, a core's drilled
 * depth, a count of cycles) for different named entities, derived from the pack's binding terms
 * alone. A value bound by two term groups, one of them a single entity term, belongs to the family
 * of its other group when that family has more members than the family its entity would form:
 *
 *   vostok-record-span     all: [[vostok], [record]]  ┐
 *   edc-record-span        all: [[edc], [record]]     ├ family [record]: Vostok, EPICA Dome C, Dome Fuji
 *   dome-fuji-record-span  all: [[dome-fuji], [record]] ┘
 *
 * A family is named by the id ending most of its members share ("record-span", "drilled-depth"),
 * else by its measure term, and gives rank and comparison claims their rule id `value.rank.<name>`.
 */
import type { LoadedPacks, ReferenceValue } from '../../rulepack/types.js';
import type { Dimension } from '../../types.js';

/** One member of a family: the entity term it is about and its reference value. */
export interface FamilyMember {
  entity: string;
  reference: ReferenceValue;
}

/** Values of one measure, one per entity. */
export interface MeasureFamily {
  name: string;
  /** The term group every member shares: the words that name the measure. */
  measureTerms: string[];
  dimension: Dimension;
  members: FamilyMember[];
}

const cache = new WeakMap<object, MeasureFamily[]>();

/** The measure families of `packs` with two or more members (cached per pack set). */
export function measureFamilies(packs: LoadedPacks): MeasureFamily[] {
  const cached = cache.get(packs);
  if (cached !== undefined) return cached;
  const readings = new Map<string, { measure: string[]; dimension: Dimension; members: FamilyMember[] }>();
  // A measure group is named by its first term: "[record, record-reach]" widens the words that bind
  // EPICA Dome C's span, and it is still the record-span family of "[record]".
  const keyOf = (measure: string[], dimension: Dimension): string => `${measure[0] ?? ''}@${dimension}`;
  for (const r of packs.references) {
    for (const [entity, measure] of splits(r)) {
      const key = keyOf(measure, r.dimension);
      const found = readings.get(key) ?? { measure: [], dimension: r.dimension, members: [] };
      found.measure = [...new Set([...found.measure, ...measure])];
      found.members.push({ entity, reference: r });
      readings.set(key, found);
    }
  }
  // Each value joins the larger of its possible families; a tie leaves it out (no reading is clear).
  const size = (measure: string[], dimension: Dimension): number => readings.get(keyOf(measure, dimension))?.members.length ?? 0;
  const families: MeasureFamily[] = [];
  for (const { measure, dimension, members } of readings.values()) {
    const kept = members.filter((m) => {
      const other = splits(m.reference).find(([entity]) => entity !== m.entity);
      return other === undefined || size(other[1], dimension) < members.length;
    });
    const entities = new Set(kept.map((m) => m.entity));
    if (kept.length < 2 || entities.size !== kept.length) continue;
    families.push({ name: familyName(kept, measure), measureTerms: measure, dimension, members: kept });
  }
  cache.set(packs, families);
  return families;
}

/** The ways a two-group value reads as (entity, measure group): each single-term group may be the entity. */
function splits(r: ReferenceValue): [string, string[]][] {
  const groups = r.binding.all;
  if (groups.length !== 2) return [];
  const [a, b] = groups as [string[], string[]];
  const out: [string, string[]][] = [];
  if (a.length === 1) out.push([a[0] as string, b]);
  if (b.length === 1) out.push([b[0] as string, a]);
  return out;
}

/** The id ending (at a hyphen) that the most members share, the longest on a tie; else the measure term. */
function familyName(members: FamilyMember[], measure: string[]): string {
  const counts = new Map<string, number>();
  for (const m of members) {
    const parts = m.reference.id.split('-');
    for (let i = 1; i < parts.length; i++) {
      const ending = parts.slice(i).join('-');
      counts.set(ending, (counts.get(ending) ?? 0) + 1);
    }
  }
  const best = [...counts].filter(([, n]) => n >= 2).sort((x, y) => y[1] - x[1] || y[0].length - x[0].length)[0];
  return best?.[0] ?? [...measure].sort().join('-');
}
