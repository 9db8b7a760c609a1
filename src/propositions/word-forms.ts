/**
 * The written forms of phrases made once at build time instead of on every run. Every `check` of a
 * draft on topic derives the forms of the built-in pack's terms (some 7,800) and of its subject
 * phrases (some 4,200): the same answers each time, from the same pack and the same code.
 * scripts/build-generated.js writes them to dist/generated/word-forms.json, keyed by a phrase's
 * words joined by spaces, with the SHA-256 of the modules that derive them (inflect.js and
 * lexicon.js) and of package.json. A run reads the file on its first question, and uses it only
 * while those digests match; else (a changed rule of inflection, a build by `tsc` alone, a run from
 * src/) every form is derived as before. A phrase the file does not hold (a team's term) is derived
 * too. test/propositions/word-forms.test.ts derives every stored entry again and compares.
 */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';

/** The `format` of the stored file; a file of another format is ignored. */
export const WORD_FORMS_FORMAT = 'firnline-word-forms/1';

/** The modules, next to this one in the build, whose code decides a phrase's forms. */
export const WORD_FORMS_MODULES = ['inflect.js', 'lexicon.js'] as const;

/** The stored file: a phrase's words joined by spaces → its forms, each a list of words. */
export interface WordFormsFile {
  format: typeof WORD_FORMS_FORMAT;
  /** SHA-256 of package.json and of WORD_FORMS_MODULES, in that order. */
  code: string;
  forms: Record<string, string[][]>;
}

/** The digest of what derives the forms, read beside `moduleUrl`; undefined when a file is missing. */
export function wordFormsCode(moduleUrl: string | URL): string | undefined {
  const hash = createHash('sha256');
  try {
    hash.update(readFileSync(new URL('../../package.json', moduleUrl))).update('\0');
    for (const name of WORD_FORMS_MODULES) hash.update(name).update('\0').update(readFileSync(new URL(name, moduleUrl))).update('\0');
  } catch {
    return undefined;
  }
  return hash.digest('hex');
}

/**
 * The stored forms at `file` when it was made by the code beside `moduleUrl`; else undefined. A
 * file that cannot be read or parsed, is of another format or was made by other code is ignored.
 */
export function readWordForms(file: URL, moduleUrl: string | URL): Map<string, string[][]> | undefined {
  let stored: WordFormsFile;
  try {
    stored = JSON.parse(readFileSync(file, 'utf8')) as WordFormsFile;
  } catch {
    return undefined;
  }
  if (stored === null || typeof stored !== 'object' || stored.format !== WORD_FORMS_FORMAT || typeof stored.forms !== 'object' || stored.forms === null) return undefined;
  const code = wordFormsCode(moduleUrl);
  if (code === undefined || code !== stored.code) return undefined;
  const forms = new Map<string, string[][]>();
  for (const [key, list] of Object.entries(stored.forms)) {
    if (!Array.isArray(list) || !list.every((w) => Array.isArray(w) && w.every((x) => typeof x === 'string'))) return undefined;
    // Shared by every caller, as the derived ones are: frozen.
    for (const words of list) Object.freeze(words);
    forms.set(key, Object.freeze(list) as string[][]);
  }
  return forms;
}

/** The file's text for `forms` made by the code whose digest is `code`. */
export function wordFormsText(forms: ReadonlyMap<string, readonly (readonly string[])[]>, code: string): string {
  const out: WordFormsFile = { format: WORD_FORMS_FORMAT, code, forms: Object.fromEntries([...forms].map(([k, v]) => [k, v.map((w) => [...w])])) };
  return `${JSON.stringify(out)}\n`;
}
