/**
 * A count told with a partitive ("eight of those ice-age cycles", "ten of these cycles"; the unit
 * table reads it) states how many a record holds only when it closes what holds them: "the Vostok
 * core has eight of those cycles in it", "covers ten of these cycles." A partitive that a predicate
 * follows picks members out of a whole ("one of those glacial cycles lasted 100,000 years", "two of
 * these cycles had warmer peaks"), a partitive opening its clause is its subject, and "one of" always
 * names a member: such a figure counts no total and is read as a bare number, binding no count.
 */
import type { Quantity } from '../types.js';

/** The partitive inside a count's text: "of those", "of these", "of the", "of its", "of their". */
const PARTITIVE = /\sof\s+(?:those|these|the|its|their)\s/iu;
/** A count read as "one" or "a single": a member, never a total. */
const ONE = /^(?:one|1|a single)\s/iu;
/**
 * What may follow a total: the end of its clause, or a preposition that places the things counted
 * ("in it", "in the record", "over 800,000 years") (common practice: English prepositions are a
 * closed class).
 */
const CLOSE_AFTER = /^\s*(?:$|[.,;:!?)—–-]|(?:in|on|at|from|over|across|within|during|since|through|back|between|so|and|but)(?![\p{L}]))/iu;

/** Nothing but the start of a sentence or clause (and the words that join clauses) before a figure. */
const OPENS_CLAUSE = /(?:^|[,;:(—–]|(?:^|\s)(?:and|but|while|whereas))\s*$/iu;

/** The quantities with every partitive count that names members, not a total, read as a bare number. */
export function readPartitiveCounts(sentence: string, quantities: Quantity[]): Quantity[] {
  if (!quantities.some((q) => q.dimension === 'count' && PARTITIVE.test(q.text))) return quantities;
  return quantities.map((q) => {
    if (q.dimension !== 'count' || !PARTITIVE.test(q.text)) return q;
    // A partitive opening its clause is its subject, members doing something: "Two of these cycles
    // in the Vostok record had warmer peaks." A total is the object of what holds it.
    const opensClause = OPENS_CLAUSE.test(sentence.slice(0, q.start));
    const total = !opensClause && !ONE.test(q.text.trim()) && CLOSE_AFTER.test(sentence.slice(q.end));
    return total ? q : { ...q, dimension: 'number' as const, unit: '' };
  });
}
