import type { Source } from '../types.js';

// A DOI may arrive bare, with a `doi:` prefix, or already as a resolver link.
const DOI_PREFIX = /^(?:doi:\s*|https?:\/\/(?:dx\.)?doi\.org\/)/i;

/**
 * The resolver link for a DOI: `10.1126/science.1141038` gives
 * `https://doi.org/10.1126/science.1141038`. Characters a URL cannot carry (`<`, `#`, `;`...) are
 * percent-encoded segment by segment, which the resolver accepts.
 */
export function doiUrl(doi: string): string {
  const bare = doi.trim().replace(DOI_PREFIX, '');
  return `https://doi.org/${bare.split('/').map(encodeURIComponent).join('/')}`;
}

/** True when the value was recalled rather than read in the source (`how` says `from memory`). */
export function isFromMemory(source: Source): boolean {
  return source.how.trim().toLowerCase().startsWith('from memory');
}

/** Where to read the source: its DOI link, else its URL, else nothing. */
export function sourceLink(source: Source): string | undefined {
  if (source.doi !== undefined && source.doi.trim() !== '') return doiUrl(source.doi);
  if (source.url !== undefined && source.url.trim() !== '') return source.url.trim();
  return undefined;
}

/** `(from memory)`, `(DOI from memory)`, `(value and DOI, page from memory)`, or nothing. */
export function memoryMark(source: Source): string {
  const fields = source.fromMemory ?? [];
  if (isFromMemory(source)) return fields.length === 0 ? '(from memory)' : `(value and ${fields.join(', ')} from memory)`;
  return fields.length === 0 ? '' : `(${fields.join(', ')} from memory)`;
}

/**
 * The short reference an editor reads on one line: `Jouzel et al. 2007, Science 317,
 * doi:10.1126/science.1141038`, rendered from the source's CSL-JSON fields by the CSL processor.
 * A source written as plain `cite` text (a team pack) is cut after its year.
 */
export function shortReference(source: Source): string {
  if (source.short !== undefined) return source.short;
  const link = source.doi === undefined ? source.url : `doi:${source.doi.replace(DOI_PREFIX, '')}`;
  const m = /^(.*?)\s*\((\d{4})[^)]*\)/u.exec(source.cite);
  const head = m === null ? source.cite : `${namesOf(m[1] ?? '')} ${m[2] ?? ''}`;
  return [head.trim(), link].filter((x) => x !== undefined && x !== '').join(', ');
}

/** `Jouzel et al.`, `Sigman & Boyle`, `Berger` from an author list written as text. */
function namesOf(authors: string): string {
  const family = (text: string) => (text.split(',')[0] ?? '').trim();
  if (/\bet al\b/u.test(authors)) return `${family(authors)} et al.`;
  const [before, after] = authors.split(/\s+(?:&|and)\s+/u);
  if (after === undefined) return family(authors);
  // "Family, I. & Other, J.": two people; "Family, I., Second, J. & Third, K.": three or more.
  return /\.,\s*\S/u.test(before ?? '') ? `${family(authors)} et al.` : `${family(before ?? '')} & ${family(after)}`;
}

/**
 * One source on one line for text reports, checklists and hovers: the short reference and the
 * from-memory mark, so an editor knows what to look up before relying on it.
 */
export function formatSource(source: Source): string {
  const mark = memoryMark(source);
  return mark === '' ? shortReference(source) : `${shortReference(source)} ${mark}`;
}

/** The full reference with its link and from-memory mark, for `explain`, JSON and exports. */
export function fullReference(source: Source): string {
  const link = sourceLink(source);
  const text = source.cite.trim();
  const parts = [text, ...(link === undefined || text.includes(link) ? [] : [link])];
  const mark = memoryMark(source);
  if (mark !== '') parts.push(mark);
  return parts.join(' ');
}
