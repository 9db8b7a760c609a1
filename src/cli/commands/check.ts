import type { Command} from 'commander';
import { Option } from 'commander';
import { mkdir } from 'node:fs/promises';
import { dirname } from 'node:path';
import type { ReportFormat } from '../../report/index.js';
import { LEVELS, type Level } from '../../types.js';
import { VERSION } from '../../version.js';
import type { CliContext } from '../context.js';
import { applyStrictPreset } from '../strict-preset.js';
import { describeBreakdown, wantsBreakdown } from '../../report/run-breakdown.js';
import { outputTarget } from '../../guard/output-target.js';
import { visibleData, visibleText } from '../../guard/visible-text.js';
import { reportUnchecked } from '../unchecked.js';
import { boundYoungGeneration, CHECK_FORMATS, parseSpeedFlags, speedOptionsOf, type SpeedFlags } from '../speed-options.js';

// The engine, the packs' schemas, the reporters and the ledger reader load inside the action
// (dynamic import), so `--version` and `--help` start in a few hundredths of a second (bench/).

interface CheckFlags extends SpeedFlags {
  format: string;
  failOn?: Level | 'never';
  config?: string;
  pack: string[];
  output?: string;
  requireSignoff?: boolean;
  changedSince?: string;
  strict?: boolean;
  summary?: boolean;
  absolutePaths?: boolean;
  force?: boolean;
}

/** `firnline check [paths...]`: scan drafts, print flags, set the exit status. */
export function registerCheck(program: Command, ctx: CliContext): void {
  program
    .command('check')
    .description('scan drafts (files, folders, or - for standard input) and report flags')
    .argument('[paths...]', 'drafts or folders of drafts (.md, .markdown, .txt, .html, .htm, .docx; default: the current folder)')
    .addOption(new Option('--format <name>', 'output format (markdown: the sign-off checklist)').choices([...CHECK_FORMATS]).default('text'))
    .addOption(new Option('--fail-on <level>', 'lowest level that makes the exit status 1 (default: error)').choices([...LEVELS, 'never']))
    .option('--config <file>', 'settings file to use instead of the firnline.yaml found by walking up')
    .option('--pack <file>', 'add a rule pack (repeatable)', collect, [])
    .option('-o, --output <file>', 'write the report to a file instead of standard output')
    .option('--require-signoff', 'exit 1 while any claim lacks a current sign-off in the ledger')
    .option('--changed-since <rev>', 'check only claims on lines changed since a git revision')
    .option('--summary', 'text format: print the counts by rule and by file instead of each flag (shown after the flags anyway when 20 or more files have flags)')
    .option('--force', 'with --format markdown -o: replace a checklist even if it holds ticks or comments not yet in the ledger')
    .option('--absolute-paths', 'SARIF: record the working folder as an absolute file URI (off by default, so a shared report does not show the machine\'s folders)')
    .option('--strict', 'the strict preset for publication: every conflicting value and every reasoning error is an error, and errors fail the run')
    .option('--jobs <n>', 'threads that check files in runs over many files, the main one included (default: the number of cores; 1: no workers)')
    .option('--no-cache', 'neither read nor write the result cache (.firnline-cache/ in the project root)')
    .option('--shard <k/n>', 'check only the k-th of n parts of the files (split by path), for CI matrix jobs; join the reports with `firnline merge`')
    .action(async (paths: string[] | undefined, flags: CheckFlags) => {
      parseSpeedFlags(flags);
      boundYoungGeneration();
      const [{ checkPaths }, { jsonReportPieces, renderReport }, { renderChecklistOf }, { applyGate }, { checkOptionsOf, loadRunSettings }, { writeFileAtomic }, { exitCodeFor }, { guardChecklistOutput }] =
        await Promise.all([
          import('../../engine.js'), import('../../report/index.js'), import('../render-checklist.js'), import('../gate.js'),
          import('../run-settings.js'), import('../../write-file-atomic.js'), import('../exit-code.js'), import('../guard-checklist-output.js'),
        ]);
      const run = await loadRunSettings(ctx.cwd, flags.config, flags.pack);
      const strict = flags.strict === true || (flags.failOn === undefined && run.failOn === 'strict');
      const failOn = flags.failOn ?? (run.failOn === 'strict' ? 'error' : run.failOn);
      const targets = paths !== undefined && paths.length > 0 ? paths : ['.'];
      const speed = await speedOptionsOf(flags, run.projectRoot, ctx);
      let checked;
      try {
        checked = await checkPaths(targets, { ...checkOptionsOf(run, ctx), ...speed.options });
      } finally {
        speed.done();
      }
      const result = strict ? applyStrictPreset(checked) : checked;
      const gate = await applyGate(result, {
        requireSignoff: flags.requireSignoff === true,
        ...(flags.changedSince === undefined ? {} : { changedSince: flags.changedSince }),
        ledgerFile: run.ledger,
        cwd: ctx.cwd,
      });
      // Decided before anything is written, so a refused target leaves no half-done run behind.
      const target = flags.output === undefined ? { stdout: true as const } : await outputTarget(flags.output, ctx.cwd, [...result.files, ...result.skipped.map((s) => s.file)]);
      const color = target.stdout && ctx.isTTY && ctx.env.TERM !== 'dumb' && !('NO_COLOR' in ctx.env && ctx.env.NO_COLOR !== '');
      // Text goes to terminals and CI logs: control characters from drafts and file names are shown, never sent.
      const shown = flags.format === 'text' ? visibleData(gate.result) : gate.result;
      const options = { color, toolVersion: VERSION, failOn, ...(flags.absolutePaths === true ? { srcRoot: ctx.cwd } : {}) };
      const onlyCounts = flags.summary === true && flags.format === 'text';
      // A JSON report to a file is written piece by piece (report/render-json.ts): never held whole.
      const pieces = flags.format === 'json' && !target.stdout ? jsonReportPieces(shown, options) : undefined;
      const full = pieces !== undefined ? '' :
        flags.format === 'markdown'
          ? (await renderChecklistOf(gate.result, run, 'markdown', ctx.cwd)).text
          : renderReport(flags.format as ReportFormat, shown, options);
      // --summary keeps the text report's closing block (skipped files and the count line) only.
      const report = onlyCounts ? (full.trimEnd().split('\n\n').pop() ?? '') : full;
      const breakdown = flags.format === 'text' && (onlyCounts || wantsBreakdown(shown)) ? describeBreakdown(shown) : [];
      const lines = [...breakdown, ...gate.summary.map(visibleText)];
      const summary = lines.length > 0 ? `${lines.join('\n')}\n` : '';
      if (target.stdout) {
        ctx.stdout(report.endsWith('\n') ? report : `${report}\n`);
        if (summary !== '') (flags.format === 'text' && flags.output === undefined ? ctx.stdout : ctx.stderr)(summary);
      } else {
        // A checklist written by `check --format markdown` is guarded as `checklist -o` guards it.
        if (flags.format === 'markdown' && flags.force !== true) await guardChecklistOutput(target.file, run.ledger, ctx.cwd, full, { onlyChecklists: true });
        await mkdir(dirname(target.file), { recursive: true });
        await writeFileAtomic(target.file, pieces ?? (report.endsWith('\n') ? report : `${report}\n`));
        ctx.stderr(summary);
      }
      ctx.exitCode = Math.max(exitCodeFor(gate.failingFlags, failOn), gate.failed ? 1 : 0);
      if (reportUnchecked(result, ctx) > 0) ctx.exitCode = 2;
    });
}

function collect(value: string, previous: string[]): string[] {
  return [...previous, value];
}
