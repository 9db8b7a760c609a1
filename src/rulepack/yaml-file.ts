/**
 * A YAML file read for validation: its plain data, and a way back from a data path
 * (`['reference_values', 3, 'low']`) to the line and column where that node starts.
 */
import { readRegularText } from '../guard/read-regular-file.js';
import { isMap, isSeq, LineCounter, parseDocument, type Document, type Node } from 'yaml';
import { FirnlineError, FirnlineErrors } from '../errors.js';

/** A parsed YAML file that can say where each of its values stands. */
export interface YamlFile {
  file: string;
  data: unknown;
  /** 1-based line and column (code points) of the node at `path`, or of its nearest existing parent. */
  locate(path: readonly (string | number)[], part?: 'key' | 'value'): { line: number; column: number };
  /** A FirnlineError placed at `path`. */
  errorAt(code: string, path: readonly (string | number)[], message: string, part?: 'key' | 'value'): FirnlineError;
}

/** Reads and parses `file`; YAML syntax errors throw FirnlineErrors with line and column. */
export async function readYamlFile(file: string, shownAs = file): Promise<YamlFile> {
  let text: string;
  try {
    text = await readRegularText(file, { shown: shownAs, code: 'file-missing' });
  } catch (error) {
    if (error instanceof FirnlineError) throw error;
    throw new FirnlineError('file-missing', `cannot read this file; check the path`, { file: shownAs });
  }
  return parseYamlText(text, shownAs);
}

/** Parses YAML text already read; `file` is the name used in messages. */
export function parseYamlText(text: string, file: string): YamlFile {
  const lineCounter = new LineCounter();
  const doc = parseDocument(text, { lineCounter, prettyErrors: false, uniqueKeys: true });
  const position = (offset: number): { line: number; column: number } => {
    const { line } = lineCounter.linePos(offset);
    const lineStart = lineCounter.lineStarts[line - 1] ?? 0;
    return { line, column: [...text.slice(lineStart, offset)].length + 1 };
  };
  const [syntax] = doc.errors;
  if (syntax !== undefined) {
    // Only the first: later syntax errors are nearly always echoes of it.
    const where = position(syntax.pos[0]);
    throw new FirnlineErrors([new FirnlineError('yaml-syntax', `YAML syntax: ${firstLine(syntax.message)}`, { file, ...where })]);
  }
  const locate = (path: readonly (string | number)[], part: 'key' | 'value' = 'value') =>
    position(offsetOf(doc, path, part));
  let data: unknown;
  try {
    data = doc.toJS({ maxAliasCount: 100 }) as unknown;
  } catch (error) {
    // yaml refuses a document whose aliases would expand without bound (an "alias bomb").
    if (!/alias/iu.test((error as Error).message)) throw error;
    throw new FirnlineErrors([new FirnlineError('yaml-aliases', 'too many YAML aliases (more than 100 expansions); write the values out, or use fewer anchors', { file, ...firstAlias(text, position) })]);
  }
  return {
    file,
    data,
    locate,
    errorAt: (code, path, message, part) => new FirnlineError(code, message, { file, ...locate(path, part) }),
  };
}

/** The offset where the node at `path` starts; walks as far as the path exists. */
function offsetOf(doc: Document, path: readonly (string | number)[], part: 'key' | 'value'): number {
  let node: unknown = doc.contents;
  let offset = (doc.contents as Node | null)?.range?.[0] ?? 0;
  for (const [i, step] of path.entries()) {
    const last = i === path.length - 1;
    if (isMap(node)) {
      const pair = node.items.find((p) => String((p.key as { value?: unknown } | null)?.value ?? p.key) === String(step));
      if (pair === undefined) break;
      const keyStart = (pair.key as Node | null)?.range?.[0];
      const valueStart = (pair.value as Node | null)?.range?.[0];
      offset = (last && part === 'key' ? keyStart : (valueStart ?? keyStart)) ?? offset;
      node = pair.value;
    } else if (isSeq(node) && typeof step === 'number') {
      const item = node.items[step] as Node | undefined;
      if (item?.range === undefined || item.range === null) break;
      offset = item.range[0];
      node = item;
    } else break;
  }
  return offset;
}

function firstLine(message: string): string {
  return (message.split('\n')[0] ?? message).replace(/ at line \d+, column \d+:?$/u, '').trim();
}

/** Where the first alias (`*name`) stands, for the alias-bomb message. */
function firstAlias(text: string, position: (offset: number) => { line: number; column: number }): { line: number; column: number } {
  const at = /(?:^|[\s[{,:-])\*[^\s,\]}]+/u.exec(text);
  return position(at === null ? 0 : at.index + at[0].indexOf('*'));
}
