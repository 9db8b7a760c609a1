import { Option, type Command } from 'commander';
import { mkdir } from 'node:fs/promises';
import { dirname, join, relative, resolve } from 'node:path';
import { FirnlineError } from '../../errors.js';
import { outputTarget } from '../../guard/output-target.js';
import type { ReviewSummary } from '../../review/review-claims.js';
import type { CheckResult } from '../../types.js';
import { reportUnchecked } from '../unchecked.js';
import type { CliContext } from '../context.js';
import type { ChecklistFormat } from '../render-checklist.js';
import type { RunSettings } from '../run-settings.js';
import { visibleLine } from '../../guard/visible-text.js';

/** The checklist formats (render-checklist.ts CHECKLIST_RENDERERS, kept equal by a test); the renderers load when the command runs. */
export const CHECKLIST_FORMATS = ['markdown', 'json'] as const;

interface ChecklistFlags {
  format: ChecklistFormat;
  output?: string;
  config?: string;
  pack: string[];
  force?: boolean;
  open?: boolean;
  changedSince?: string;
  perFile?: boolean;
}

/** `firnline checklist [paths...]`: every claim, flagged or not, as boxes for an expert to tick. */
export function registerChecklist(program: Command, ctx: CliContext): void {
  program
    .command('checklist')
    .description('write the sign-off checklist of every claim in the drafts, flagged or not')
    .argument('[paths...]', 'drafts or folders of drafts (default: the current folder)')
    .addOption(new Option('--format <name>', 'checklist format').choices([...CHECKLIST_FORMATS]).default('markdown'))
    .option('-o, --output <file>', 'write the checklist to a file instead of standard output')
    .option('--force', 'replace the output file even if it holds ticks not yet in the ledger')
    .option('--open', 'only claims that still need the expert: open, changed since sign-off, or marked needs change')
    .option('--changed-since <rev>', 'only claims on lines changed since a git revision (a pull request\'s base)')
    .option('--per-file', 'with -o FOLDER: one checklist per draft, at FOLDER/<draft path>.checklist.md')
    .option('--config <file>', 'settings file to use instead of the firnline.yaml found by walking up')
    .option('--pack <file>', 'add a rule pack (repeatable)', (value: string, previous: string[]) => [...previous, value], [])
    .action(async (paths: string[] | undefined, flags: ChecklistFlags) => {
      // The engine, the rule-pack loader, the renderers and the ledger load here, so that `--version` and `--help` stay light.
      const [{ checkPaths }, { checkOptionsOf, loadRunSettings }, { changedLines }, { onChangedLines }, { renderChecklistOf }, { guardChecklistOutput }, { writeFileAtomic }] = await Promise.all([
        import('../../engine.js'), import('../run-settings.js'), import('../../review/changed-lines.js'), import('../gate.js'),
        import('../render-checklist.js'), import('../guard-checklist-output.js'), import('../../write-file-atomic.js'),
      ]);
      const run = await loadRunSettings(ctx.cwd, flags.config, flags.pack);
      const targets = paths !== undefined && paths.length > 0 ? paths : ['.'];
      const found = await checkPaths(targets, checkOptionsOf(run, ctx));
      const result = flags.changedSince === undefined ? found : onChangedLines(found, await changedLines(flags.changedSince, ctx.cwd));
      const options = { openOnly: flags.open === true };
      if (flags.perFile === true) {
        if (flags.output === undefined) throw new FirnlineError('checklist-per-file-output', '--per-file writes one checklist per draft: give the folder with -o FOLDER');
        await writePerFile(result, run, flags, ctx, options);
        if (reportUnchecked(result, ctx) > 0) ctx.exitCode = 2;
        return;
      }
      const { text, review } = await renderChecklistOf(result, run, flags.format, ctx.cwd, options);
      const target = flags.output === undefined ? { stdout: true as const } : await outputTarget(flags.output, ctx.cwd, draftsRead(result));
      if (target.stdout) {
        ctx.stdout(text);
        if (reportUnchecked(result, ctx) > 0) ctx.exitCode = 2;
        return;
      }
      if (flags.force !== true) await guardChecklistOutput(target.file, run.ledger, ctx.cwd, text);
      await mkdir(dirname(target.file), { recursive: true });
      await writeFileAtomic(target.file, text);
      if (reportUnchecked(result, ctx) > 0) ctx.exitCode = 2;
      ctx.stderr(`Wrote ${review.claims.length} claims to ${visibleLine(relative(ctx.cwd, target.file))} (${countWords(review)}).\n`);
    });
}

/** Every draft the run read or was asked to read: a checklist must never be written over one of them. */
function draftsRead(result: CheckResult): string[] {
  return [...result.files, ...result.skipped.map((s) => s.file)];
}

function countWords(review: ReviewSummary): string {
  const { counts } = review;
  return `${counts['signed off']} signed off, ${counts['needs change']} needs change, ${counts.stale} changed since sign-off, ${counts.open} open`;
}

/** `--per-file -o FOLDER`: one checklist per draft that has claims, named after the draft. */
async function writePerFile(result: CheckResult, run: RunSettings, flags: ChecklistFlags, ctx: CliContext, options: { openOnly: boolean }): Promise<void> {
  const [{ renderChecklistOf }, { guardChecklistOutput }, { writeFileAtomic }] = await Promise.all([
    import('../render-checklist.js'), import('../guard-checklist-output.js'), import('../../write-file-atomic.js'),
  ]);
  const folder = resolve(ctx.cwd, flags.output ?? '.');
  const ending = flags.format === 'json' ? '.checklist.json' : '.checklist.md';
  const files = [...new Set(result.claims.map((c) => c.file))].sort();
  let written = 0;
  for (const file of files) {
    const claims = result.claims.filter((c) => c.file === file);
    const { text, review } = await renderChecklistOf({ ...result, claims, flags: claims.flatMap((c) => c.flags) }, run, flags.format, ctx.cwd, options);
    if (review.claims.length === 0) continue;
    const checked = await outputTarget(join(folder, `${file.replace(/^(\.\.\/)+/u, '')}${ending}`), ctx.cwd, draftsRead(result));
    if (checked.stdout) continue;
    const target = checked.file;
    if (flags.force !== true) await guardChecklistOutput(target, run.ledger, ctx.cwd, text);
    await mkdir(dirname(target), { recursive: true });
    await writeFileAtomic(target, text);
    ctx.stderr(`Wrote ${review.claims.length} claims to ${visibleLine(relative(ctx.cwd, target))} (${countWords(review)}).\n`);
    written += 1;
  }
  if (written === 0) ctx.stderr('No claims to put on a checklist; nothing written.\n');
}
