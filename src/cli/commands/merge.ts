import type { Command } from 'commander';
import { readFile } from 'node:fs/promises';
import { resolve } from 'node:path';
import { FirnlineError } from '../../errors.js';
import type { CliContext } from '../context.js';

/** `firnline merge <reports...>`: join the JSON or SARIF reports of `check --shard` runs into one. */
export function registerMerge(program: Command, ctx: CliContext): void {
  program
    .command('merge')
    .description('join the JSON or SARIF reports of `check --shard K/N` runs into the report of the whole run')
    .argument('<reports...>', 'report files, all JSON or all SARIF')
    .option('-o, --output <file>', 'write the merged report to a file instead of standard output')
    .action(async (files: string[], flags: { output?: string }) => {
      const [{ mergeReports }, { writeFileAtomic }] = await Promise.all([import('../../speed/merge-reports.js'), import('../../write-file-atomic.js')]);
      const reports = await Promise.all(
        files.map(async (name) => {
          try {
            return { name, text: await readFile(resolve(ctx.cwd, name), 'utf8') };
          } catch {
            throw new FirnlineError('merge-unreadable', 'cannot read this report; check the path', { file: name });
          }
        }),
      );
      const { text } = mergeReports(reports);
      if (flags.output === undefined) ctx.stdout(text);
      else await writeFileAtomic(resolve(ctx.cwd, flags.output), text);
    });
}
