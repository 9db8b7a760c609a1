#!/usr/bin/env node
// A step of `npm run build` (after build-generated.js): compromise's tagger build with its model made
// at build time (docs/speed.md, Start-up; src/nlp/stored-tagger.ts).
//
// Loading `compromise/two` computes its model every time: it unpacks its lexicon, conjugates and
// inflects every word of it, builds its conjugation models and merges some 100,000 words into the
// world one key at a time; about two thirds of the library's load, the same answers on every run.
// This step loads compromise's own sources (node_modules/compromise/src/two.js, the code its
// `compromise/two` build is made from) once, and writes to dist/generated/:
//   - compromise-tagger-model.json: the world's model after every plugin, before any parse, as JSON
//     (its regular expressions listed apart, by path), with the SHA-256 of compromise's package.json
//     and of its `compromise/two` build: a run uses it only while the installed package hashes the same;
//   - compromise-tagger.cjs: the same sources bundled (esbuild), with the pre-tagger's model module
//     replaced by an empty model; once the plugins are in, the world's model is replaced by the stored one.
// Before it writes them, it loads the new tagger and checks that its model equals the reference's and
// that it reads sample sentences as `compromise/two` does; when it cannot (esbuild missing, a model
// value JSON cannot carry, a difference), it writes nothing and runs use `compromise/two`, as before.
import { createHash } from 'node:crypto';
import { rename, rm, writeFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

/** Sentences of our own, on topic and not, with the word classes the readings ask about. */
const SAMPLES = [
  'Sea level was about 120 m lower at the Last Glacial Maximum, and rose 80 m during the deglaciation.',
  'CO2 and temperature rise and fall together over 800,000 years, which shows that they are linked.',
  "The drillers' cores, taken in 1998, hold air that is older than we'd thought.",
  'She quickly read the reports; they were longer than the survey itself.',
];

/** Writes through a temporary file, so a reader never sees half a file. */
async function writeWhole(file, contents) {
  await writeFile(`${file}.tmp`, contents);
  await rename(`${file}.tmp`, file);
}

const root = fileURLToPath(new URL('..', import.meta.url));
const out = join(root, 'dist', 'generated');
const CODE = join(out, 'compromise-tagger.cjs');
const MODEL = join(out, 'compromise-tagger-model.json');
await rm(CODE, { force: true });
await rm(MODEL, { force: true });

const { STORED_TAGGER_FORMAT, compromiseDigest, modelText, sampleReading, sameModel } = await import('../dist/nlp/stored-tagger.js');
const require = createRequire(import.meta.url);
const digest = compromiseDigest(require);
if (digest === undefined) {
  console.log('build-tagger: cannot read the installed compromise; runs load compromise/two');
  process.exit(0);
}
const src = join(dirname(require.resolve('compromise/two')), '..', '..', 'src');

let esbuild;
try {
  esbuild = await import('esbuild');
  await esbuild.transform('', {});
} catch (error) {
  console.log(`build-tagger: esbuild cannot run here (${error instanceof Error ? error.message.split('\n')[0] : String(error)}); runs load compromise/two`);
  process.exit(0);
}

// The reference: compromise's sources loaded as they are, the world's model before any parse.
const { default: reference } = await import(pathToFileURL(join(src, 'two.js')).href);
let text;
try {
  text = modelText(reference.world().model, digest);
} catch (error) {
  console.log(`build-tagger: ${error instanceof Error ? error.message : String(error)}; runs load compromise/two`);
  process.exit(0);
}

const preTaggerModel = join(src, '2-two', 'preTagger', 'model', 'index.js');
const entry = [
  `import nlp from ${JSON.stringify(join(src, 'two.js'))};`,
  "const { readFileSync } = require('node:fs');",
  "const { join } = require('node:path');",
  // The model is read here, after the plugins; installStoredModel checks its format.
  `const stored = JSON.parse(readFileSync(join(__dirname, 'compromise-tagger-model.json'), 'utf8'));`,
  `if (stored.format !== ${JSON.stringify(STORED_TAGGER_FORMAT)}) throw new Error('compromise-tagger-model.json: another format');`,
  'const model = nlp.world().model;',
  'for (const key of Object.keys(model)) delete model[key];',
  'for (const [path, source, flags] of stored.regexps) {',
  '  let at = stored.model;',
  '  for (const step of path.slice(0, -1)) at = at[step];',
  '  at[path[path.length - 1]] = new RegExp(source, flags);',
  '}',
  'for (const path of stored.undefineds) {',
  '  let at = stored.model;',
  '  for (const step of path.slice(0, -1)) at = at[step];',
  '  at[path[path.length - 1]] = undefined;',
  '}',
  // Last: an alias's first place may hold an expression or undefined, and is complete by now.
  'const at = (path) => path.reduce((o, step) => o[step], stored.model);',
  'for (const [path, first] of stored.aliases) at(path.slice(0, -1))[path[path.length - 1]] = at(first);',
  'Object.assign(model, stored.model);',
  'module.exports = { nlp, compromiseDigest: stored.compromise };',
].join('\n');
const result = await esbuild.build({
  stdin: { contents: entry, resolveDir: src, sourcefile: 'firnline-tagger-entry.js', loader: 'js' },
  bundle: true,
  format: 'cjs',
  platform: 'node',
  target: 'node20',
  write: false,
  legalComments: 'none',
  logLevel: 'warning',
  plugins: [{
    name: 'empty-pre-tagger-model',
    setup(b) {
      // The only module replaced: its model is computed on import, and is put back whole afterwards.
      b.onLoad({ filter: /preTagger[\\/]model[\\/]index\.js$/ }, (args) => (args.path === preTaggerModel ? { contents: 'export default {}', loader: 'js' } : undefined));
    },
  }],
});
const code = `// Generated by scripts/build-tagger.js from compromise's sources (${digest.slice(0, 12)}); do not edit.\n${result.outputFiles[0].text}`;

// The model under its own name (the code reads it from there), the code under a temporary one:
// loaded and checked, then moved into place; a run uses neither without the other.
await writeWhole(MODEL, text);
await writeFile(`${CODE}.tmp.cjs`, code);
const trial = createRequire(CODE)(`${CODE}.tmp.cjs`);
const plain = require('compromise/two');
const problems = [];
if (!sameModel(trial.nlp.world().model, reference.world().model)) problems.push('its model differs from the reference');
for (const sentence of SAMPLES) {
  if (JSON.stringify(sampleReading(trial.nlp, sentence)) !== JSON.stringify(sampleReading(plain, sentence))) problems.push(`it reads "${sentence}" otherwise`);
}
if (problems.length > 0) {
  await rm(MODEL, { force: true });
  await rm(`${CODE}.tmp.cjs`, { force: true });
  console.log(`build-tagger: the stored tagger was not written: ${problems.join('; ')}; runs load compromise/two`);
  process.exit(0);
}
await rename(`${CODE}.tmp.cjs`, CODE);
console.log(`build-tagger: ${CODE.slice(root.length)} (${(code.length / 1024).toFixed(0)} KB) and its model (${(text.length / 1024).toFixed(0)} KB), sha256 ${createHash('sha256').update(text).digest('hex').slice(0, 12)}`);
