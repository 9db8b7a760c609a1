import { Chalk } from 'chalk';
import type { ChalkInstance } from 'chalk';
import type { CheckResult, Flag, Level } from '../types.js';
import { formatReference } from './describe-flag.js';
import { formatSource } from './format-source.js';
import { asSentence, formatClaimed } from './format-value.js';
import type { ReportOptions } from './report-options.js';
import { sortByPlace } from './sort.js';
import { countOf, summarize } from './summarize.js';

/** The colour of each level's name; everything else is plain, bold or dim. */
const LEVEL_COLOUR: Record<Level, (chalk: ChalkInstance) => ChalkInstance> = {
  error: (chalk) => chalk.red.bold,
  warning: (chalk) => chalk.yellow.bold,
  note: (chalk) => chalk.cyan,
};

// Labels are padded to one width so the values line up in a column an editor can scan.
const LABEL_WIDTH = 12;
const ROW_INDENT = '    ';

function rows(chalk: ChalkInstance, label: string, values: string[]): string[] {
  const blank = ' '.repeat(LABEL_WIDTH);
  return values.map(
    (value, i) => `${ROW_INDENT}${i === 0 ? chalk.dim(label.padEnd(LABEL_WIDTH)) : blank}${value}`,
  );
}

/** One flag as a block: place, level and rule; the reason; then labelled rows of the evidence. */
function flagBlock(chalk: ChalkInstance, flag: Flag): string {
  const { line, column } = flag.span.start;
  const head = [
    chalk.bold(`${flag.file}:${line}:${column}`),
    LEVEL_COLOUR[flag.level](chalk)(flag.level),
    flag.ruleId,
  ].join(chalk.dim(' · '));
  const said = flag.claimed === undefined ? `"${flag.excerpt.replace(/\s+/gu, ' ')}"` : formatClaimed(flag.claimed);
  const lines = [head, `  ${asSentence(flag.reason)}`, ...rows(chalk, 'draft says', [said])];
  if (flag.reference !== undefined) lines.push(...rows(chalk, 'reference', [formatReference(flag.reference)]));
  if (flag.correction !== undefined) {
    lines.push(...rows(chalk, 'correction', [chalk.green(`"${flag.correction}"`)]));
  } else if (flag.suggestion !== undefined) {
    lines.push(...rows(chalk, 'suggestion', [asSentence(flag.suggestion)]));
  }
  if (flag.sources.length > 0) lines.push(...rows(chalk, 'sources', flag.sources.map(formatSource)));
  if (flag.signoff !== undefined) {
    const { reviewer, date, decision } = flag.signoff;
    lines.push(...rows(chalk, 'signed off', [`by ${reviewer} on ${date} (${decision}); this flag does not fail the run`]));
  }
  return lines.join('\n');
}

/** The closing line: files checked, claims found, flags by level, files skipped. */
function summaryLine(result: CheckResult): string {
  const s = summarize(result);
  const byLevel = [countOf(s.error, 'error'), countOf(s.warning, 'warning'), countOf(s.note, 'note')];
  return (
    `Checked ${countOf(result.files.length, 'file')}: ${countOf(s.claims, 'claim')} found, ` +
    `${countOf(s.flags, 'flag')} (${byLevel.join(', ')}), ${countOf(s.skipped, 'file')} skipped` +
    (s.marked > 0 ? `, ${countOf(s.marked, 'claim')} marked as reported.` : '.')
  );
}

/**
 * The packs checked against and their as-of dates, and the standing caution: reference values
 * carry uncertainty and dates, and the flags are for an expert to judge.
 */
export function packsLine(result: CheckResult): string[] {
  if (result.packs === undefined || result.packs.length === 0) return [];
  const packs = result.packs.map((p) => `${p.id} ${p.version} (values as of ${p.asOf})`).join(', ');
  return [`Reference packs: ${packs}. Values carry uncertainty and dates; an expert reviews every flag.`];
}

/**
 * The default report, for a person reading a terminal: one block per flag in place order, the
 * files passed over with their reasons, and a summary line. Colour only when `options.color`.
 */
export function renderText(result: CheckResult, options: ReportOptions): string {
  // A private chalk instance: the colour decision is this call's alone and never leaks elsewhere.
  const chalk = new Chalk({ level: options.color ? 1 : 0 });
  const blocks = sortByPlace(result.flags).map((flag) => flagBlock(chalk, flag));
  const skipped = result.skipped.map(({ file, reason }) => chalk.dim(`Skipped ${file}: ${asSentence(reason)}`));
  const closing = [...skipped, chalk.bold(summaryLine(result)), ...packsLine(result).map((line) => chalk.dim(line))];
  if (blocks.length === 0) closing.unshift('No flags.');
  return [...blocks, closing.join('\n')].join('\n\n') + '\n';
}
