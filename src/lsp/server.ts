/**
 * `firnline lsp --stdio`: the Language Server Protocol server (LSP 3.17) for editors. It checks
 * every open Markdown and plain-text document on open and, debounced, on change; publishes the
 * flags as diagnostics; offers the correction, the deliberate-quotation marker and the citation as
 * code actions; shows the reference range, the draft's interval and the sources on hover; and
 * reloads `firnline.yaml`, the packs and the ledger when they change. A document the engine cannot
 * check gets one diagnostic saying why; it never takes the server down.
 */
import { watch, type FSWatcher } from 'node:fs';
import { basename, dirname, relative, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  CodeActionKind,
  createConnection,
  DiagnosticSeverity,
  DidChangeWatchedFilesNotification,
  TextDocuments,
  TextDocumentSyncKind,
  type CodeAction,
  type Connection,
  type Diagnostic,
  type InitializeParams,
  type InitializeResult,
} from 'vscode-languageserver/node';
import { TextDocument } from 'vscode-languageserver-textdocument';
import { isUserError, FirnlineError } from '../errors.js';
import { SETTINGS_FILE } from '../rulepack/settings.js';
import type { Draft } from '../types.js';
import { VERSION } from '../version.js';
import type { DocumentCheck } from './check-document.js';
import { codeActionsOf, COPY_CITATION_COMMAND } from './code-actions.js';
import { createKeyedDebounce } from './debounce.js';
import { diagnosticOf, DIAGNOSTIC_SOURCE } from './diagnostics.js';
import { createFrameGuard } from './frame-guard.js';
import { hoverMarkdown } from './hover.js';
import { createDocumentChecker, type DocumentChecker } from './incremental-check.js';
import { createPositionMap, type PositionMap } from './positions.js';
import type { Workspace, WorkspaceLoader } from './workspace.js';

/** How the server is set up by the `lsp` command. */
export interface ServerOptions {
  input: NodeJS.ReadableStream;
  output: NodeJS.WritableStream;
  loadWorkspace: WorkspaceLoader;
  /** The root folder when the client names none (the working folder). */
  fallbackRoot: string;
  /** Quiet time after the last change before a document is checked again, in milliseconds. */
  debounceMs?: number;
}

/** How long typing must pause before a re-check: short enough to feel live (common practice). */
export const DEFAULT_DEBOUNCE_MS = 250;

/** LSP language ids (LSP 3.17, "TextDocumentItem") and the draft format each is read as. */
const FORMAT_OF_LANGUAGE: Record<string, Draft['format']> = { markdown: 'markdown', plaintext: 'text', text: 'text' };
/** File endings read as drafts when the client sends a language id we do not know. */
const FORMAT_OF_ENDING: [RegExp, Draft['format']][] = [[/\.(?:md|markdown)$/iu, 'markdown'], [/\.txt$/iu, 'text']];

/** The last check of one document, at one version. */
interface Checked {
  version: number;
  check: DocumentCheck;
  positions: PositionMap;
}

/** Starts the server on the given streams; it runs until the client sends `exit`. */
export function startServer(options: ServerOptions): Connection {
  const guard = createFrameGuard((why) => process.stderr.write(`firnline lsp: dropped a malformed message: ${why}\n`));
  const connection = createConnection(options.input.pipe(guard), options.output);
  const documents = new TextDocuments(TextDocument);
  const checked = new Map<string, Checked>();
  // One checker per open document: it keeps the claims of unchanged blocks between checks.
  const checkers = new Map<string, DocumentChecker>();
  const debounce = createKeyedDebounce(options.debounceMs ?? DEFAULT_DEBOUNCE_MS);
  const reloads = createKeyedDebounce(100);
  let root = options.fallbackRoot;
  let workspace: Workspace | undefined;
  let loadProblem: string | undefined;
  let watchers: FSWatcher[] = [];
  let clientWatchesFiles = false;

  const log = (text: string) => connection.console.log(text);

  const publish = (uri: string, diagnostics: Diagnostic[], version?: number) => {
    void connection.sendDiagnostics({ uri, diagnostics, ...(version === undefined ? {} : { version }) });
  };

  const problemDiagnostic = (message: string): Diagnostic => ({
    range: { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } },
    severity: DiagnosticSeverity.Warning,
    source: DIAGNOSTIC_SOURCE,
    message: `Firnline could not check this draft: ${message}`,
  });

  const checkNow = (document: TextDocument) => {
    const { uri } = document;
    debounce.cancel(uri);
    const format = formatOf(document);
    if (format === undefined) {
      checked.delete(uri);
      publish(uri, [], document.version);
      return;
    }
    if (workspace === undefined) {
      checked.delete(uri);
      publish(uri, [problemDiagnostic(loadProblem ?? 'the settings are not loaded yet')], document.version);
      return;
    }
    try {
      const text = document.getText();
      const file = filePathOf(uri);
      const shown = file === undefined ? uri : toPosix(relative(root, file)) || basename(file);
      const projectPath = file === undefined ? uri : toPosix(relative(workspace.projectRoot, file));
      let checker = checkers.get(uri);
      if (checker === undefined) {
        checker = createDocumentChecker(workspace.setup);
        checkers.set(uri, checker);
      }
      const check = checker.check(text, format, shown, projectPath);
      const positions = createPositionMap(text);
      checked.set(uri, { version: document.version, check, positions });
      publish(uri, check.flags.map((flag) => diagnosticOf(flag, positions)), document.version);
    } catch (error) {
      checked.delete(uri);
      checkers.delete(uri);
      const message = describeError(error);
      connection.console.error(`firnline: could not check ${uri}: ${message}`);
      publish(uri, [problemDiagnostic(message)], document.version);
    }
  };

  /** The current check of a document, made now if a change is still waiting for its debounce. */
  const currentCheck = (uri: string): Checked | undefined => {
    const document = documents.get(uri);
    if (document === undefined) return undefined;
    if (checked.get(uri)?.version !== document.version) checkNow(document);
    const found = checked.get(uri);
    return found?.version === document.version ? found : undefined;
  };

  const reload = async () => {
    try {
      const next = await options.loadWorkspace(root);
      workspace = next;
      loadProblem = undefined;
      checkers.clear();
      watchFiles(next.watched);
      log(`firnline: settings loaded (${next.setup.packs.packs.map((p) => `${p.id} ${p.version}`).join(', ')})`);
    } catch (error) {
      const message = describeError(error);
      loadProblem = message;
      connection.console.error(`firnline: ${message}`);
      void connection.window.showErrorMessage(`Firnline: ${message}`);
      // Keep watching what was watched, plus the settings file, so that a fix is picked up.
      if (workspace === undefined) watchFiles([resolve(root, SETTINGS_FILE)]);
    }
    for (const document of documents.all()) checkNow(document);
  };
  const scheduleReload = () => reloads.schedule('workspace', () => void reload());

  /** Watches the folders of `files` (a file replaced by rename keeps being watched that way). */
  const watchFiles = (files: string[]) => {
    for (const watcher of watchers) watcher.close();
    watchers = [];
    const wanted = new Set([...files, resolve(root, SETTINGS_FILE)].map((f) => resolve(f)));
    const folders = new Set([...wanted].map((f) => dirname(f)));
    for (const folder of folders) {
      try {
        const watcher = watch(folder, { persistent: false }, (_event, name) => {
          if (name === null || wanted.has(resolve(folder, name.toString()))) scheduleReload();
        });
        watcher.on('error', () => undefined);
        watchers.push(watcher);
      } catch {
        // A folder that does not exist (yet) cannot be watched; the client's file events still reload.
      }
    }
  };

  connection.onInitialize(async (params: InitializeParams): Promise<InitializeResult> => {
    root = rootOf(params) ?? options.fallbackRoot;
    clientWatchesFiles = params.capabilities.workspace?.didChangeWatchedFiles?.dynamicRegistration === true;
    // Load before answering, so the first opened document is checked with the project's settings.
    await reload();
    return {
      capabilities: {
        positionEncoding: 'utf-16',
        textDocumentSync: { openClose: true, change: TextDocumentSyncKind.Incremental },
        hoverProvider: true,
        codeActionProvider: { codeActionKinds: [CodeActionKind.QuickFix, CodeActionKind.Empty] },
        executeCommandProvider: { commands: [COPY_CITATION_COMMAND] },
      },
      serverInfo: { name: 'firnline', version: VERSION },
    };
  });

  connection.onInitialized(() => {
    if (clientWatchesFiles) {
      void connection.client.register(DidChangeWatchedFilesNotification.type, {
        watchers: [{ globPattern: '**/*.{yaml,yml}' }],
      });
    }
  });

  connection.onDidChangeWatchedFiles((params) => {
    const watched = new Set((workspace?.watched ?? []).map((f) => resolve(f)));
    const touches = params.changes.some((change) => {
      const file = filePathOf(change.uri);
      return file !== undefined && (watched.has(resolve(file)) || basename(file) === SETTINGS_FILE);
    });
    if (touches) scheduleReload();
  });

  documents.onDidOpen(({ document }) => checkNow(document));
  documents.onDidChangeContent(({ document }) => {
    if (checked.get(document.uri)?.version === document.version) return; // the open event just checked it
    debounce.schedule(document.uri, () => {
      const latest = documents.get(document.uri);
      if (latest !== undefined && checked.get(latest.uri)?.version !== latest.version) checkNow(latest);
    });
  });
  documents.onDidClose(({ document }) => {
    debounce.cancel(document.uri);
    checked.delete(document.uri);
    checkers.delete(document.uri);
    publish(document.uri, []);
  });

  connection.onCodeAction((params): CodeAction[] => {
    const found = currentCheck(params.textDocument.uri);
    if (found === undefined) return [];
    const from = found.positions.indexAt(params.range.start);
    const to = found.positions.indexAt(params.range.end);
    const actions: CodeAction[] = [];
    for (const flag of found.check.flags) {
      const start = found.positions.indexOf(flag.span.start.offset);
      const end = found.positions.indexOf(flag.span.end.offset);
      if (start > to || end < from) continue;
      const range = found.positions.rangeOf(flag.span);
      const diagnostic = params.context.diagnostics.find(
        (d) => d.code === flag.ruleId && d.range.start.line === range.start.line && d.range.start.character === range.start.character,
      );
      actions.push(...codeActionsOf(flag, { uri: params.textDocument.uri, draft: found.check.draft, positions: found.positions, ...(diagnostic === undefined ? {} : { diagnostic }) }));
    }
    return actions;
  });

  connection.onHover((params) => {
    const found = currentCheck(params.textDocument.uri);
    if (found === undefined) return null;
    const at = found.positions.indexAt(params.position);
    const flags = found.check.flags.filter(
      (f) => found.positions.indexOf(f.span.start.offset) <= at && at <= found.positions.indexOf(f.span.end.offset),
    );
    const first = flags[0];
    if (first === undefined) return null;
    return { contents: { kind: 'markdown', value: hoverMarkdown(flags) }, range: found.positions.rangeOf(first.span) };
  });

  connection.onExecuteCommand((params) => {
    if (params.command !== COPY_CITATION_COMMAND) return null;
    const text = params.arguments?.[0];
    return typeof text === 'string' ? text : null;
  });

  documents.listen(connection);
  connection.listen();
  return connection;
}

/** The draft format of a document, or undefined for a language Firnline does not read. */
function formatOf(document: TextDocument): Draft['format'] | undefined {
  const byLanguage = FORMAT_OF_LANGUAGE[document.languageId];
  if (byLanguage !== undefined) return byLanguage;
  return FORMAT_OF_ENDING.find(([ending]) => ending.test(document.uri))?.[1];
}

/** The first workspace folder, else the root URI, as a file path. */
function rootOf(params: InitializeParams): string | undefined {
  const uri = params.workspaceFolders?.[0]?.uri ?? params.rootUri ?? undefined;
  if (uri !== undefined && uri !== null) return filePathOf(uri);
  return params.rootPath ?? undefined;
}

function filePathOf(uri: string): string | undefined {
  if (!uri.startsWith('file:')) return undefined;
  try {
    return fileURLToPath(uri);
  } catch {
    return undefined;
  }
}

/** One line for a user's mistake (file:line:column: what is wrong); a bug says it is one. */
function describeError(error: unknown): string {
  if (isUserError(error)) return error instanceof FirnlineError ? error.toLine() : error.message.split('\n').join('; ');
  const message = error instanceof Error ? error.message : String(error);
  return `internal error: ${message} (this is a bug in Firnline; please report it)`;
}

function toPosix(path: string): string {
  return sep === '/' ? path : path.split(sep).join('/');
}
