import type { LoadedPacks } from '../rulepack/types.js';

/**
 * The words that decide whether a file is on topic at all: names of subjects (ice cores, CO2,
 * periods, regions), never generic words such as "record", "percent" or "now" that every docs page
 * uses. One compiled matcher of these words runs over the raw text of every file before any parse.
 *
 * Where a pack has a `lexicon` section (`entities`, `regions`, `periods`), its lists are the words.
 * Until then the built-in pack's subject terms below stand in, and every term of a team's own pack
 * counts (a team adds a pack to name its own subjects). This is the one place to change.
 */
export function topicWordsOf(packs: LoadedPacks): string[] {
  const words: string[] = [];
  const lexicons = packs.packs.map((p) => (p as { lexicon?: Lexicon }).lexicon).filter((l) => l !== undefined);
  if (lexicons.length > 0) {
    for (const l of lexicons) words.push(...(l.entities ?? []), ...(l.regions ?? []), ...(l.periods ?? []));
  } else {
    for (const pack of packs.packs) {
      const builtin = pack.id === BUILTIN_PACK_ID;
      for (const term of pack.terms) {
        if (builtin && !SUBJECT_TERMS.has(term.id)) continue;
        words.push(...term.words.filter((w) => !GENERIC_WORDS.has(w.toLowerCase())));
      }
    }
  }
  return [...new Set(words.map((w) => w.toLowerCase()))];
}

/** A pack's word lists of subject names (the lead's planned `lexicon` section). */
interface Lexicon {
  entities?: string[];
  regions?: string[];
  periods?: string[];
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
