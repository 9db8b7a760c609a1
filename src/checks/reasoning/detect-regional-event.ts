/**
 * `scope.regional-event-as-global`: a regional cold event told as the whole planet's.
 *
 *   "During the Younger Dryas the whole world plunged back into the cold."
 *                                 ^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^ flagged
 *   "The Antarctic Cold Reversal, a global cooling, interrupted the thaw."
 *                                  ^^^^^^^^^^^^^^ flagged
 *
 * Fires when a sentence names a regional cold event (cue words `events`: the Younger Dryas of the
 * North Atlantic region, the Antarctic Cold Reversal of the south, the Heinrich stadials) and gives
 * the globe a cooling: a global word (lexicon `regions.global`) holding a cool word after it in its
 * segment ("the whole planet slid back towards the cold", "a global cooling"). A contrast anywhere
 * in the sentence (cue words `contrast`: "only slightly", "while", "the north") sets the globe
 * apart from the event, and passes; so does the globe after the cool word ("chilled much of the
 * world": whose temperature is meant is left open).
 */
import { findPhrases } from '../../claims/frames-match.js';
import { regionOwnsEntity } from '../../propositions/sentence.js';
import type { Cue, DetectInput, DetectorEntry } from './detector.js';

/** How many words a cool word may stand after the global word that holds it ("the whole world plunged back into near-glacial cold"). */
const REACH = 7;

function detect(input: DetectInput): Cue[] {
  const here = input.read(input.index);
  if (here === undefined) return [];
  const s = here.s;
  const cools = s.of('changes', 'cool');
  const held = s
    .of('regions', 'global')
    .filter((g) => !regionOwnsEntity(s, g))
    .flatMap((g) => {
      const cool = cools.find((c) => c.first > g.last && c.first - g.last <= REACH && s.words[c.first]?.segment === s.words[g.first]?.segment);
      return cool === undefined ? [] : [{ global: g, cool }];
    });
  const first = held[0];
  if (first === undefined) return [];
  // The tokens (with compromise's roots) are read only for a sentence that gives the globe a cooling.
  if (findPhrases(input.sentence, input.words('events')).length === 0) return [];
  if (input.mayHold('contrast') && findPhrases(input.sentence, input.words('contrast')).length > 0) return [];
  return [{ start: s.words[first.global.first]?.start ?? 0, end: s.words[first.cool.last]?.end ?? 0 }];
}

/** `scope.regional-event-as-global` for the registry. */
export const regionalEventAsGlobal: DetectorEntry = { detect, keys: ['events'] };
