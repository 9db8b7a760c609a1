import type { Command } from 'commander';
import { resolve } from 'node:path';
import { FirnlineError } from '../../errors.js';
import type { CliContext } from '../context.js';

interface LspFlags {
  stdio?: boolean;
  config?: string;
  pack: string[];
}

/**
 * `firnline lsp --stdio`: the Language Server Protocol server for editors (docs/editors.md). The
 * server and its libraries are loaded only when this command runs, so other commands do not pay
 * for them. Settings are read as `firnline check` reads them, from the workspace root the editor
 * names (else the working folder).
 */
export function registerLsp(program: Command, ctx: CliContext): void {
  program
    .command('lsp')
    .description('run the Language Server Protocol server for editors (flags as diagnostics, fixes, hover citations)')
    .option('--stdio', 'talk to the editor over standard input and output (the only transport)')
    .option('--config <file>', 'settings file to use instead of the firnline.yaml found by walking up from the workspace')
    .option('--pack <file>', 'add a rule pack (repeatable)', (v: string, all: string[]) => [...all, v], [] as string[])
    .action(async (flags: LspFlags) => {
      if (flags.stdio !== true) throw new FirnlineError('lsp-transport', 'the server talks over standard input and output only: run `firnline lsp --stdio`');
      const config = flags.config === undefined ? undefined : resolve(ctx.cwd, flags.config);
      const packs = flags.pack.map((p) => resolve(ctx.cwd, p));
      const [{ startServer }, { createCheckSetup }, { loadRunSettings }, { readLedger }] = await Promise.all([
        import('../../lsp/server.js'), import('../../lsp/check-document.js'), import('../run-settings.js'), import('../../review/read-ledger.js'),
      ]);
      // Anything printed to standard output would break the protocol stream: send stray logs to stderr.
      console.log = (...args: unknown[]) => void process.stderr.write(`${args.map(String).join(' ')}\n`);
      const connection = startServer({
        input: process.stdin,
        output: process.stdout,
        fallbackRoot: ctx.cwd,
        loadWorkspace: async (root) => {
          const run = await loadRunSettings(root, config, packs);
          const ledger = await readLedger(run.ledger, root);
          return {
            setup: createCheckSetup(run.packs, run.levels, ledger),
            projectRoot: run.projectRoot,
            watched: [
              ...(run.settingsFile === undefined ? [] : [run.settingsFile]),
              ...run.packs.packs.map((p) => p.file),
              run.ledger,
            ],
          };
        },
      });
      await new Promise<void>((done) => connection.onExit(() => done()));
    });
}
