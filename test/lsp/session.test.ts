// `firnline lsp --stdio` driven as an editor drives it: a real child process spoken to over its
// standard input and output. Positions follow the LSP 3.17 specification ("Position": 0-based line,
// character in UTF-16 code units by default; "TextDocumentContentChangeEvent" for incremental edits).
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { CodeAction, Diagnostic, Hover } from 'vscode-languageserver';
import { TextDocument } from 'vscode-languageserver-textdocument';
import { appendSignoffs } from '../../src/review/append-signoffs.js';
import { claimIdOf } from '../../src/review/claim-id.js';
import { runCli } from '../cli/run-cli.js';
import { initialize, shutdown, startSession, type LspSession } from './lsp-session.js';

// The Vostok record spans about 420,000 years, not 800,000: Petit et al. (1999), Nature 399,
// 429-436, https://doi.org/10.1038/20859 (the 800,000-year record is EPICA Dome C's).
const WRONG = 'The Vostok ice core spans 800,000 years of climate history.';
// A heading with CRLF line ends, then the claim after an emoji (U+1F9CA: one code point, two
// UTF-16 code units), so code-point columns and UTF-16 characters differ by one.
const DRAFT = `# Winter notes\r\n\r\n🧊 ${WRONG}\r\n`;

let dir: string;
let session: LspSession | undefined;

beforeEach(async () => {
  dir = await mkdtemp(join(tmpdir(), 'firnline-lsp-'));
});
afterEach(async () => {
  if (session !== undefined && session.child.exitCode === null) session.child.kill();
  session = undefined;
  await rm(dir, { recursive: true, force: true });
});

const uriOf = (name: string) => pathToFileURL(join(dir, name)).href;
const open = (s: LspSession, uri: string, text: string, languageId = 'markdown') =>
  s.connection.sendNotification('textDocument/didOpen', { textDocument: { uri, languageId, version: 1, text } });

// Each test starts a server process; on a busy machine that takes seconds (not a speed target).
describe('firnline lsp --stdio', { timeout: 90_000 }, () => {
  it('flags a wrong claim at its exact range, fixes it, clears the flag, and shuts down cleanly', async () => {
    session = startSession(dir);
    const init = await initialize(session, pathToFileURL(dir).href);
    expect(init.capabilities).toMatchObject({ positionEncoding: 'utf-16', hoverProvider: true });

    const uri = uriOf('winter-notes.md');
    await open(session, uri, DRAFT);
    const [diagnostic, ...others] = await session.diagnostics(uri, (d) => d.length > 0);
    expect(others).toEqual([]);
    // "🧊 " is 3 UTF-16 units and "The Vostok ice core spans " 26 more: the number starts at 29.
    expect(diagnostic).toMatchObject({
      range: { start: { line: 2, character: 29 }, end: { line: 2, character: 42 } },
      severity: 1, // DiagnosticSeverity.Error
      code: 'value.vostok-record-span',
      codeDescription: { href: 'https://doi.org/10.1038/20859' },
      source: 'firnline',
    });
    expect(diagnostic?.message).toMatch(/Vostok/u);

    const actions: CodeAction[] = await session.connection.sendRequest('textDocument/codeAction', {
      textDocument: { uri },
      range: diagnostic?.range,
      context: { diagnostics: [diagnostic] },
    });
    const fix = actions.find((a) => a.kind === 'quickfix' && a.isPreferred === true);
    const edits = fix?.edit?.changes?.[uri] ?? [];
    expect(edits).toEqual([{ range: diagnostic?.range, newText: 'about 420,000 years' }]);
    expect(fix?.diagnostics).toEqual([diagnostic]);

    // Apply the edit as the editor does, and send it back as an incremental change.
    const before = TextDocument.create(uri, 'markdown', 1, DRAFT);
    const fixed = TextDocument.applyEdits(before, edits);
    expect(fixed).toBe('# Winter notes\r\n\r\n🧊 The Vostok ice core spans about 420,000 years of climate history.\r\n');
    await session.connection.sendNotification('textDocument/didChange', {
      textDocument: { uri, version: 2 },
      contentChanges: edits.map((e) => ({ range: e.range, text: e.newText })),
    });
    expect(await session.diagnostics(uri)).toEqual([]);
    expect(session.published.filter((p) => p.uri === uri).at(-1)?.version).toBe(2);

    expect(await shutdown(session)).toBe(0);
  });

  it('offers the quotation marker before the paragraph, the citation, and a hover with both intervals', async () => {
    session = startSession(dir);
    await initialize(session, pathToFileURL(dir).href);
    const uri = uriOf('gallery.md');
    const text = `# Gallery\r\n\r\nSome visitors insist that\r\n${WRONG}\r\n`;
    await open(session, uri, text);
    const [diagnostic] = await session.diagnostics(uri, (d) => d.length > 0);
    expect(diagnostic?.range).toEqual({ start: { line: 3, character: 26 }, end: { line: 3, character: 39 } });

    const actions: CodeAction[] = await session.connection.sendRequest('textDocument/codeAction', {
      textDocument: { uri },
      range: { start: { line: 3, character: 30 }, end: { line: 3, character: 30 } },
      context: { diagnostics: [] },
    });
    const marker = actions.find((a) => a.title.includes('firnline: reported'));
    // The paragraph starts on line 2 ("Some visitors insist that"): the marker goes on its own line
    // before it, ended with the document's own CRLF.
    expect(marker?.edit?.changes?.[uri]).toEqual([
      { range: { start: { line: 2, character: 0 }, end: { line: 2, character: 0 } }, newText: '<!-- firnline: reported -->\r\n' },
    ]);
    const copy = actions.find((a) => a.command?.command === 'firnline.copyCitation');
    expect(copy?.title).toBe('Copy citation: Petit et al. 1999; Petit et al. 1999/2001');
    const citation: string = await session.connection.sendRequest('workspace/executeCommand', copy?.command);
    expect(citation).toContain('Nature 399, 429-436. https://doi.org/10.1038/20859');

    const hover: Hover = await session.connection.sendRequest('textDocument/hover', { textDocument: { uri }, position: { line: 3, character: 30 } });
    const value = (hover.contents as { value: string }).value;
    expect(value).toContain('draft says: "800,000 years" (read as 795,000 to 805,000 yr)');
    expect(value).toContain('reference: 400,000 to 423,000 yr');
    expect(value).toContain('source: Petit et al. 1999, https://doi.org/10.1038/20859');
    expect(value).toContain('does not replace, expert review');
    expect(hover.range).toEqual(diagnostic?.range);
    const away = await session.connection.sendRequest('textDocument/hover', { textDocument: { uri }, position: { line: 0, character: 2 } });
    expect(away).toBeNull();
    expect(await shutdown(session)).toBe(0);
  });

  it('survives malformed messages and bad parameters, and keeps checking', async () => {
    session = startSession(dir);
    await initialize(session, pathToFileURL(dir).href);
    // A body that is not JSON, and JSON that is no JSON-RPC message (JSON-RPC 2.0 spec, "Parse error").
    for (const body of ['{"jsonrpc": "2.0", "method": ', '{"hello": "world"}']) {
      session.child.stdin.write(`Content-Length: ${Buffer.byteLength(body)}\r\n\r\n${body}`);
    }
    // Header blocks without the Content-Length the LSP base protocol requires, then a good request
    // written in the same chunk: it must be answered at once, not left waiting for more input.
    const hover = JSON.stringify({ jsonrpc: '2.0', id: 'after-junk', method: 'textDocument/hover', params: { textDocument: { uri: uriOf('none.md') }, position: { line: 0, character: 0 } } });
    session.child.stdin.write(`garbage line\r\n\r\nContent-Type: text/plain\r\n\r\nContent-Length: ${Buffer.byteLength(hover)}\r\n\r\n${hover}`);
    await expect(session.rawAnswer('after-junk')).resolves.toEqual({ jsonrpc: '2.0', id: 'after-junk', result: null });
    // A request whose parameters miss the document: an error answer, not a crash.
    await expect(session.connection.sendRequest('textDocument/hover', {})).rejects.toThrow();
    const uri = uriOf('after.md');
    await open(session, uri, `${WRONG}\n`);
    const diagnostics = await session.diagnostics(uri, (d) => d.length > 0);
    expect(diagnostics.map((d) => d.code)).toEqual(['value.vostok-record-span']);
    expect(session.child.exitCode).toBeNull();
    expect(await shutdown(session)).toBe(0);
  });

  it('reports a document that makes the engine throw, and goes on checking the others', async () => {
    // A team pack whose pattern backtracks exponentially on a run of a's (common practice): the
    // engine stops it under its time limit and throws a pack error for that document.
    await writeFile(join(dir, 'house.yaml'), "pack: house\nversion: '1.0.0'\nas_of: 2026-01-01\npatterns:\n  - id: house.slow\n    reason: A pattern written in haste.\n    regex: '(?:a|aa)*c'\n");
    await writeFile(join(dir, 'firnline.yaml'), 'packs: [house.yaml]\n');
    session = startSession(dir);
    await initialize(session, pathToFileURL(dir).href);
    const bad = uriOf('bad.md');
    await open(session, bad, `The Vostok ice core holds ${'a'.repeat(60)}b.\n`);
    const [problem] = await session.diagnostics(bad, (d) => d.length > 0);
    expect(problem?.message).toMatch(/^Firnline could not check this draft: .*house\.yaml: pattern house\.slow: ran longer than 100 ms/u);
    expect(problem?.range).toEqual({ start: { line: 0, character: 0 }, end: { line: 0, character: 0 } });

    const good = uriOf('good.md');
    await open(session, good, `${WRONG}\n`);
    const diagnostics = await session.diagnostics(good, (d) => d.length > 0);
    expect(diagnostics.map((d) => d.code)).toContain('value.vostok-record-span');
    expect(await shutdown(session)).toBe(0);
  });

  it('shows a signed-off claim as information, and reloads when the settings change', async () => {
    await writeFile(join(dir, 'firnline.yaml'), 'include: ["**/*.md"]\n');
    const claim = claimIdOf('panel.md', WRONG, 1);
    await appendSignoffs(join(dir, 'firnline-signoffs.yaml'), [
      { claim, file: 'panel.md', text: WRONG, decision: 'waived', reason: 'Quoted from a 1990s panel on purpose.', reviewer: 'Dr A. Reviewer', date: '2026-03-02', packVersion: 'paleoclimate 1.0.0' },
    ]);
    session = startSession(dir);
    await initialize(session, pathToFileURL(dir).href, { workspace: { didChangeWatchedFiles: { dynamicRegistration: true } } });
    const uri = uriOf('panel.md');
    await open(session, uri, `${WRONG}\n`);
    const [signed] = await session.diagnostics(uri, (d) => d.length > 0);
    expect(signed).toMatchObject({ severity: 3, code: 'value.vostok-record-span' }); // Information
    expect(signed?.message).toMatch(/\(signed off by Dr A\. Reviewer on 2026-03-02: waived; level error\)$/u);

    // Turn the rule off in firnline.yaml: the server reloads and clears the flag.
    await writeFile(join(dir, 'firnline.yaml'), 'levels:\n  value.vostok-record-span: "off"\n');
    await session.connection.sendNotification('workspace/didChangeWatchedFiles', { changes: [{ uri: uriOf('firnline.yaml'), type: 2 }] });
    expect(await session.diagnostics(uri, (d: Diagnostic[]) => d.length === 0)).toEqual([]);
    expect(await shutdown(session)).toBe(0);
  });

  it('reloads when a pack changes on disk, with no file events from the client', async () => {
    // A team pack that turns the Vostok span into a pattern rule of its own level; the client here
    // registers no file watching, so only the server's own watcher can see the change.
    await writeFile(join(dir, 'firnline.yaml'), 'packs: [house.yaml]\n');
    const pack = (level: string) => `pack: house\nversion: '1.0.0'\nas_of: 2026-01-01\npatterns:\n  - id: house.old-span\n    level: ${level}\n    reason: Our style guide retired this figure.\n    regex: '800,000 years'\n`;
    await writeFile(join(dir, 'house.yaml'), pack('note'));
    session = startSession(dir);
    await initialize(session, pathToFileURL(dir).href);
    const uri = uriOf('notes.md');
    await open(session, uri, `${WRONG}\n`);
    const first = await session.diagnostics(uri, (d) => d.some((x) => x.code === 'house.old-span'));
    expect(first.find((d) => d.code === 'house.old-span')?.severity).toBe(3); // note → Information
    await writeFile(join(dir, 'house.yaml'), pack('error'));
    const after = await session.diagnostics(uri, (d) => d.some((x) => x.code === 'house.old-span' && x.severity === 1));
    expect(after.find((d) => d.code === 'house.old-span')?.severity).toBe(1); // error → Error
    expect(await shutdown(session)).toBe(0);
  });

  it('shows a broken firnline.yaml as one line at file:line:column, and recovers once it is fixed', async () => {
    await writeFile(join(dir, 'firnline.yaml'), 'levels:\n  value.vostok-record-span: loud\n');
    session = startSession(dir);
    await initialize(session, pathToFileURL(dir).href);
    const uri = uriOf('draft.md');
    await open(session, uri, `${WRONG}\n`);
    const [problem] = await session.diagnostics(uri, (d) => d.length > 0);
    expect(problem?.message).toMatch(/^Firnline could not check this draft: .*firnline\.yaml:2:\d+: /u);
    await writeFile(join(dir, 'firnline.yaml'), 'levels:\n  value.vostok-record-span: warning\n');
    const fixed = await session.diagnostics(uri, (d) => d.some((x) => x.code === 'value.vostok-record-span'));
    expect(fixed.map((d) => [d.code, d.severity])).toEqual([['value.vostok-record-span', 2]]); // the level from the settings
    expect(await shutdown(session)).toBe(0);
  });

  it('refuses to start without --stdio, in one line', async () => {
    const run = await runCli(['lsp'], dir);
    expect(run.code).toBe(2);
    expect(run.stderr).toBe('the server talks over standard input and output only: run `firnline lsp --stdio`\n');
  });
});
