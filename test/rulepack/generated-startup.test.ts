// What the build generates for start-up (scripts/build-generated.js, dist/generated/) is checked here
// against its sources, which stay the truth: the compiled built-in pack against the YAML loader's
// own result, the standalone validators against ajv compiling the schemas in schemas/ now. These run
// after `npm run build` (as `npm test` does).
import { copyFileSync, mkdtempSync, readFileSync, writeFileSync, appendFileSync, existsSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { isDeepStrictEqual } from 'node:util';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import type { ValidateFunction } from 'ajv/dist/2020.js';
import { BUILTIN_PACK_FILE, loadRulePack } from '../../src/rulepack/index.js';
import { compiledPackText, currentInputs, readCompiledPack, type PackInputPaths } from '../../src/rulepack/compiled-pack.js';
import { compileNow, validatorModuleCode, type schemaValidator as schemaValidatorType } from '../../src/rulepack/validator-code.js';
import type { loadPacks as loadPacksType } from '../../src/rulepack/index.js';
import type { RulePack } from '../../src/rulepack/types.js';

const root = fileURLToPath(new URL('../../', import.meta.url));
const generated = join(root, 'dist', 'generated');
const schemaFile = (name: string) => join(root, 'schemas', `${name}.schema.json`);
const require = createRequire(import.meta.url);

/** The YAML loader's pack with every lazy citation read, so it compares as plain data. */
async function packFromYaml(file = BUILTIN_PACK_FILE): Promise<RulePack> {
  const pack = await loadRulePack(file);
  for (const source of pack.sources) {
    void source.cite;
    void source.short;
  }
  return pack;
}

const builtInputs: PackInputPaths = { yaml: BUILTIN_PACK_FILE, schema: schemaFile('rulepack'), packageJson: join(root, 'package.json'), codeRoot: join(root, 'dist') };

describe('the compiled built-in pack (dist/generated/builtin-pack.json)', () => {
  it('is current after the build and is the pack the YAML loader returns, key order and shared sources included', async () => {
    expect(existsSync(join(generated, 'builtin-pack.json')), 'run `npm run build` first').toBe(true);
    const compiled = readCompiledPack(join(generated, 'builtin-pack.json'), builtInputs);
    expect(compiled).toBeDefined();
    const yaml = await packFromYaml();
    expect(isDeepStrictEqual(compiled, yaml)).toBe(true);
    expect(JSON.stringify(compiled)).toBe(JSON.stringify(yaml));
    // A reference value's source is the pack's own source entry, as the YAML loader shares it.
    const cited = compiled!.references.find((r) => r.sources.length > 0)!;
    expect(compiled!.sources).toContain(cited.sources[0]);
  });
});

describe('the built code (dist/) takes the generated forms', () => {
  it('loads the built-in pack from its compiled form: citations are plain data, not rendered on read', async () => {
    const { loadPacks } = (await import(pathToFileURL(join(root, 'dist/rulepack/index.js')).href)) as { loadPacks: typeof loadPacksType };
    const packs = await loadPacks([]);
    const cited = packs.packs[0]!.sources.find((s) => s.csl !== undefined)!;
    expect(Object.getOwnPropertyDescriptor(cited, 'short')?.get).toBeUndefined();
    expect(typeof cited.short).toBe('string');
  });

  it.each(['rulepack', 'settings', 'ledger'] as const)('validates with the generated %s validator', async (name) => {
    const { schemaValidator } = (await import(pathToFileURL(join(root, 'dist/rulepack/validator-code.js')).href)) as { schemaValidator: typeof schemaValidatorType };
    expect(schemaValidator(name)).toBe(require(join(generated, `${name}.validate.cjs`)));
  });
});

describe('a compiled pack is used only while its inputs are unchanged', () => {
  // A compiled pack of a copy of the built-in YAML, made from this test's own modules (src/).
  async function setUp(): Promise<{ dir: string; paths: PackInputPaths; compiledFile: string }> {
    const dir = mkdtempSync(join(tmpdir(), 'firnline-compiled-'));
    const yaml = join(dir, 'pack.yaml');
    const schema = join(dir, 'schema.json');
    const pkg = join(dir, 'package.json');
    copyFileSync(BUILTIN_PACK_FILE, yaml);
    copyFileSync(schemaFile('rulepack'), schema);
    copyFileSync(join(root, 'package.json'), pkg);
    const codeRoot = join(dir, 'code');
    const modules = ['rulepack/resolve-pack.ts'];
    await import('node:fs/promises').then((fs) => fs.mkdir(join(codeRoot, 'rulepack'), { recursive: true }));
    copyFileSync(join(root, 'src', 'rulepack', 'resolve-pack.ts'), join(codeRoot, modules[0]!));
    const paths = { yaml, schema, packageJson: pkg, codeRoot };
    const inputs = currentInputs(paths, modules)!;
    const compiledFile = join(dir, 'compiled.json');
    writeFileSync(compiledFile, compiledPackText(await packFromYaml(yaml), inputs));
    return { dir, paths, compiledFile };
  }

  it('is used when nothing changed, with `file` set to the YAML it stands for', async () => {
    const { paths, compiledFile } = await setUp();
    const pack = readCompiledPack(compiledFile, paths);
    expect(pack?.file).toBe(paths.yaml);
    expect(JSON.stringify(pack)).toBe(JSON.stringify(await packFromYaml(paths.yaml)));
  });

  it.each([
    ['the YAML', (p: PackInputPaths) => appendFileSync(p.yaml, '\n# an edit\n')],
    ['the schema', (p: PackInputPaths) => appendFileSync(p.schema, '\n')],
    ['package.json (version, pinned dependencies)', (p: PackInputPaths) => appendFileSync(p.packageJson, '\n')],
    ['a loader module', (p: PackInputPaths) => appendFileSync(join(p.codeRoot, 'rulepack/resolve-pack.ts'), '\n// an edit\n')],
  ])('is ignored when %s changed', async (_what, change) => {
    const { paths, compiledFile } = await setUp();
    change(paths);
    expect(readCompiledPack(compiledFile, paths)).toBeUndefined();
  });

  it('is ignored when it is not a compiled pack file, or cannot be read', async () => {
    const { dir, paths, compiledFile } = await setUp();
    writeFileSync(compiledFile, '{"format":"something-else/1"}');
    expect(readCompiledPack(compiledFile, paths)).toBeUndefined();
    writeFileSync(compiledFile, '{"format":');
    expect(readCompiledPack(compiledFile, paths)).toBeUndefined();
    expect(readCompiledPack(join(dir, 'absent.json'), paths)).toBeUndefined();
  });
});

describe('the standalone schema validators (dist/generated/<name>.validate.cjs)', () => {
  const packSamples = (): [string, unknown][] => {
    const builtin = parse(readFileSync(BUILTIN_PACK_FILE, 'utf8')) as Record<string, unknown>;
    const fixtures = ['good-house', 'schema-error', 'missing-key', 'unknown-source', 'unknown-unit', 'low-above-high', 'invalid-regex', 'duplicate-a']
      .map((name): [string, unknown] => [name, parse(readFileSync(join(root, 'test/fixtures/packs', `${name}.yaml`), 'utf8'))]);
    return [
      ['built-in pack', builtin],
      ...fixtures,
      ['no pack key', { version: '1.0.0' }],
      ['wrong types at the top', { pack: 3, version: [], as_of: 'yesterday', sources: {} }],
      ['unknown top-level key', { ...builtin, colour: 'blue' }],
      ['bad level and empty words', { ...builtin, terms: [{ id: 'x', words: [] }], patterns: [{ id: 'house.x', level: 'loud', reason: 'r', regex: 'a' }] }],
    ];
  };
  const settingsSamples: [string, unknown][] = [
    ['empty', {}],
    ['typical', { include: ['docs/**/*.md'], exclude: ['drafts/'], packs: ['house.yaml'], levels: { 'value.co2-ppm': 'error' }, fail_on: 'warning' }],
    ['wrong types', { include: 'docs', levels: { 'not a rule id': 'loud' }, fail_on: 3 }],
    ['unknown key', { colour: 'blue' }],
  ];

  const ledgerSamples: [string, unknown][] = [
    ['empty', { signoffs: null }],
    ['one sign-off', { signoffs: [{ claim: 'c0123456789', file: 'docs/a.md', text: 'CO2 rose.', decision: 'approved', reviewer: 'R. Eide', date: '2025-03-14', pack_version: '1.1.0' }] }],
    ['bad claim id and decision', { signoffs: [{ claim: 'x1', file: 'a.md', text: 't', decision: 'maybe', reviewer: 'R', date: 'soon', pack_version: '1' }] }],
    ['missing keys', { signoffs: [{ claim: 'c0123456789' }] }],
  ];

  it.each(['rulepack', 'settings', 'ledger'] as const)('%s: the generated module is what ajv generates from the schema now', (name) => {
    expect(readFileSync(join(generated, `${name}.validate.cjs`), 'utf8')).toBe(validatorModuleCode(name));
  });

  it.each([
    ['rulepack', packSamples],
    ['settings', () => settingsSamples],
    ['ledger', () => ledgerSamples],
  ] as const)('%s: the generated validator and ajv accept and refuse the same samples, with the same errors', (name, samples) => {
    const generatedValidate = require(join(generated, `${name}.validate.cjs`)) as ValidateFunction;
    const compiledNow = compileNow(name);
    let refused = 0;
    for (const [, data] of samples()) {
      const a = generatedValidate(data);
      const b = compiledNow(data);
      expect(a).toBe(b);
      expect(generatedValidate.errors ?? null).toEqual(compiledNow.errors ?? null);
      if (!a) refused += 1;
    }
    // Both kinds of sample are there: some accepted, some refused.
    expect(refused).toBeGreaterThan(0);
    expect(refused).toBeLessThan(samples().length);
  });
});
