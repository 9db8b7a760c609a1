import { subjectWordsOf } from '../propositions/index.js';
import type { LoadedPacks } from '../rulepack/types.js';

/**
 * The words that decide whether a file is on topic at all: names of subjects (ice cores, CO2,
 * periods, regions), never generic words such as "record", "percent" or "now" that every docs page
 * uses. One compiled matcher of these words runs over the raw text of every file before any parse.
 *
 * The words are the packs' lexicon subjects (`lexicon.subjects`: their entities, and every period),
 * as the engine's claim test reads them (propositions/subjectWordsOf), so the file prefilter, the
 * windows around hits and "a number beside a subject" all use one list. Packs without a lexicon
 * fall back to the built-in pack's subject terms below, and every term of a team's own pack.
 */
export function topicWordsOf(packs: LoadedPacks): string[] {
  const lexicon = subjectWordsOf(packs.lexicon);
  if (lexicon.length > 0) return [...new Set(lexicon.map((w) => w.toLowerCase()))];
  const words: string[] = [];
  for (const pack of packs.packs) {
    const builtin = pack.id === BUILTIN_PACK_ID;
    for (const term of pack.terms) {
      if (builtin && !SUBJECT_TERMS.has(term.id)) continue;
      words.push(...term.words.filter((w) => !GENERIC_WORDS.has(w.toLowerCase())));
    }
  }
  return [...new Set(words.map((w) => w.toLowerCase()))];
}

const BUILTIN_PACK_ID = 'paleoclimate';

/** Built-in terms that name a subject: the gas, the cores and sites, the periods, the regions. */
const SUBJECT_TERMS = new Set([
  // the gases
  'co2', 'other-gas', 'sensitivity',
  // cores, sites and what is special about their ice
  'vostok', 'edc', 'edml', 'dome-fuji', 'grip', 'beyond-epica', 'allan-hills', 'oldest-record', 'delta-age', 'lake', 'mauna-loa',
  // periods and events
  'cycles', 'lgm', 'glacial', 'interglacial', 'preindustrial', 'deglaciation', 'ice-age-end', 'holocene', 'younger-dryas', 'acr',
  'last-interglacial', 'pleistocene', 'mpt', 'eccentricity', 'obliquity', 'precession',
  // regions and things
  'ice-sheets', 'sea-level', 'antarctic', 'west-antarctic', 'east-antarctic', 'greenland',
]);

/** Words of those terms that ordinary pages use about anything else. */
const GENERIC_WORDS = new Set(['cycles', 'tilt', 'wobble', 'wobbles', 'summit', '1750', 'before industry']);
