import type { Command } from 'commander';
import { Option } from 'commander';
import type { ReferenceValue } from '../../rulepack/types.js';
import type { Source } from '../../types.js';
import type { CliContext } from '../context.js';

/** One reference value in `firnline refs --format json`. */
export interface RefEntry {
  id: string;
  ruleId: string;
  measures: string;
  low: number;
  high: number;
  central?: number;
  unit: string;
  asOf?: string;
  correction: string;
  sources: { cite: string; doi?: string; url?: string; how: string }[];
}

/** Reference values whose id, measures or notes contain every word of `query` (case-insensitive). */
export function matchingReferences(references: ReferenceValue[], query: string | undefined): ReferenceValue[] {
  const words = (query ?? '').toLowerCase().split(/\s+/u).filter((w) => w !== '');
  return references.filter((r) => {
    const haystack = `${r.id} ${r.measures} ${r.notes ?? ''}`.toLowerCase();
    return words.every((w) => haystack.includes(w));
  });
}

/** The JSON shape of one reference value. */
export function refEntry(r: ReferenceValue): RefEntry {
  return {
    id: r.id, ruleId: `value.${r.id}`, measures: r.measures, low: r.low, high: r.high,
    ...(r.central === undefined ? {} : { central: r.central }),
    unit: r.unit,
    ...(r.asOf === undefined ? {} : { asOf: r.asOf }),
    correction: r.wording,
    sources: r.sources.map(sourceEntry),
  };
}

function sourceEntry(s: Source): RefEntry['sources'][number] {
  return { cite: s.cite, ...(s.doi === undefined ? {} : { doi: s.doi }), ...(s.url === undefined ? {} : { url: s.url }), how: s.how };
}

/** `Authors (year) doi:...`: the citation cut after its year, with its DOI or URL. */
export function shortCite(s: Source): string {
  const head = /^.*?\(\d{4}[^)]*\)/u.exec(s.cite)?.[0] ?? s.cite;
  const link = s.doi === undefined ? (s.url ?? '') : `https://doi.org/${s.doi}`;
  return link === '' ? head : `${head} ${link}`;
}

/** `firnline refs [query]`: list reference values and their sources. */
export function registerRefs(program: Command, ctx: CliContext): void {
  program
    .command('refs')
    .description('list reference values and their sources (all, or those matching the query words)')
    .argument('[query]', 'words to look for in the id or the description')
    .addOption(new Option('--format <name>', 'output format').choices(['text', 'json']).default('text'))
    .option('--config <file>', 'settings file to use instead of the firnline.yaml found by walking up')
    .option('--pack <file>', 'add a rule pack (repeatable)', (v: string, all: string[]) => [...all, v], [] as string[])
    .action(async (query: string | undefined, flags: { format: 'text' | 'json'; config?: string; pack: string[] }) => {
      const [{ loadRunSettings }, { describeRange }] = await Promise.all([import('../run-settings.js'), import('../../rulepack/describe-range.js')]);
      const run = await loadRunSettings(ctx.cwd, flags.config, flags.pack);
      const refText = (r: ReferenceValue): string => {
        const dated = r.asOf === undefined ? '' : ` (as of ${r.asOf})`;
        const cites = r.sources.map((s) => `    ${shortCite(s)}`).join('\n');
        return `value.${r.id}\n  ${r.measures}\n  ${describeRange(r)}${dated}\n${cites}\n`;
      };
      const found = matchingReferences(run.packs.references, query);
      if (flags.format === 'json') ctx.stdout(`${JSON.stringify(found.map(refEntry), null, 2)}\n`);
      else ctx.stdout(found.length === 0 ? `No reference value matches "${query ?? ''}".\n` : found.map(refText).join('\n'));
    });
}
