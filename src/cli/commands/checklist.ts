import { Command, Option } from 'commander';
import { isAbsolute, relative, resolve } from 'node:path';
import { checkPaths } from '../../engine.js';
import { renderChecklistJson } from '../../report/checklist-json.js';
import { renderChecklistMarkdown } from '../../report/checklist-markdown.js';
import { packVersionOf } from '../../review/plan-signoffs.js';
import { readLedger } from '../../review/read-ledger.js';
import { reviewClaims } from '../../review/review-claims.js';
import { ledgerDate } from '../../review/signoff-entry.js';
import { VERSION } from '../../version.js';
import type { CliContext } from '../context.js';
import { loadRunSettings } from '../run-settings.js';
import { writeFileAtomic } from '../write-file-atomic.js';

/** The checklist formats, each a pure renderer of the same input. */
const CHECKLIST_RENDERERS = { markdown: renderChecklistMarkdown, json: renderChecklistJson } as const;
type ChecklistFormat = keyof typeof CHECKLIST_RENDERERS;

interface ChecklistFlags {
  format: ChecklistFormat;
  output?: string;
  config?: string;
  pack: string[];
}

/** `firnline checklist [paths...]`: every claim, flagged or not, as boxes for an expert to tick. */
export function registerChecklist(program: Command, ctx: CliContext): void {
  program
    .command('checklist')
    .description('write the sign-off checklist of every claim in the drafts, flagged or not')
    .argument('[paths...]', 'drafts or folders of drafts (default: the current folder)', [])
    .addOption(new Option('--format <name>', 'checklist format').choices(Object.keys(CHECKLIST_RENDERERS)).default('markdown'))
    .option('-o, --output <file>', 'write the checklist to a file instead of standard output')
    .option('--config <file>', 'settings file to use instead of the firnline.yaml found by walking up')
    .option('--pack <file>', 'add a rule pack (repeatable)', (value: string, previous: string[]) => [...previous, value], [])
    .action(async (paths: string[], flags: ChecklistFlags) => {
      const run = await loadRunSettings(ctx.cwd, flags.config, flags.pack);
      const targets = paths.length > 0 ? paths : ['.'];
      const result = await checkPaths(targets, {
        cwd: ctx.cwd,
        projectRoot: run.projectRoot,
        packs: run.packs,
        include: run.include,
        exclude: run.exclude,
        levels: run.levels,
        readStdin: ctx.readStdin,
      });
      const review = reviewClaims(result.claims, await readLedger(run.ledger, ctx.cwd));
      const text = CHECKLIST_RENDERERS[flags.format]({
        claims: result.claims,
        review,
        reference: (id) => run.packs.reference(id),
        packVersion: packVersionOf(run.packs),
        toolVersion: VERSION,
        generated: ledgerDate(),
      });
      if (flags.output === undefined) {
        ctx.stdout(text);
        return;
      }
      const target = resolve(ctx.cwd, flags.output);
      await writeFileAtomic(target, text);
      const { counts } = review;
      ctx.stderr(`Wrote ${result.claims.length} claims to ${relative(ctx.cwd, target)} (${counts['signed off']} signed off, ${counts.stale} changed since sign-off, ${counts.open} open).\n`);
    });
}

function isInside(file: string, folder: string): boolean {
  const rel = relative(folder, file);
  return rel === '' || (!rel.startsWith('..') && !isAbsolute(rel));
}
