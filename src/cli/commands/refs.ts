import type { Command } from 'commander';
import { Option } from 'commander';
import type { CslItem } from '../../cite/csl-item.js';
import { renderBibtex } from '../../cite/render.js';
import { FirnlineError } from '../../errors.js';
import { fullReference, formatSource } from '../../report/format-source.js';
import { describeRange } from '../../rulepack/describe-range.js';
import type { LoadedPacks, ReferenceValue } from '../../rulepack/types.js';
import type { Source } from '../../types.js';
import type { CliContext } from '../context.js';

export const REFS_FORMATS = ['text', 'json', 'csl-json', 'bibtex'] as const;
type RefsFormat = (typeof REFS_FORMATS)[number];

/** One source in `firnline refs --format json`: its short and full reference and its CSL-JSON item. */
export interface RefSource {
  id: string;
  short: string;
  cite: string;
  kind?: string;
  doi?: string;
  url?: string;
  how: string;
  fromMemory?: string[];
  csl?: CslItem;
}

/** One reference value in `firnline refs --format json`. */
export interface RefEntry {
  id: string;
  ruleId: string;
  measures: string;
  low: number;
  high: number;
  central?: number;
  unit: string;
  /** The range in words, e.g. `790,000–810,000 years`. */
  range: string;
  asOf?: string;
  reviewBy?: string;
  supersededBy?: string;
  correction: string;
  sources: RefSource[];
}

/** Reference values whose id, measures or notes contain every word of `query` (case-insensitive). */
export function matchingReferences(references: ReferenceValue[], query: string | undefined): ReferenceValue[] {
  const words = (query ?? '').toLowerCase().split(/\s+/u).filter((w) => w !== '');
  return references.filter((r) => {
    const haystack = `${r.id} ${r.measures} ${r.notes ?? ''}`.toLowerCase();
    return words.every((w) => haystack.includes(w));
  });
}

/** Values whose review date has passed on `today` (an ISO date): the ones to check again. */
export function dueReferences(references: ReferenceValue[], today: string): ReferenceValue[] {
  return references.filter((r) => r.reviewBy !== undefined && r.reviewBy < today);
}

/** The JSON shape of one reference value. */
export function refEntry(r: ReferenceValue): RefEntry {
  return {
    id: r.id, ruleId: `value.${r.id}`, measures: r.measures, low: r.low, high: r.high,
    ...(r.central === undefined ? {} : { central: r.central }),
    unit: r.unit,
    range: describeRange(r),
    ...(r.asOf === undefined ? {} : { asOf: r.asOf }),
    ...(r.reviewBy === undefined ? {} : { reviewBy: r.reviewBy }),
    ...(r.supersededBy === undefined ? {} : { supersededBy: r.supersededBy }),
    correction: r.wording,
    sources: r.sources.map(sourceEntry),
  };
}

function sourceEntry(s: Source): RefSource {
  return {
    id: s.id, short: formatSource(s), cite: fullReference(s),
    ...(s.kind === undefined ? {} : { kind: s.kind }),
    ...(s.doi === undefined ? {} : { doi: s.doi }),
    ...(s.url === undefined ? {} : { url: s.url }),
    how: s.how,
    ...(s.fromMemory === undefined ? {} : { fromMemory: s.fromMemory }),
    ...(s.csl === undefined ? {} : { csl: s.csl }),
  };
}

/** The distinct sources the values cite, in order of first citation. */
export function citedSources(references: ReferenceValue[]): Source[] {
  const seen = new Map<string, Source>();
  for (const r of references) for (const s of r.sources) if (!seen.has(s.id)) seen.set(s.id, s);
  return [...seen.values()];
}

/**
 * The cited sources as a CSL-JSON array (https://resource.citationstyles.org/schema/latest/input/
 * json/csl-data.json), for reference managers. A source written as plain text becomes a `document`
 * item whose title is that text.
 */
export function cslJsonOf(sources: Source[]): CslItem[] {
  return sources.map((s) => s.csl ?? {
    id: s.id, type: 'document', title: s.cite,
    ...(s.doi === undefined ? {} : { DOI: s.doi }),
    ...(s.url === undefined ? {} : { URL: s.url }),
  });
}

function refText(r: ReferenceValue): string {
  const dated = [r.asOf === undefined ? '' : `as of ${r.asOf}`, r.reviewBy === undefined ? '' : `review by ${r.reviewBy}`].filter((x) => x !== '');
  const when = dated.length === 0 ? '' : ` (${dated.join(', ')})`;
  const cites = r.sources.map((s) => `    ${formatSource(s)}`).join('\n');
  return `value.${r.id}\n  ${r.measures}\n  ${describeRange(r)}${when}\n${cites}\n`;
}

function dueText(due: ReferenceValue[], today: string): string {
  if (due.length === 0) return `No reference value is past its review date (today: ${today}).\n`;
  const lines = due.map((r) => `value.${r.id}: review by ${r.reviewBy ?? ''} (as of ${r.asOf ?? 'undated'}): ${r.measures}`);
  return `${due.length} reference value${due.length === 1 ? ' is' : 's are'} past the review date (today: ${today}); check them against newer sources:\n${lines.join('\n')}\n`;
}

/** One reasoning rule in `firnline refs --reasoning --format json`. */
export interface ReasoningEntry {
  ruleId: string;
  kind: 'reasoning check' | 'direction fact' | 'pattern rule';
  level: string;
  summary: string;
  sources: Source[];
}

/** Every reasoning rule of the packs (reasoning checks, direction facts, pattern rules) whose words hold every query word. */
export function matchingReasoningRules(packs: LoadedPacks, query: string | undefined): ReasoningEntry[] {
  const words = (query ?? '').toLowerCase().split(/\s+/u).filter((w) => w !== '');
  const all: ReasoningEntry[] = [
    ...packs.reasoning.filter((c) => c.enabled).map((c) => ({ ruleId: c.id, kind: 'reasoning check' as const, level: c.level, summary: c.summary, sources: c.sources })),
    ...packs.directions.map((d) => ({ ruleId: `direction.${d.id}`, kind: 'direction fact' as const, level: d.level, summary: d.statement, sources: d.sources })),
    ...packs.patterns.map((p) => ({ ruleId: p.id, kind: 'pattern rule' as const, level: p.level, summary: p.reason, sources: p.sources })),
  ];
  return all.filter((r) => words.every((w) => `${r.ruleId} ${r.summary}`.toLowerCase().includes(w)));
}

function reasoningText(r: ReasoningEntry): string {
  const cites = r.sources.map((s) => `    ${formatSource(s)}`).join('\n');
  return `${r.ruleId} (${r.kind}, ${r.level})\n  ${r.summary}\n${cites}${cites === '' ? '' : '\n'}`;
}

/** Today's date (UTC) from the clock, or the `--today` date a test or an editor gives. */
function todayOf(given: string | undefined): string {
  if (given === undefined) return new Date().toISOString().slice(0, 10);
  const valid = /^\d{4}-\d{2}-\d{2}$/u.test(given) && !Number.isNaN(Date.parse(`${given}T00:00:00Z`));
  if (!valid) throw new FirnlineError('bad-date', `--today takes a date as YYYY-MM-DD, not \`${given}\``);
  return given;
}

interface RefsFlags { format: RefsFormat; config?: string; pack: string[]; due?: boolean; today?: string; reasoning?: boolean }

/** `firnline refs [query...]`: list reference values (or, with --reasoning, reasoning rules) and their sources, or export the sources. */
export function registerRefs(program: Command, ctx: CliContext): void {
  program
    .command('refs')
    .description('list reference values and their sources (all, or those matching the query words); export the cited sources as CSL-JSON or BibTeX')
    .argument('[query...]', 'words to look for in the id or the description (quotes not needed)')
    .addOption(new Option('--format <name>', 'output format: text, json, csl-json or bibtex (the cited sources)').choices([...REFS_FORMATS]).default('text'))
    .option('--reasoning', 'list the reasoning rules (reasoning checks, direction facts, pattern rules) instead of reference values')
    .option('--due', 'list only values past their review date (exit status 1 when there are any)')
    .option('--today <date>', 'the date to compare review dates with (YYYY-MM-DD; default: today, UTC)')
    .option('--config <file>', 'settings file to use instead of the firnline.yaml found by walking up')
    .option('--pack <file>', 'add a rule pack (repeatable)', (v: string, all: string[]) => [...all, v], [] as string[])
    .action(async (words: string[] | undefined, flags: RefsFlags) => {
      const today = todayOf(flags.today);
      const run = await (await import('../run-settings.js')).loadRunSettings(ctx.cwd, flags.config, flags.pack);
      const query = words === undefined || words.length === 0 ? undefined : words.join(' ');
      if (flags.reasoning === true) {
        const rules = matchingReasoningRules(run.packs, query);
        if (flags.format === 'json') ctx.stdout(`${JSON.stringify(rules, null, 2)}\n`);
        else ctx.stdout(rules.length === 0 ? `No reasoning rule matches "${query ?? ''}".\n` : rules.map(reasoningText).join('\n'));
        return;
      }
      const matching = matchingReferences(run.packs.references, query);
      const found = flags.due === true ? dueReferences(matching, today) : matching;
      if (flags.due === true && found.length > 0) ctx.exitCode = 1;
      switch (flags.format) {
        case 'json':
          ctx.stdout(`${JSON.stringify(found.map(refEntry), null, 2)}\n`);
          return;
        case 'csl-json':
          ctx.stdout(`${JSON.stringify(cslJsonOf(citedSources(found)), null, 2)}\n`);
          return;
        case 'bibtex':
          ctx.stdout(renderBibtex(cslJsonOf(citedSources(found))));
          return;
        default:
          if (flags.due === true) ctx.stdout(dueText(found, today));
          else {
            const more = matchingReasoningRules(run.packs, query).length;
            const hint = more > 0 ? `\n${more} reasoning rule${more === 1 ? '' : 's'} ${query === undefined ? 'in the packs' : 'match too'}: firnline refs --reasoning${query === undefined ? '' : ` ${query}`}\n` : '';
            ctx.stdout(found.length === 0 ? `No reference value matches "${query ?? ''}".\n${hint}` : `${found.map(refText).join('\n')}${hint}`);
          }
      }
    });
}
