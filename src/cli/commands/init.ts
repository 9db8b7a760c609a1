import { existsSync } from 'node:fs';
import { join } from 'node:path';
import type { Command } from 'commander';
import { FirnlineError } from '../../errors.js';
import type { CliContext } from '../context.js';
import { writeFileAtomic } from '../../write-file-atomic.js';

/** rulepack/settings.ts SETTINGS_FILE; that module (and its schema) loads when the command runs. */
const SETTINGS_FILE = 'firnline.yaml';

/** `firnline init`: write a commented starter firnline.yaml in the working folder. */
export function registerInit(program: Command, ctx: CliContext): void {
  program
    .command('init')
    .description(`write a commented starter ${SETTINGS_FILE} in the current folder`)
    .option('--force', `replace an existing ${SETTINGS_FILE}`)
    .action(async (flags: { force?: boolean }) => {
      const file = join(ctx.cwd, SETTINGS_FILE);
      if (existsSync(file) && flags.force !== true) {
        throw new FirnlineError('settings-exists', `${SETTINGS_FILE} already exists; edit it, or run \`firnline init --force\` to replace it`, { file });
      }
      const { starterSettings } = await import('../../rulepack/settings.js');
      await writeFileAtomic(file, starterSettings());
      ctx.stdout(`Wrote ${file}. Edit it to choose drafts, packs and levels.\n`);
    });
}
