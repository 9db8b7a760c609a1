import type { Command } from 'commander';
import { Option } from 'commander';
import { describeRange } from '../../rulepack/describe-range.js';
import type { LoadedPacks, ReferenceValue } from '../../rulepack/types.js';
import type { Source } from '../../types.js';
import type { CliContext } from '../context.js';
import { loadRunSettings } from '../run-settings.js';

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

function refText(r: ReferenceValue): string {
  const dated = r.asOf === undefined ? '' : ` (as of ${r.asOf})`;
  const cites = r.sources.map((s) => `    ${shortCite(s)}`).join('\n');
  return `value.${r.id}\n  ${r.measures}\n  ${describeRange(r)}${dated}\n${cites}\n`;
}

/** `Authors (year) doi:...`: the citation cut after its year, with its DOI or URL. */
export function shortCite(s: Source): string {
  const head = /^.*?\(\d{4}[^)]*\)/u.exec(s.cite)?.[0] ?? s.cite;
  const link = s.doi === undefined ? (s.url ?? '') : `https://doi.org/${s.doi}`;
  return link === '' ? head : `${head} ${link}`;
}

/** One reasoning rule in `firnline refs --reasoning --format json`. */
export interface ReasoningEntry {
  ruleId: string;
  kind: 'reasoning check' | 'direction fact' | 'pattern rule';
  level: string;
  summary: string;
  sources: RefEntry['sources'];
}

/** Every reasoning rule of the packs (reasoning checks, direction facts, pattern rules) whose words hold every query word. */
export function matchingReasoningRules(packs: LoadedPacks, query: string | undefined): ReasoningEntry[] {
  const words = (query ?? '').toLowerCase().split(/\s+/u).filter((w) => w !== '');
  const all: ReasoningEntry[] = [
    ...packs.reasoning.filter((c) => c.enabled).map((c) => ({ ruleId: c.id, kind: 'reasoning check' as const, level: c.level, summary: c.summary, sources: c.sources.map(sourceEntry) })),
    ...packs.directions.map((d) => ({ ruleId: `direction.${d.id}`, kind: 'direction fact' as const, level: d.level, summary: d.statement, sources: d.sources.map(sourceEntry) })),
    ...packs.patterns.map((p) => ({ ruleId: p.id, kind: 'pattern rule' as const, level: p.level, summary: p.reason, sources: p.sources.map(sourceEntry) })),
  ];
  return all.filter((r) => words.every((w) => `${r.ruleId} ${r.summary}`.toLowerCase().includes(w)));
}

function reasoningText(r: ReasoningEntry): string {
  const cites = r.sources.map((s) => `    ${shortCite({ id: '', ...s })}`).join('\n');
  return `${r.ruleId} (${r.kind}, ${r.level})\n  ${r.summary}\n${cites}${cites === '' ? '' : '\n'}`;
}

interface RefsFlags {
  format: 'text' | 'json';
  reasoning?: boolean;
  config?: string;
  pack: string[];
}

/** `firnline refs [query...]`: list reference values (or, with --reasoning, reasoning rules) and their sources. */
export function registerRefs(program: Command, ctx: CliContext): void {
  program
    .command('refs')
    .description('list reference values and their sources (all, or those matching the query words); --reasoning lists the reasoning rules')
    .argument('[query...]', 'words to look for in the id or the description (quotes not needed)')
    .addOption(new Option('--format <name>', 'output format').choices(['text', 'json']).default('text'))
    .option('--reasoning', 'list the reasoning rules (reasoning checks, direction facts, pattern rules) instead of reference values')
    .option('--config <file>', 'settings file to use instead of the firnline.yaml found by walking up')
    .option('--pack <file>', 'add a rule pack (repeatable)', (v: string, all: string[]) => [...all, v], [] as string[])
    .action(async (words: string[] | undefined, flags: RefsFlags) => {
      const run = await loadRunSettings(ctx.cwd, flags.config, flags.pack);
      const query = words === undefined || words.length === 0 ? undefined : words.join(' ');
      if (flags.reasoning === true) {
        const rules = matchingReasoningRules(run.packs, query);
        if (flags.format === 'json') ctx.stdout(`${JSON.stringify(rules, null, 2)}\n`);
        else ctx.stdout(rules.length === 0 ? `No reasoning rule matches "${query ?? ''}".\n` : rules.map(reasoningText).join('\n'));
        return;
      }
      const found = matchingReferences(run.packs.references, query);
      if (flags.format === 'json') {
        ctx.stdout(`${JSON.stringify(found.map(refEntry), null, 2)}\n`);
        return;
      }
      const more = matchingReasoningRules(run.packs, query).length;
      const hint = more > 0 ? `\n${more} reasoning rule${more === 1 ? '' : 's'} ${query === undefined ? 'in the packs' : 'match too'}: firnline refs --reasoning${query === undefined ? '' : ` ${query}`}\n` : '';
      ctx.stdout(found.length === 0 ? `No reference value matches "${query ?? ''}".\n${hint}` : `${found.map(refText).join('\n')}${hint}`);
    });
}
