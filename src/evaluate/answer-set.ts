/**
 * Keyed evaluation sets: a folder of drafts plus an `answers.yaml` that says, line by line, which
 * lines hold a seeded error (and of what kind) and which hold a correct claim. Written by writers
 * who never read the engine; the scorer (score-set.ts) runs the engine over the folder and compares.
 *
 *   drafts:
 *     press-release.md:
 *       genre: press release
 *       lines:
 *         - { line: 12, expect: flag, kind: value, text: "800,000 years", key: ["420,000"], why: "..." }
 *         - { line: 14, expect: clean, text: "Orbital changes paced", why: "..." }
 */
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { parse } from 'yaml';

/** The rule-id group that should catch a seeded error: a flag's ruleId starts with `${kind}.`. */
export const ERROR_KINDS = ['value', 'arith', 'unit', 'logic', 'scope', 'direction'] as const;
export type ErrorKind = (typeof ERROR_KINDS)[number];

/** One keyed line of one draft. */
export interface KeyedLine {
  file: string;
  line: number;
  expect: 'flag' | 'clean';
  kind?: ErrorKind;
  text: string;
  /** For numeric errors: forms of the reference number a correct correction contains (any one). */
  key: string[];
  why: string;
}

/** A loaded set: its name, folder, and every keyed line. */
export interface AnswerSet {
  name: string;
  folder: string;
  lines: KeyedLine[];
  /** Draft file names (relative to the folder) with their genre. */
  genres: Record<string, string>;
}

/** Reads `<folder>/answers.yaml`. Throws with the set name when the key is malformed. */
export async function loadAnswerSet(folder: string, name: string): Promise<AnswerSet> {
  const raw = parse(await readFile(join(folder, 'answers.yaml'), 'utf8')) as unknown;
  const drafts = isRecord(raw) && isRecord(raw['drafts']) ? raw['drafts'] : undefined;
  if (drafts === undefined) throw new Error(`${name}: answers.yaml has no drafts map`);
  const lines: KeyedLine[] = [];
  const genres: Record<string, string> = {};
  for (const [file, entry] of Object.entries(drafts)) {
    if (!isRecord(entry) || !Array.isArray(entry['lines'])) throw new Error(`${name}/${file}: no lines list`);
    genres[file] = typeof entry['genre'] === 'string' ? entry['genre'] : '';
    for (const item of entry['lines'] as unknown[]) lines.push(keyedLine(name, file, item));
  }
  return { name, folder, lines, genres };
}

function keyedLine(set: string, file: string, item: unknown): KeyedLine {
  if (!isRecord(item) || typeof item['line'] !== 'number' || (item['expect'] !== 'flag' && item['expect'] !== 'clean')) {
    throw new Error(`${set}/${file}: a keyed line needs a line number and expect: flag|clean (${JSON.stringify(item)})`);
  }
  const kind = item['kind'];
  if (item['expect'] === 'flag' && !ERROR_KINDS.includes(kind as ErrorKind)) {
    throw new Error(`${set}/${file}:${String(item['line'])}: kind must be one of ${ERROR_KINDS.join(', ')}`);
  }
  const key = Array.isArray(item['key']) ? item['key'].map(String) : typeof item['key'] === 'string' ? [item['key']] : [];
  return {
    file,
    line: item['line'],
    expect: item['expect'],
    ...(item['expect'] === 'flag' ? { kind: kind as ErrorKind } : {}),
    text: typeof item['text'] === 'string' ? item['text'] : '',
    key,
    why: typeof item['why'] === 'string' ? item['why'] : '',
  };
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}
