import type { Source } from '../types.js';
import { sourceLink } from './format-source.js';

/**
 * A source as an in-text citation: first author's surname, `et al.` when there are more, and the
 * year, then the DOI or address: `Petit et al. 1999, https://doi.org/10.1038/20859`. For a body
 * as author (`IPCC (2021). ...`) the body's name stands. Falls back to the full citation's start.
 */
export function shortCitation(source: Source): string {
  const cite = source.cite.trim();
  const year = /\((\d{4}[a-z]?(?:\/\d{4})?)\)/u.exec(cite);
  const authors = year === null ? '' : cite.slice(0, year.index).trim();
  let short: string;
  if (year === null || authors === '') {
    short = [...cite].slice(0, 60).join('');
  } else {
    const surname = (authors.split(',')[0] ?? authors).trim();
    const many = authors.includes(',') && (authors.includes('&') || /et al/u.test(authors) || authors.split(',').length > 2);
    short = `${surname}${many ? ' et al.' : ''} ${year[1] ?? ''}`;
  }
  const link = sourceLink(source);
  return link === undefined ? short : `${short}, ${link}`;
}
