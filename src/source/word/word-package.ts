import { DOMParser, type Document } from '@xmldom/xmldom';
import { strFromU8, unzipSync } from 'fflate';
import { WordPackageError } from './word-package-error.js';

export { WordPackageError };

/** The WordprocessingML main namespace (ECMA-376 Part 1, §17). */
export const W_NS = 'http://schemas.openxmlformats.org/wordprocessingml/2006/main';
/** The main document part of a package made by a word processor (ECMA-376 Part 1, §11.3.10). */
export const DOCUMENT_PART = 'word/document.xml';

/** A Word package opened in memory: every part's bytes by path, and the parsed main document. */
export interface WordPackage {
  parts: Record<string, Uint8Array>;
  document: Document;
}

/**
 * Opens the bytes of a `.docx` file (a zip package, ECMA-376 Part 2) and parses its main document.
 * Throws WordPackageError when the bytes are not a zip, the main part is missing, or its XML is
 * malformed, so a broken file gives one clear line and never a stack trace.
 */
export function openWordPackage(bytes: Uint8Array): WordPackage {
  let parts: Record<string, Uint8Array>;
  try {
    parts = unzipSync(bytes);
  } catch {
    throw new WordPackageError('not a Word document: the file is not a zip package; save it again as .docx');
  }
  const main = parts[DOCUMENT_PART];
  if (main === undefined) throw new WordPackageError(`not a Word document: the package has no ${DOCUMENT_PART}; save it again as .docx`);
  return { parts, document: parseXmlPart(main, DOCUMENT_PART) };
}

/** Parses one XML part; malformed XML throws WordPackageError naming the part. */
export function parseXmlPart(bytes: Uint8Array, name: string): Document {
  const problems: string[] = [];
  let document: Document | undefined;
  try {
    document = new DOMParser({
      onError: (level, message) => {
        if (level !== 'warning') problems.push(message.split('\n')[0] ?? message);
      },
    }).parseFromString(strFromU8(bytes), 'application/xml');
  } catch (error) {
    problems.push(error instanceof Error ? (error.message.split('\n')[0] ?? 'parse error') : String(error));
  }
  if (document === undefined || problems.length > 0) {
    throw new WordPackageError(`${name} is not well-formed XML (${problems[0] ?? 'unreadable'}); the file may be damaged`);
  }
  return document;
}
