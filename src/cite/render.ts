/**
 * Citations rendered by a maintained CSL processor (citeproc-js, through citation-js) rather than
 * by hand: the short form for text reports and checklists, the full reference for `explain`, JSON
 * and exports, BibTeX for reference managers. The processor is loaded and started on first use
 * (about a tenth of a second), and each rendering is kept, so a run that shows no citation never
 * pays for it.
 */
import { createRequire } from 'node:module';
import type * as CitationJs from '@citation-js/core';
import type { CslItem } from './csl-item.js';
import { FULL_STYLE, SHORT_STYLE } from './styles.js';

const STYLES = { short: ['firnline-short', SHORT_STYLE], full: ['firnline-full', FULL_STYLE] } as const;
let loaded: typeof CitationJs | undefined;

/**
 * citation-js and its CSL and BibTeX plugins (CommonJS packages), loaded on first use: a run that
 * shows no citation (most `check` runs in CI, where nothing is flagged) never reads them.
 */
function citationJs(): typeof CitationJs {
  if (loaded !== undefined) return loaded;
  const require = createRequire(import.meta.url);
  const core = require('@citation-js/core') as typeof CitationJs;
  require('@citation-js/plugin-csl');
  require('@citation-js/plugin-bibtex');
  const csl = core.plugins.config.get('@csl');
  for (const [name, xml] of Object.values(STYLES)) csl.templates.add(name, xml);
  loaded = core;
  return core;
}

const cache = new Map<string, string>();

/** One item in one of Firnline's styles, as plain text on one line. */
export function renderCitation(item: CslItem, form: keyof typeof STYLES): string {
  const key = `${form}\u0000${JSON.stringify(item)}`;
  const hit = cache.get(key);
  if (hit !== undefined) return hit;
  const { Cite } = citationJs();
  const text = new Cite(item).format('bibliography', { format: 'text', template: STYLES[form][0], lang: 'en-US' }).replace(/\s+/gu, ' ').trim();
  cache.set(key, text);
  return text;
}

/** BibTeX entries for the items, in order (citation-js's BibTeX output plugin). */
export function renderBibtex(items: CslItem[]): string {
  if (items.length === 0) return '';
  const { Cite } = citationJs();
  return new Cite(items).format('bibtex', { format: 'text' });
}
