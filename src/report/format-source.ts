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

/**
 * One source on one line: citation, link, and `(from memory)` when nobody checked it against the
 * source, so an editor knows to look it up before relying on it.
 */
export function formatSource(source: Source): string {
  const link = sourceLink(source);
  const parts = [source.cite.trim(), ...(link === undefined ? [] : [link])];
  if (isFromMemory(source)) parts.push('(from memory)');
  return parts.join(' ');
}
