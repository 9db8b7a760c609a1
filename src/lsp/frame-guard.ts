/**
 * A guard in front of the JSON-RPC reader that passes on only well-framed messages. The base
 * protocol of LSP 3.17 frames each message as header lines (`Content-Length: N` is required), an
 * empty line (`\r\n\r\n`), then N bytes of body. vscode-jsonrpc's reader, given a header block
 * without a usable Content-Length, reports an error and stops reading the data already received,
 * so the next good message waits for more input. The guard drops such a block (and tells
 * `onDrop`), and hands the reader complete frames only, so one broken message costs one message.
 */
import { Transform, type TransformCallback } from 'node:stream';

const HEADER_END = Buffer.from('\r\n\r\n', 'ascii');
// The last Content-Length in a header block: junk written before a good header without a line
// break of its own still leaves the good header readable.
const CONTENT_LENGTH = /content-length[ \t]*:[ \t]*(\d+)[ \t]*(?:\r\n|$)(?![\s\S]*content-length)/iu;
/** A header block longer than this is junk, not headers (headers are a few dozen bytes). */
const MAX_HEADER_BYTES = 8192;

/** A stream that turns raw protocol bytes into well-framed messages. */
export function createFrameGuard(onDrop: (why: string) => void): Transform {
  let pending = Buffer.alloc(0);
  return new Transform({
    transform(chunk: Buffer, _encoding: BufferEncoding, done: TransformCallback) {
      pending = Buffer.concat([pending, chunk]);
      for (;;) {
        const end = pending.indexOf(HEADER_END);
        if (end === -1) {
          if (pending.length > MAX_HEADER_BYTES) {
            onDrop(`${pending.length} bytes without a header end`);
            pending = Buffer.alloc(0);
          }
          break;
        }
        const header = pending.subarray(0, end).toString('ascii');
        const length = CONTENT_LENGTH.exec(header)?.[1];
        if (length === undefined || end > MAX_HEADER_BYTES) {
          onDrop(`a header without a Content-Length: ${JSON.stringify(header.slice(0, 80))}`);
          pending = pending.subarray(end + HEADER_END.length);
          continue;
        }
        const total = end + HEADER_END.length + Number(length);
        if (pending.length < total) break;
        this.push(Buffer.concat([Buffer.from(`Content-Length: ${length}\r\n\r\n`, 'ascii'), pending.subarray(end + HEADER_END.length, total)]));
        pending = pending.subarray(total);
      }
      done();
    },
  });
}
