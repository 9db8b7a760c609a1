import { Command, CommanderError } from 'commander';
import { FirnlineError, isUserError } from '../errors.js';
import { VERSION } from '../version.js';
import { CAUTIONS } from './cautions.js';
import { registerCheck } from './commands/check.js';
import { registerChecklist } from './commands/checklist.js';
import { registerExplain } from './commands/explain.js';
import { registerInit } from './commands/init.js';
import { registerMerge } from './commands/merge.js';
import { registerLsp } from './commands/lsp.js';
import { registerRefs } from './commands/refs.js';
import { registerSignoff } from './commands/signoff.js';
import type { CliContext } from './context.js';

/**
 * Runs the command line and returns the exit status: 0 nothing at or above the fail level,
 * 1 flags at or above it, 2 a usage, settings or rule-pack error (one line each, no stack trace).
 */
export async function main(argv: string[], context: Partial<CliContext> = {}): Promise<number> {
  const ctx: CliContext = { ...processContext(), ...context, exitCode: 0 };
  const program = new Command('firnline')
    .description('Check ice-age CO2 and temperature claims in drafts against sourced reference values.')
    .version(VERSION, '-V, --version')
    .showHelpAfterError('(run firnline --help for usage)')
    .addHelpText('after', `\n${CAUTIONS}\n`)
    .exitOverride()
    .configureOutput({ writeOut: ctx.stdout, writeErr: ctx.stderr });
  for (const register of [registerCheck, registerChecklist, registerSignoff, registerRefs, registerExplain, registerInit, registerMerge, registerLsp]) {
    register(program, ctx);
  }
  for (const command of program.commands) command.addHelpText('after', `\n${CAUTIONS}\n`);
  try {
    await program.parseAsync(argv, { from: 'user' });
    return ctx.exitCode;
  } catch (error) {
    if (error instanceof CommanderError) return error.exitCode === 0 ? 0 : 2;
    if (isUserError(error)) {
      ctx.stderr(`${error instanceof FirnlineError ? error.toLine() : error.message}\n`);
      return 2;
    }
    ctx.stderr(`firnline: internal error: ${error instanceof Error ? error.message : String(error)}\n`);
    ctx.stderr('This is a bug in Firnline; please report it with the command you ran.\n');
    return 3;
  }
}

function processContext(): Omit<CliContext, 'exitCode'> {
  return {
    cwd: process.cwd(),
    env: process.env,
    stdout: (text) => void process.stdout.write(text),
    stderr: (text) => void process.stderr.write(text),
    readStdin: async () => {
      const chunks: Buffer[] = [];
      for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
      return Buffer.concat(chunks).toString('utf8');
    },
    isTTY: process.stdout.isTTY === true,
    stderrIsTTY: process.stderr.isTTY === true,
  };
}
