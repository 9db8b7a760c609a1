/**
 * Turns a draft's bytes into text, or says exactly why it cannot. UTF-8 (with or without a
 * byte-order mark) and UTF-16 with a byte-order mark (little- or big-endian) are read; a byte-order
 * mark stays in the text, so offsets count it. Anything else is not guessed at: a stray Latin-1
 * byte gives the line, column and byte value of the first byte that is not UTF-8, and a NUL byte
 * marks a binary file (or a text in an encoding Firnline does not read).
 *
 *     decodeDraftBytes(Buffer.from('Temperature \xb0C', 'latin1'))
 *     // { problem: 'not valid UTF-8 (byte 0xB0); save the file as UTF-8', line: 1, column: 13 }
 */

/** The decoded text, or what stops it being read with the place of the first bad byte. */
export type DecodedText = { text: string; encoding: 'utf-8' | 'utf-16le' | 'utf-16be' } | { problem: string; line?: number; column?: number };

/** The header signature of an OLE compound file, as a legacy .doc is ([MS-CFB] section 2.2). */
const OLE_SIGNATURE = [0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1] as const;
const UTF8 = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true });
const UTF16LE = new TextDecoder('utf-16le', { fatal: true, ignoreBOM: true });
const UTF16BE = new TextDecoder('utf-16be', { fatal: true, ignoreBOM: true });

/** Reads `bytes` as UTF-8 or BOM-marked UTF-16 (see the module comment). */
export function decodeDraftBytes(bytes: Uint8Array): DecodedText {
  if (OLE_SIGNATURE.every((b, i) => bytes[i] === b)) {
    return { problem: 'a Word 97-2003 document (or another OLE compound file), which Firnline does not read; save it as .docx or as UTF-8 text, then check it again' };
  }
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return decodeWide(UTF16LE, bytes, 'utf-16le');
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return decodeWide(UTF16BE, bytes, 'utf-16be');
  let text: string | undefined;
  try {
    text = UTF8.decode(bytes);
  } catch {
    const bad = firstInvalidUtf8(bytes);
    const byte = (bytes[bad] ?? 0).toString(16).toUpperCase().padStart(2, '0');
    return { problem: `not valid UTF-8 (byte 0x${byte}); save the file as UTF-8, then check it again`, ...placeOf(bytes, Math.max(bad, 0)) };
  }
  const nul = text.indexOf('\0');
  if (nul >= 0) {
    return { problem: 'holds a NUL byte, so it is a binary file or in an encoding Firnline does not read (UTF-8, or UTF-16 with a byte-order mark); it was not checked', ...placeInText(text, nul) };
  }
  return { text, encoding: 'utf-8' };
}

function decodeWide(decoder: InstanceType<typeof TextDecoder>, bytes: Uint8Array, encoding: 'utf-16le' | 'utf-16be'): DecodedText {
  if (bytes.length % 2 !== 0) return { problem: `${encoding.toUpperCase()} text with an odd number of bytes (the file is cut short); save it again as UTF-8` };
  try {
    const text = decoder.decode(bytes);
    const nul = text.indexOf('\0');
    if (nul >= 0) return { problem: 'holds a NUL character, so it is a binary file; it was not checked', ...placeInText(text, nul) };
    return { text, encoding };
  } catch {
    return { problem: `not valid ${encoding.toUpperCase()} (an unpaired surrogate); save the file as UTF-8` };
  }
}

/**
 * The index of the first byte that does not start or continue a well-formed UTF-8 sequence
 * (RFC 3629, section 4: no overlong forms, no surrogates, nothing above U+10FFFF), or -1.
 */
export function firstInvalidUtf8(bytes: Uint8Array): number {
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i] as number;
    if (b < 0x80) {
      i += 1;
      continue;
    }
    let need: number;
    let low = 0x80;
    let high = 0xbf;
    if (b >= 0xc2 && b <= 0xdf) need = 1;
    else if (b >= 0xe0 && b <= 0xef) {
      need = 2;
      if (b === 0xe0) low = 0xa0;
      if (b === 0xed) high = 0x9f;
    } else if (b >= 0xf0 && b <= 0xf4) {
      need = 3;
      if (b === 0xf0) low = 0x90;
      if (b === 0xf4) high = 0x8f;
    } else return i;
    for (let k = 1; k <= need; k += 1) {
      const c = bytes[i + k];
      if (c === undefined) return i;
      if (k === 1 ? c < low || c > high : c < 0x80 || c > 0xbf) return i;
    }
    i += need + 1;
  }
  return -1;
}

/** 1-based line and column (code points) of byte `index` in well-formed UTF-8 up to that byte. */
function placeOf(bytes: Uint8Array, index: number): { line: number; column: number } {
  const before = UTF8.decode(bytes.subarray(0, index));
  return placeInText(before, before.length);
}

function placeInText(text: string, index: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < index; i += 1) {
    const c = text.charCodeAt(i);
    if (c === 10 || (c === 13 && text.charCodeAt(i + 1) !== 10)) {
      line += 1;
      lineStart = i + 1;
    }
  }
  return { line, column: [...text.slice(lineStart, index)].length + 1 };
}
