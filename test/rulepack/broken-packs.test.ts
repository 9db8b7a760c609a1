import { describe, expect, it } from 'vitest';
import { FirnlineErrors } from '../../src/errors.js';
import { loadPacks } from '../../src/rulepack/index.js';

const dir = 'test/fixtures/packs';

/** The lines a user sees for a set of pack files (built-in pack left out). */
async function errorLines(files: string[]): Promise<string[]> {
  try {
    await loadPacks(files.map((f) => `${dir}/${f}`), { builtin: false });
  } catch (error) {
    if (error instanceof FirnlineErrors) return error.errors.map((e) => e.toLine());
    throw error;
  }
  return [];
}

// One fixture per kind of mistake; positions are 1-based line:column of the offending node.
const CASES: [string, string[], string[]][] = [
  // The yaml package reports an unclosed quote where the file ends (line 7, column 1).
  ['YAML syntax (unclosed quote)', ['yaml-syntax.yaml'], [
    `${dir}/yaml-syntax.yaml:7:1: YAML syntax: Missing closing "quote`,
  ]],
  ['schema: wrong type and an unknown key', ['schema-error.yaml'], [
    `${dir}/schema-error.yaml:6:12: \`words\` must be an array`,
    `${dir}/schema-error.yaml:7:5: unknown key \`colour\`; see docs/rule-packs.md for the keys`,
  ]],
  ['missing required key', ['missing-key.yaml'], [
    `${dir}/missing-key.yaml:13:5: missing required key \`binds_when\``,
  ]],
  ['duplicate id across two packs', ['duplicate-a.yaml', 'duplicate-b.yaml'], [
    `${dir}/duplicate-b.yaml:7:9: id \`firn\` is already defined in pack \`house-a\`; ids must be unique across packs`,
  ]],
  ['unknown source id', ['unknown-source.yaml'], [
    `${dir}/unknown-source.yaml:11:15: unknown source id \`house-notes\`; add it under \`sources\``,
  ]],
  ['unknown unit', ['unknown-unit.yaml'], [
    expect.stringMatching(new RegExp(`^${dir}/unknown-unit\\.yaml:17:11: unknown unit \`fathoms\`; use one of: yr, years, kyr`)) as unknown as string,
  ]],
  ['interval with low > high', ['low-above-high.yaml'], [
    `${dir}/low-above-high.yaml:15:10: low (120) is greater than high (50); swap them`,
  ]],
  // `ends` of a span: an unknown value, an end in another dimension, a span given as an end.
  ['ends of a span', ['span-ends-broken.yaml'], [
    `${dir}/span-ends-broken.yaml:29:19: unknown reference value id \`no-such-value\`; ends names the values at the low end of this span`,
    `${dir}/span-ends-broken.yaml:29:41: \`broken-depth\` is stated in m and this span in ppm; an end must measure the same dimension`,
    `${dir}/span-ends-broken.yaml:38:18: \`broken-range\` is a span itself; an end of a span is a value with no \`ends\``,
    `${dir}/span-ends-broken.yaml:38:39: \`broken-range-2\` is a span itself; an end of a span is a value with no \`ends\``,
  ]],
  ['invalid regular expression', ['invalid-regex.yaml'], [
    `${dir}/invalid-regex.yaml:8:12: invalid regular expression: /\\bppmv(\\b/iu: Unterminated group`,
  ]],
];

describe('a broken pack stops the run with file:line:column for each mistake', () => {
  it.each(CASES)('%s', async (_name, files, expected) => {
    expect(await errorLines(files)).toEqual(expected);
  });

  it('loads nothing from a half-broken set: a good pack beside a broken one still fails', async () => {
    await expect(loadPacks([`${dir}/good-house.yaml`, `${dir}/low-above-high.yaml`], { builtin: false })).rejects.toBeInstanceOf(FirnlineErrors);
  });

  it('loads a span whose ends are a value of its own and built-in values, one id or a list', async () => {
    const packs = await loadPacks([`${dir}/span-ends.yaml`]);
    expect(packs.reference('gallery-range')).toMatchObject({
      binding: { all: [['gallery-span']], none: [], role: 'range' },
      ends: { low: ['gallery-low'], high: ['co2-interglacial-maximum-typical', 'co2-highest-preindustrial-800kyr'] },
    });
  });

  it('loads a correct team pack beside the built-in one, citing its own sources', async () => {
    const packs = await loadPacks([`${dir}/good-house.yaml`]);
    expect(packs.packs.map((p) => p.id)).toEqual(['paleoclimate', 'lakeside-house']);
    expect(packs.reference('gallery-core-length')).toMatchObject({ low: 2, high: 2.5, unit: 'm', dimension: 'length' });
    expect(packs.patterns.map((p) => p.id)).toEqual(['house.no-ppmv']);
    expect(packs.topicWords).toContain('gallery core');
  });
});
