#!/usr/bin/env node
// The second step of `npm run build`, after tsc: writes dist/generated/, what start-up would
// otherwise compute on every run, each piece with the digests of what it was made from so that a
// run uses it only while those still match (src/rulepack/compiled-pack.ts, validator-code.ts):
//   - <name>.validate.cjs: the JSON Schema validators of schemas/ (rule pack, settings, ledger) as standalone code;
//   - builtin-pack.json: rules/paleoclimate.yaml loaded (validated, resolved, citations rendered);
//   - word-forms.json: the written forms of the built-in pack's terms and subject phrases
//     (src/propositions/word-forms.ts), made after the pack is compiled;
//   - unit-first-chars.json: the characters each unit matcher's match can start with
//     (src/quantities/stored-first-chars.ts).
import { mkdir, readFile, writeFile, rename, rm } from 'node:fs/promises';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const dist = join(root, 'dist');
const out = join(dist, 'generated');
await mkdir(out, { recursive: true });
// Made again below from what this build derives, never read by it.
await rm(join(out, 'word-forms.json'), { force: true });
await rm(join(out, 'unit-first-chars.json'), { force: true });

/** Writes through a temporary file, so a reader never sees half a file. */
async function writeWhole(file, text) {
  await writeFile(`${file}.tmp`, text);
  await rename(`${file}.tmp`, file);
}

const { SCHEMA_OPTIONS, validatorModuleCode } = await import('../dist/rulepack/validator-code.js');
for (const name of Object.keys(SCHEMA_OPTIONS)) await writeWhole(join(out, `${name}.validate.cjs`), validatorModuleCode(name));

// The unit matchers' first characters (the old file was removed above, so match-unit.js read them
// from the sources here).
{
  const { firstChars } = await import('../dist/quantities/first-chars.js');
  const { MATCHED_UNITS, unitSource } = await import('../dist/quantities/match-unit.js');
  const { firstCharsCode, firstCharsText } = await import('../dist/quantities/stored-first-chars.js');
  const code = firstCharsCode(new URL('../dist/quantities/match-unit.js', import.meta.url));
  if (code === undefined) throw new Error('build-generated: cannot read the unit matchers\' first-character reader');
  await writeWhole(join(out, 'unit-first-chars.json'), firstCharsText(MATCHED_UNITS.map(unitSource), firstChars, code));
}

/** The modules of dist/ that `entry` loads, following relative static and dynamic imports, sorted. */
async function moduleGraph(entry) {
  const seen = new Set();
  const todo = [resolve(dist, entry)];
  while (todo.length > 0) {
    const file = todo.pop();
    if (seen.has(file)) continue;
    seen.add(file);
    const text = await readFile(file, 'utf8');
    for (const m of text.matchAll(/(?:\bfrom\s*|\bimport\s*\(\s*|\bimport\s+)['"](\.{1,2}\/[^'"]+)['"]/gu)) {
      todo.push(resolve(dirname(file), m[1]));
    }
  }
  return [...seen].map((f) => relative(dist, f).split('\\').join('/')).sort();
}

// The pack is loaded by the YAML path (the compiled file is not there yet, or is replaced).
const { loadRulePack, BUILTIN_PACK_FILE } = await import('../dist/rulepack/index.js');
const { compiledPackText, currentInputs } = await import('../dist/rulepack/compiled-pack.js');
const modules = await moduleGraph('rulepack/load-packs.js');
const inputs = currentInputs({
  yaml: BUILTIN_PACK_FILE,
  schema: join(root, 'schemas', 'rulepack.schema.json'),
  packageJson: join(root, 'package.json'),
  codeRoot: dist,
}, modules);
if (inputs === undefined) throw new Error('build-generated: cannot read the built-in pack inputs');
// A pack with mistakes is not compiled: runs then read the YAML and report each mistake at its place.
let pack;
try {
  pack = await loadRulePack(BUILTIN_PACK_FILE);
} catch (error) {
  if (!Array.isArray(error?.errors)) throw error;
  await rm(join(out, 'builtin-pack.json'), { force: true });
  console.log(`build-generated: the built-in pack was not compiled, it has mistakes:\n${error.errors.map((e) => e.toLine()).join('\n')}`);
}
if (pack !== undefined) await writeWhole(join(out, 'builtin-pack.json'), compiledPackText(pack, inputs));

// The forms every check of a draft on topic derives from the built-in pack: its terms' inflections
// and its subject words (the old file was removed at the start, so they are derived here, not read).
if (pack !== undefined) {
  const { loadPacks } = await import('../dist/rulepack/index.js');
  const { compiledTerms } = await import('../dist/claims/bind.js');
  const { subjectWordsOf, variantsMade } = await import('../dist/propositions/lexicon.js');
  const { wordFormsCode, wordFormsText } = await import('../dist/propositions/word-forms.js');
  const packs = await loadPacks([]);
  compiledTerms(packs);
  subjectWordsOf(packs.lexicon);
  const code = wordFormsCode(new URL('../dist/propositions/lexicon.js', import.meta.url));
  if (code === undefined) throw new Error('build-generated: cannot read the modules that derive word forms');
  await writeWhole(join(out, 'word-forms.json'), wordFormsText(variantsMade(), code));
}
