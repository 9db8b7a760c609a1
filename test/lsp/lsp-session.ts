// A real editor session with `firnline lsp --stdio`: a child process running the built CLI through
// bin/firnline.js, as an editor starts it (`npm test` builds first), spoken to over its standard
// input and output with vscode-jsonrpc, the JSON-RPC library the LSP's reference client uses.
import { spawn, type ChildProcessWithoutNullStreams } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { createMessageConnection, StreamMessageReader, StreamMessageWriter, type MessageConnection } from 'vscode-jsonrpc/node';
import type { Diagnostic, PublishDiagnosticsParams } from 'vscode-languageserver';

const LAUNCHER = fileURLToPath(new URL('../../bin/firnline.js', import.meta.url));

/** One running server and the client side of its connection. */
export interface LspSession {
  child: ChildProcessWithoutNullStreams;
  connection: MessageConnection;
  /** Every publishDiagnostics notification so far, in order. */
  published: PublishDiagnosticsParams[];
  /** Waits for the next diagnostics of `uri` (after those already seen) that pass `test`. */
  diagnostics(uri: string, test?: (d: Diagnostic[]) => boolean): Promise<Diagnostic[]>;
  /**
   * The server's answer to a request written by hand (outside the connection, which ignores
   * answers it did not ask for), read from the raw output stream.
   */
  rawAnswer(id: string): Promise<unknown>;
  /** Everything the server wrote to standard error. */
  stderr(): string;
  /** Resolves with the exit status once the process has ended. */
  exited: Promise<number | null>;
}

/** Starts `firnline lsp --stdio` in `cwd` (extra arguments after `--stdio`). */
export function startSession(cwd: string, ...extra: string[]): LspSession {
  const child = spawn(process.execPath, [LAUNCHER, 'lsp', '--stdio', ...extra], {
    cwd,
    stdio: 'pipe',
  });
  let err = '';
  let out = '';
  child.stdout.on('data', (chunk: Buffer) => void (out += chunk.toString('utf8')));
  child.stderr.on('data', (chunk: Buffer) => void (err += chunk.toString('utf8')));
  const exited = new Promise<number | null>((done) => child.on('exit', (code) => done(code)));
  const connection = createMessageConnection(new StreamMessageReader(child.stdout), new StreamMessageWriter(child.stdin));
  const published: PublishDiagnosticsParams[] = [];
  const waiting: { uri: string; from: number; test: (d: Diagnostic[]) => boolean; done: (d: Diagnostic[]) => void }[] = [];
  const seen = new Map<string, number>();
  const settle = () => {
    for (const w of [...waiting]) {
      const hit = published.slice(w.from).find((p) => p.uri === w.uri && w.test(p.diagnostics));
      if (hit !== undefined) {
        waiting.splice(waiting.indexOf(w), 1);
        seen.set(w.uri, published.indexOf(hit, w.from) + 1);
        w.done(hit.diagnostics);
      }
    }
  };
  connection.onNotification('textDocument/publishDiagnostics', (params: PublishDiagnosticsParams) => {
    published.push(params);
    settle();
  });
  connection.onNotification('window/logMessage', () => undefined);
  connection.onRequest('window/showMessageRequest', () => null);
  connection.onRequest('client/registerCapability', () => null);
  connection.listen();
  return {
    child,
    connection,
    published,
    diagnostics: (uri, test = () => true) =>
      new Promise((done) => {
        waiting.push({ uri, from: seen.get(uri) ?? 0, test, done });
        settle();
      }),
    rawAnswer: (id) =>
      new Promise((done) => {
        const look = () => {
          const body = out.split(/Content-Length: \d+\r\n\r\n/u).find((b) => b.includes(`"id":${JSON.stringify(id)}`));
          if (body === undefined) setTimeout(look, 20);
          else done(JSON.parse(body));
        };
        look();
      }),
    stderr: () => err,
    exited,
  };
}

/** The initialize request and initialized notification of LSP 3.17, for a workspace at `root`. */
export async function initialize(session: LspSession, rootUri: string, capabilities: object = {}): Promise<{ capabilities: Record<string, unknown> }> {
  const result = await session.connection.sendRequest('initialize', { processId: process.pid, rootUri, capabilities, workspaceFolders: [{ uri: rootUri, name: 'drafts' }] });
  await session.connection.sendNotification('initialized', {});
  return result as { capabilities: Record<string, unknown> };
}

/** shutdown, then exit (LSP 3.17, "Shutdown Request" and "Exit Notification"); the exit status. */
export async function shutdown(session: LspSession): Promise<number | null> {
  await session.connection.sendRequest('shutdown');
  await session.connection.sendNotification('exit');
  const code = await session.exited;
  session.connection.dispose();
  return code;
}
