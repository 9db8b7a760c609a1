import { Command, CommanderError } from 'commander';
import { FirnlineError, isUserError } from '../errors.js';
import { VERSION } from '../version.js';
import { MAX_INPUT_BYTES } from '../guard/read-regular-file.js';
import { visibleLine } from '../guard/visible-text.js';
import { decodeDraftBytes } from '../source/decode-text.js';
import { CAUTIONS } from './cautions.js';
import { registerAnnotate } from './commands/annotate.js';
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
  for (const register of [registerCheck, registerChecklist, registerSignoff, registerAnnotate, registerRefs, registerExplain, registerInit, registerMerge, registerLsp]) {
    register(program, ctx);
  }
  for (const command of program.commands) command.addHelpText('after', `\n${CAUTIONS}\n`);
  try {
    await program.parseAsync(argv, { from: 'user' });
    return ctx.exitCode;
  } catch (error) {
    if (error instanceof CommanderError) return error.exitCode === 0 ? 0 : 2;
    if (isUserError(error)) {
      // File names and echoed values may hold control characters; they are shown, never sent.
      const lines = error instanceof FirnlineError ? [error.toLine()] : error.errors.map((e) => e.toLine());
      ctx.stderr(`${lines.map(visibleLine).join('\n')}\n`);
      return 2;
    }
    ctx.stderr(`firnline: internal error: ${visibleLine(error instanceof Error ? error.message : String(error))}\n`);
    ctx.stderr('This is a bug in Firnline; please report it with the command you ran.\n');
    return 3;
  }
}

function processContext(): Omit<CliContext, 'exitCode'> {
  return {
    cwd: process.cwd(),
    env: process.env,
    stdout: quietWhenClosed(process.stdout),
    stderr: quietWhenClosed(process.stderr),
    readStdin: readStandardInput,
    isTTY: process.stdout.isTTY === true,
    stderrIsTTY: process.stderr.isTTY === true,
  };
}

/**
 * A writer that stops quietly when the reader goes away (`firnline check | head -1`): a broken pipe
 * is not an error of the run, so it gets no stack trace; the run finishes and sets its exit status.
 */
function quietWhenClosed(stream: NodeJS.WriteStream): (text: string) => void {
  let closed = false;
  stream.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code === 'EPIPE' || error.code === 'ERR_STREAM_DESTROYED') closed = true;
    else throw error;
  });
  return (text) => {
    if (!closed) stream.write(text);
  };
}

/** Standard input as a draft: the same decoding rules as a file (decode-text.ts), at most MAX_INPUT_BYTES. */
async function readStandardInput(): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of process.stdin) {
    chunks.push(chunk as Buffer);
    size += (chunk as Buffer).length;
    if (size > MAX_INPUT_BYTES) throw new FirnlineError('file-too-large', `larger than ${MAX_INPUT_BYTES / 1024 / 1024} MiB, the most Firnline reads from one file; split it`, { file: '-' });
  }
  const decoded = decodeDraftBytes(Buffer.concat(chunks));
  if ('problem' in decoded) {
    const { problem, line, column } = decoded;
    throw new FirnlineError('draft-encoding', problem, line === undefined ? { file: '-' } : { file: '-', line, ...(column === undefined ? {} : { column }) });
  }
  return decoded.text;
}
