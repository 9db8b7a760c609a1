/**
 * Size bounds on a rule pack, checked on the parsed data before the schema and before anything is
 * compiled, so a pack of any size costs bounded time and memory to refuse (ROBUSTNESS-REPORT R11:
 * 100,000 reference values took 24 s and 1.9 GB; one term of 100,000 words 40 s). The bounds leave
 * wide room over the built-in pack (123 reference values, 100 terms of at most 23 words, 1,723
 * lexicon words): split a larger collection into several packs.
 */
import type { FirnlineError } from '../errors.js';
import type { YamlFile } from './yaml-file.js';

/** The largest pack file Firnline reads. */
export const MAX_PACK_BYTES = 2 * 1024 * 1024;
/** The most entries one section of a pack may hold (sources, terms, reference values, ...). */
export const MAX_PACK_ENTRIES = 2_000;
/** The most words one term or one lexicon key may list. */
export const MAX_WORDS_PER_LIST = 500;
/** The most words a pack may list in all its terms and lexicon together. */
export const MAX_PACK_WORDS = 20_000;

const SECTIONS = ['sources', 'terms', 'reference_values', 'direction_facts', 'patterns', 'reasoning_checks'];

/** One error per bound exceeded, placed at the first entry or word beyond it. */
export function packLimitProblems(yaml: YamlFile): FirnlineError[] {
  const data = yaml.data as Record<string, unknown>;
  const problems: FirnlineError[] = [];
  for (const section of SECTIONS) {
    const list = Object.hasOwn(data, section) ? data[section] : undefined;
    if (Array.isArray(list) && list.length > MAX_PACK_ENTRIES) {
      problems.push(yaml.errorAt('pack-too-large', [section, MAX_PACK_ENTRIES], `more than ${MAX_PACK_ENTRIES.toLocaleString('en')} entries in \`${section}\` (${list.length.toLocaleString('en')}); split the pack into several packs`));
    }
  }
  const lists: { path: (string | number)[]; words: unknown[] }[] = [];
  const terms = Object.hasOwn(data, 'terms') ? data['terms'] : undefined;
  if (Array.isArray(terms)) {
    terms.slice(0, MAX_PACK_ENTRIES + 1).forEach((term: unknown, i) => {
      const words = term !== null && typeof term === 'object' && Object.hasOwn(term, 'words') ? (term as { words: unknown }).words : undefined;
      if (Array.isArray(words)) lists.push({ path: ['terms', i, 'words'], words });
    });
  }
  const lexicon = Object.hasOwn(data, 'lexicon') ? data['lexicon'] : undefined;
  if (lexicon !== null && typeof lexicon === 'object') {
    for (const [cls, keys] of Object.entries(lexicon)) {
      if (keys === null || typeof keys !== 'object') continue;
      for (const [key, words] of Object.entries(keys as Record<string, unknown>)) if (Array.isArray(words)) lists.push({ path: ['lexicon', cls, key], words });
    }
  }
  let total = 0;
  for (const { path, words } of lists) {
    if (words.length > MAX_WORDS_PER_LIST) {
      problems.push(yaml.errorAt('pack-too-large', [...path, MAX_WORDS_PER_LIST], `more than ${MAX_WORDS_PER_LIST} words in one list (${words.length.toLocaleString('en')}); split them over several terms or lexicon keys`));
    }
    const before = total;
    total += words.length;
    if (before <= MAX_PACK_WORDS && total > MAX_PACK_WORDS) {
      problems.push(yaml.errorAt('pack-too-large', [...path, MAX_PACK_WORDS - before], `more than ${MAX_PACK_WORDS.toLocaleString('en')} words in the pack's terms and lexicon together; split the pack into several packs`));
    }
  }
  return problems;
}
