/**
 * A pack source as a CSL-JSON item (the Citation Style Language data format, schema:
 * https://resource.citationstyles.org/schema/latest/input/json/csl-data.json), so a reference
 * manager can import it and a CSL processor can render it. Only fields of that schema are used.
 */
import type { SourceKind } from '../types.js';

/** A CSL-JSON name: a person (family, given) or an organisation (literal). */
export type CslName = { family: string; given?: string } | { literal: string };

/** The CSL-JSON fields Firnline writes. */
export interface CslItem {
  id: string;
  type: string;
  author?: CslName[];
  issued?: { 'date-parts': [number[]] };
  title?: string;
  'container-title'?: string;
  'container-title-short'?: string;
  'chapter-number'?: string;
  section?: string;
  volume?: string;
  issue?: string;
  page?: string;
  number?: string;
  genre?: string;
  publisher?: string;
  DOI?: string;
  URL?: string;
  note?: string;
}

/** The CSL item type each source kind maps to unless the source names another. */
export const CSL_TYPE_OF_KIND: Record<SourceKind, string> = {
  paper: 'article-journal',
  assessment: 'chapter',
  dataset: 'dataset',
  agency: 'webpage',
};

/** Structured citation fields as written in a pack (CSL names, `doi`/`url` in lower case). */
export interface CitationFields {
  kind: SourceKind;
  type?: string;
  author?: CslName[];
  issued?: number | string;
  title: string;
  'container-title'?: string;
  'container-title-short'?: string;
  'chapter-number'?: string;
  section?: string;
  volume?: string;
  issue?: string;
  page?: string;
  number?: string;
  genre?: string;
  publisher?: string;
  note?: string;
  doi?: string;
  url?: string;
}

/** `2025-03-24` → [[2025, 3, 24]]; `1999` → [[1999]]. */
function dateParts(issued: number | string): [number[]] {
  return [String(issued).split('-').map(Number)];
}

const COPIED = ['title', 'container-title', 'container-title-short', 'chapter-number', 'section', 'volume', 'issue', 'page', 'number', 'genre', 'publisher', 'note'] as const;

/** The CSL-JSON item of a source with structured fields. */
export function cslItemOf(id: string, f: CitationFields): CslItem {
  const item: CslItem = { id, type: f.type ?? CSL_TYPE_OF_KIND[f.kind] };
  if (f.author !== undefined) item.author = f.author.map((n) => ({ ...n }));
  if (f.issued !== undefined) item.issued = { 'date-parts': dateParts(f.issued) };
  for (const key of COPIED) {
    const value = f[key];
    if (value !== undefined) item[key] = value;
  }
  if (f.doi !== undefined) item.DOI = f.doi;
  if (f.url !== undefined) item.URL = f.url;
  return item;
}
