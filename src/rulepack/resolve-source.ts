/**
 * One pack source from its written form to its loaded form. A source with structured fields gets
 * its CSL-JSON item; its full and short references are rendered by the CSL processor the first
 * time something reads them (most runs show a handful of the pack's sources, or none).
 */
import { cslItemOf } from '../cite/csl-item.js';
import type { CitationFields } from '../cite/csl-item.js';
import { renderCitation } from '../cite/render.js';
import type { Source } from '../types.js';
import type { RawSource } from './raw-pack.js';

/** The loaded source. */
export function resolveSource(raw: RawSource): Source {
  const { id, how, doi, url } = raw;
  const base = {
    id, how,
    ...(doi === undefined ? {} : { doi }),
    ...(url === undefined ? {} : { url }),
    ...(raw.from_memory === undefined ? {} : { fromMemory: raw.from_memory }),
  };
  if (raw.kind === undefined || raw.title === undefined) {
    return { ...base, cite: raw.cite ?? id };
  }
  const fields = { ...raw, kind: raw.kind, title: raw.title } as CitationFields;
  const csl = cslItemOf(id, fields);
  const source = { ...base, kind: raw.kind, csl } as Source;
  // Rendered on first read and then kept as plain data (enumerable, so JSON and copies carry them).
  for (const [key, form] of [['cite', 'full'], ['short', 'short']] as const) {
    Object.defineProperty(source, key, {
      enumerable: true,
      configurable: true,
      get() {
        const text = raw.cite !== undefined && key === 'cite' ? raw.cite : renderCitation(csl, form);
        Object.defineProperty(source, key, { value: text, enumerable: true, writable: true, configurable: true });
        return text;
      },
    });
  }
  return source;
}
