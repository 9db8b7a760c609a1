// The written forms the build stores (scripts/build-generated.js, dist/generated/word-forms.json;
// src/propositions/word-forms.ts) are a cache of the rules of inflection, which stay the truth:
// every stored phrase's forms are derived again here by the source code and compared, and a file
// made by other code, of another format or damaged is never used. The stored-file tests run after
// `npm run build` (as `npm test` does).
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { derivedVariants, phraseWords, subjectWordsOf, variantsMade, variantsOf } from '../../src/propositions/lexicon.js';
import { readWordForms, WORD_FORMS_FORMAT, WORD_FORMS_MODULES, wordFormsCode, wordFormsText, type WordFormsFile } from '../../src/propositions/word-forms.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { compiledTerms } from '../../src/claims/bind.js';

const root = fileURLToPath(new URL('../../', import.meta.url));
const stored = join(root, 'dist', 'generated', 'word-forms.json');
const lexiconModule = pathToFileURL(join(root, 'dist', 'propositions', 'lexicon.js'));

describe('the stored word forms (dist/generated/word-forms.json)', () => {
  it('hold, for every phrase, exactly the forms the rules of inflection derive now', () => {
    expect(existsSync(stored), 'run `npm run build` first').toBe(true);
    const forms = readWordForms(pathToFileURL(stored), lexiconModule);
    expect(forms, 'the file is current for the built code').toBeDefined();
    expect(forms!.size).toBeGreaterThan(500);
    for (const [key, list] of forms!) expect(list, key).toEqual(derivedVariants(key.split(' ')));
  });

  it("cover every phrase the built-in pack's terms and subject words ask for (\"rise\" → \"rose\", \"rising\")", async () => {
    const forms = readWordForms(pathToFileURL(stored), lexiconModule)!;
    const packs = await loadPacks([]);
    compiledTerms(packs);
    subjectWordsOf(packs.lexicon);
    const asked = [...variantsMade().keys()];
    expect(asked.length).toBeGreaterThan(500);
    expect(asked.filter((key) => !forms.has(key))).toEqual([]);
    expect(forms.get('rise')?.map((w) => w.join(' '))).toEqual(expect.arrayContaining(['rise', 'rose', 'risen', 'rising']));
  });

  it('are shared frozen, as the derived ones are: a caller cannot change them for the next', () => {
    const forms = readWordForms(pathToFileURL(stored), lexiconModule)!;
    const [, list] = [...forms][0]!;
    expect(Object.isFrozen(list)).toBe(true);
    expect(Object.isFrozen(list[0])).toBe(true);
  });
});

describe('a stored file that does not fit is ignored, never trusted', () => {
  // A copy of the build's two deriving modules and package.json in a folder laid out as dist/ is.
  function layout(): { dir: string; module: URL; file: URL } {
    const dir = mkdtempSync(join(tmpdir(), 'firnline-forms-'));
    mkdirSync(join(dir, 'dist', 'propositions'), { recursive: true });
    copyFileSync(join(root, 'package.json'), join(dir, 'package.json'));
    for (const name of WORD_FORMS_MODULES) writeFileSync(join(dir, 'dist', 'propositions', name), `// ${name}\n`);
    return { dir, module: pathToFileURL(join(dir, 'dist', 'propositions', 'lexicon.js')), file: pathToFileURL(join(dir, 'word-forms.json')) };
  }
  const sample = new Map([['lag', [['lag'], ['lags'], ['lagged'], ['lagging']]]]);

  it('reads a file made by the same code', () => {
    const { module, file } = layout();
    writeFileSync(file, wordFormsText(sample, wordFormsCode(module)!));
    expect(readWordForms(file, module)).toEqual(sample);
  });

  it('ignores it when a deriving module or package.json changed', () => {
    const { dir, module, file } = layout();
    writeFileSync(file, wordFormsText(sample, wordFormsCode(module)!));
    writeFileSync(join(dir, 'dist', 'propositions', 'inflect.js'), '// inflect.js, changed\n');
    expect(readWordForms(file, module)).toBeUndefined();
    const again = layout();
    writeFileSync(again.file, wordFormsText(sample, wordFormsCode(again.module)!));
    writeFileSync(join(again.dir, 'package.json'), '{"version":"0.0.0-other"}\n');
    expect(readWordForms(again.file, again.module)).toBeUndefined();
  });

  it('ignores another format, a damaged file, a missing one and entries that are not lists of words', () => {
    const { module, file } = layout();
    const code = wordFormsCode(module)!;
    const other: WordFormsFile = { format: WORD_FORMS_FORMAT, code, forms: { lag: [['lag']] } };
    writeFileSync(file, JSON.stringify({ ...other, format: 'firnline-word-forms/0' }));
    expect(readWordForms(file, module)).toBeUndefined();
    writeFileSync(file, wordFormsText(sample, code).slice(0, 40));
    expect(readWordForms(file, module)).toBeUndefined();
    writeFileSync(file, JSON.stringify({ ...other, forms: { lag: 'lagged' } }));
    expect(readWordForms(file, module)).toBeUndefined();
    writeFileSync(file, JSON.stringify({ ...other, forms: { lag: [[1]] } }));
    expect(readWordForms(file, module)).toBeUndefined();
    expect(readWordForms(new URL('missing.json', file), module)).toBeUndefined();
  });
});

describe('variantsOf (made once per phrase and process)', () => {
  it('answers as the rules derive, the same list each time, frozen', () => {
    for (const phrase of ['rise and fall together', 'all the work', 'take up', 'ice age', "Earth's orbit"]) {
      const words = phraseWords(phrase);
      const first = variantsOf(words);
      expect(first).toEqual(derivedVariants(words));
      expect(variantsOf([...words])).toBe(first);
      expect(Object.isFrozen(first) && first.every((w) => Object.isFrozen(w))).toBe(true);
    }
  });

  it('derives a phrase whose words hold a space apart from the joined key of other words', () => {
    expect(variantsOf(['sea level', 'rise']).map((w) => w.join('|'))).toEqual(derivedVariants(['sea level', 'rise']).map((w) => w.join('|')));
    expect(variantsOf(['sea', 'level rise'])).toEqual(derivedVariants(['sea', 'level rise']));
  });
});
