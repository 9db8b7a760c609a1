// The base protocol of LSP 3.17 ("Header Part", "Content Part"): `Content-Length: N\r\n`, other
// headers, `\r\n`, then N bytes. The guard passes well-framed messages on and drops header
// blocks without a Content-Length.
import { describe, expect, it } from 'vitest';
import { createFrameGuard } from '../../src/lsp/frame-guard.js';

async function through(chunks: (string | Buffer)[]): Promise<{ out: string; dropped: string[] }> {
  const dropped: string[] = [];
  const guard = createFrameGuard((why) => dropped.push(why));
  let out = '';
  guard.on('data', (b: Buffer) => void (out += b.toString('utf8')));
  for (const chunk of chunks) guard.write(typeof chunk === 'string' ? Buffer.from(chunk, 'utf8') : chunk);
  guard.end();
  await new Promise((done) => guard.on('end', done));
  return { out, dropped };
}

const frame = (body: string) => `Content-Length: ${Buffer.byteLength(body)}\r\n\r\n${body}`;

describe('createFrameGuard', () => {
  it('passes whole messages on, even when they arrive byte by byte', async () => {
    // Content-Length counts bytes: the emoji is four bytes in UTF-8.
    const text = frame('{"a":"🧊"}') + frame('{}');
    expect(text.startsWith('Content-Length: 12\r\n')).toBe(true);
    const { out, dropped } = await through([...Buffer.from(text)].map((b) => Buffer.of(b)));
    expect(dropped).toEqual([]);
    expect(out).toBe(text);
  });

  it('keeps Content-Length when a Content-Type header comes too, and drops the other header', async () => {
    const body = '{"x":1}';
    const { out } = await through([`Content-Length: ${body.length}\r\nContent-Type: application/vscode-jsonrpc; charset=utf-8\r\n\r\n${body}`]);
    expect(out).toBe(frame(body));
  });

  it('drops header blocks without a Content-Length and finds the next good message', async () => {
    const { out, dropped } = await through([`garbage line\r\n\r\nContent-Type: text/plain\r\n\r\n${frame('{"ok":true}')}`]);
    expect(out).toBe(frame('{"ok":true}'));
    expect(dropped).toHaveLength(2);
  });

  it('reads the last Content-Length when junk without a line break stands before it', async () => {
    const { out } = await through([`junkContent-Length: 2\r\nContent-Length: 7\r\n\r\n{"x":1}`]);
    expect(out).toBe(frame('{"x":1}'));
  });
});
