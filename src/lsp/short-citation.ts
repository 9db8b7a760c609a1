/**
 * The short form of a citation, as an editor writes it in running text: `Petit et al. 1999`,
 * `Lüthi & Stocker 2008`, `Jouzel 2013`. Read from the full citation the packs carry
 * (`Authors (year). Title. Journal volume, pages.`): one or two surnames, "et al." past two, then
 * the year (the author-date short form of the field's journals: common practice).
 */
import { sourceLink } from '../report/format-source.js';
import type { Source } from '../types.js';

// `(1999)`, `(1999a)`, `(1999/2001)`; a full date `(2024-04-05)` gives its year.
const AUTHORS_AND_YEAR = /^(?<authors>.+?)\s*\((?<year>\d{4}(?:[a-z]|\/\d{4})?)(?:-\d{2}){0,2}\)/u;

/** `Petit et al. 1999` from `Petit, J. R., Jouzel, J., ... & Stievenard, M. (1999). Climate ...`. */
export function shortCitation(cite: string): string {
  const found = AUTHORS_AND_YEAR.exec(cite.trim());
  if (found?.groups === undefined) return firstWords(cite);
  const { authors = '', year = '' } = found.groups;
  const names = authorSurnames(authors);
  const who = names.length === 1 ? names[0] : names.length === 2 ? `${names[0]} & ${names[1]}` : `${names[0]} et al.`;
  return `${who} ${year}`;
}

/** The citation with its link: `Petit et al. 1999, https://doi.org/10.1038/20859`. */
export function shortCitationWithLink(source: Source): string {
  const link = sourceLink(source);
  return link === undefined ? shortCitation(source.cite) : `${shortCitation(source.cite)}, ${link}`;
}

/**
 * Surnames from `Surname, I., Surname, I. & Surname, I.`; an author list that already ends in
 * `et al.` counts as many; a body such as `IPCC` is one author.
 */
function authorSurnames(authors: string): string[] {
  // "EPICA community members (Augustin, L. et al.)": the body is the author.
  const trimmed = authors.replace(/\s*\([^)]*\)/gu, '').replace(/[.,\s]+$/u, '');
  if (/\bet al\b/u.test(trimmed)) {
    const first = trimmed.split(/,|\bet al\b/u)[0]?.trim() ?? trimmed;
    return [first, '', ''];
  }
  const people = trimmed.split(/\s*&\s*|\s+and\s+/u);
  const surnames: string[] = [];
  for (const group of people) {
    // "Petit, J. R., Jouzel, J." → parts alternate surname, initials.
    const parts = group.split(/\s*,\s*/u).filter((p) => p !== '');
    for (const part of parts) {
      if (!isInitials(part)) surnames.push(part);
    }
  }
  return surnames.length === 0 ? [trimmed] : surnames;
}

/** `J. R.`, `J.-M.`, `T. F.`: initials, not a surname. */
function isInitials(part: string): boolean {
  return /^(?:\p{Lu}\.?(?:-\p{Lu}\.?)?\s*)+$/u.test(part);
}

function firstWords(cite: string): string {
  const words = cite.trim().split(/\s+/u).slice(0, 6).join(' ');
  return words.length < cite.trim().length ? `${words}…` : words;
}
