import { Option, type Command } from 'commander';
import { relative } from 'node:path';
import { outputTarget } from '../../guard/output-target.js';
import { reportUnchecked } from '../unchecked.js';
import type { CliContext } from '../context.js';
import type { ChecklistFormat } from '../render-checklist.js';

/** The checklist formats (render-checklist.ts CHECKLIST_RENDERERS); the renderers load when the command runs. */
export const CHECKLIST_FORMATS = ['markdown', 'json'] as const;

interface ChecklistFlags {
  format: ChecklistFormat;
  output?: string;
  config?: string;
  pack: string[];
  force?: boolean;
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
    .option('--config <file>', 'settings file to use instead of the firnline.yaml found by walking up')
    .option('--pack <file>', 'add a rule pack (repeatable)', (value: string, previous: string[]) => [...previous, value], [])
    .action(async (paths: string[] | undefined, flags: ChecklistFlags) => {
      const [{ checkPaths }, { renderChecklistOf }, { guardChecklistOutput }, { checkOptionsOf, loadRunSettings }, { writeFileAtomic }] = await Promise.all([
        import('../../engine.js'), import('../render-checklist.js'), import('../guard-checklist-output.js'), import('../run-settings.js'), import('../../write-file-atomic.js'),
      ]);
      const run = await loadRunSettings(ctx.cwd, flags.config, flags.pack);
      const targets = paths !== undefined && paths.length > 0 ? paths : ['.'];
      const result = await checkPaths(targets, checkOptionsOf(run, ctx));
      const { text, review } = await renderChecklistOf(result, run, flags.format, ctx.cwd);
      const target = flags.output === undefined ? { stdout: true as const } : await outputTarget(flags.output, ctx.cwd, [...result.files, ...result.skipped.map((s) => s.file)]);
      if (target.stdout) {
        ctx.stdout(text);
        if (reportUnchecked(result, ctx) > 0) ctx.exitCode = 2;
        return;
      }
      if (flags.force !== true) await guardChecklistOutput(target.file, run.ledger, ctx.cwd, text);
      await writeFileAtomic(target.file, text);
      if (reportUnchecked(result, ctx) > 0) ctx.exitCode = 2;
      const shownTarget = relative(ctx.cwd, target.file);
      const { counts } = review;
      ctx.stderr(`Wrote ${result.claims.length} claims to ${shownTarget} (${counts['signed off']} signed off, ${counts.stale} changed since sign-off, ${counts.open} open).\n`);
    });
}
