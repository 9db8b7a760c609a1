import type { Command } from 'commander';
import { Option } from 'commander';
import { readFile, realpath, stat } from 'node:fs/promises';
import { resolve } from 'node:path';
import { FirnlineError } from '../../errors.js';
import { WordPackageError } from '../../source/word/word-package-error.js';
import { countOf, summarize } from '../../report/summarize.js';
import { LEVELS, type Level } from '../../types.js';
import { writeFileAtomic } from '../../write-file-atomic.js';
import type { CliContext } from '../context.js';
import { exitCodeFor } from '../exit-code.js';

interface AnnotateFlags {
  output: string;
  failOn?: Level | 'never';
  config?: string;
  pack: string[];
}

/**
 * `firnline annotate <draft.docx> -o <copy.docx>`: checks a Word draft and writes a copy with each
 * flag as a Word comment on the flagged words. The draft itself is never written to.
 */
export function registerAnnotate(program: Command, ctx: CliContext): void {
  program
    .command('annotate')
    .description('write a copy of a Word draft (.docx) with every flag as a comment on the claim')
    .argument('<draft>', 'the Word draft (.docx); it is read, never changed')
    .requiredOption('-o, --output <file>', 'the copy to write (must not be the draft itself)')
    .addOption(new Option('--fail-on <level>', 'lowest level that makes the exit status 1 (default: error)').choices([...LEVELS, 'never']))
    .option('--config <file>', 'settings file to use instead of the firnline.yaml found by walking up')
    .option('--pack <file>', 'add a rule pack (repeatable)', collect, [])
    .action(async (draft: string, flags: AnnotateFlags) => {
      if (!draft.toLowerCase().endsWith('.docx')) {
        throw new FirnlineError('not-word', 'annotate writes comments into Word drafts only; give a .docx file', { file: draft });
      }
      await refuseSameFile(resolve(ctx.cwd, draft), resolve(ctx.cwd, flags.output), flags.output);
      // The engine and the rule-pack loader load here, so that `--version` and `--help` stay light.
      const [{ checkPaths }, { checkOptionsOf, loadRunSettings }] = await Promise.all([import('../../engine.js'), import('../run-settings.js')]);
      const run = await loadRunSettings(ctx.cwd, flags.config, flags.pack);
      const result = await checkPaths([draft], checkOptionsOf(run, ctx));
      const bytes = await readFile(resolve(ctx.cwd, draft));
      // Loaded here, not at start-up: only this command needs the zip and XML libraries.
      const { annotateWord } = await import('../../report/word-comments/annotate-word.js');
      let copy: Uint8Array;
      try {
        copy = annotateWord(bytes, result.flags, { date: new Date().toISOString().replace(/\.\d+Z$/u, 'Z') });
      } catch (error) {
        if (error instanceof WordPackageError) throw new FirnlineError('draft-unreadable', error.message, { file: draft });
        throw error;
      }
      await writeFileAtomic(resolve(ctx.cwd, flags.output), copy, 'the annotated copy');
      const s = summarize(result);
      ctx.stdout(
        `Wrote ${flags.output}: ${countOf(s.flags, 'comment')} (${countOf(s.error, 'error')}, ${countOf(s.warning, 'warning')}, ` +
          `${countOf(s.note, 'note')}) on ${countOf(s.claims, 'claim')} of ${draft}. Comments are suggestions for an editor; the sources are what to read.\n`,
      );
      const failOn = flags.failOn ?? run.failOn;
      ctx.exitCode = exitCodeFor(result.flags, failOn === 'strict' ? 'error' : failOn);
    });
}

/** Exit 2 when the output would be the draft itself (the same path, or a link to the same file). */
async function refuseSameFile(input: string, output: string, shown: string): Promise<void> {
  const same = async () => {
    if (input === output) return true;
    const [a, b] = await Promise.all([stat(input).catch(() => undefined), stat(output).catch(() => undefined)]);
    if (a !== undefined && b !== undefined && a.dev === b.dev && a.ino === b.ino) return true;
    const [ra, rb] = await Promise.all([realpath(input).catch(() => input), realpath(output).catch(() => output)]);
    return ra === rb;
  };
  if (await same()) {
    throw new FirnlineError('output-is-draft', 'the copy would overwrite the draft; name another file with -o', { file: shown });
  }
}

function collect(value: string, previous: string[]): string[] {
  return [...previous, value];
}
