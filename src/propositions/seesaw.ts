/**
 * The scene of a northern cold event that a sentence about the south echoes (the bipolar seesaw).
 *
 *   "Greenland plunged back into near-glacial cold. The chill was mirrored in the far south,
 *    where Antarctic temperatures dropped in step."
 *   → the Antarctic cooling is set in a northern cold event (`northern-stadial`)
 *
 * A southern cooling is said to echo the north's when the north cools in this sentence or the one
 * before, and this sentence ties the two together: a correlation word ("mirrored", "matching"), a
 * word of timing together ("in step"), or a word of sameness (closed class below). A scene of the
 * glacial cycle itself (the LGM, an ice age) is no stadial: both poles were colder then.
 */
import type { ReadSentence } from './sentence.js';
import type { Directed } from './types.js';

/** The period key a southern cooling that echoes a northern cold event is set in. */
export const NORTHERN_COLD_EVENT = 'northern-stadial';

/** Words that say one place shared what another went through. */
const SAMENESS = new Set(['same', 'too', 'also', 'likewise', 'similarly', 'alongside', 'matching', 'mirrored', 'echoed']);
const NORTH = new Set(['greenland', 'north']);
const SOUTH = new Set(['antarctic', 'south']);

/** True when the north cools in `directed` (a denied cooling is none). */
const northCools = (directed: readonly Directed[]) => directed.some((d) => d.attribute === 'temperature' && NORTH.has(d.of) && d.dir === -1 && !d.negated);

/**
 * The period a southern cooling of `s` is set in when it echoes a northern cooling, else undefined.
 * `directed` are the directed things of `s`, `before` those of the sentence before.
 */
export function echoedNorthernCold(s: ReadSentence, directed: readonly Directed[], previous: ReadSentence | undefined, before: readonly Directed[]): string | undefined {
  if (!directed.some((d) => d.attribute === 'temperature' && SOUTH.has(d.of) && d.dir === -1)) return undefined;
  if (!northCools(directed) && !northCools(before)) return undefined;
  // ("near-glacial cold" is how a stadial is told: the word alone sets no glacial scene.)
  const glacial = (r: ReadSentence | undefined) => r !== undefined && (r.of('periods', 'lgm').length > 0 || r.of('entities', 'ice-age').length > 0);
  if (glacial(s) || glacial(previous)) return undefined;
  const tied = s.of('correlation').length > 0 || s.of('order', 'together').length > 0 || s.words.some((w) => SAMENESS.has(w.text));
  return tied ? NORTHERN_COLD_EVENT : undefined;
}
