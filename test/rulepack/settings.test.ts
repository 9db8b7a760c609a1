import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { FirnlineErrors } from '../../src/errors.js';
import { findSettingsFile, loadSettings, starterSettings } from '../../src/rulepack/index.js';

function repo(settings: string): string {
  const root = mkdtempSync(join(tmpdir(), 'firnline-settings-'));
  writeFileSync(join(root, 'firnline.yaml'), settings);
  mkdirSync(join(root, 'drafts', 'winter'), { recursive: true });
  return root;
}

describe('firnline.yaml', () => {
  it('is found by walking up from a nested folder', () => {
    const root = repo('fail_on: warning\n');
    expect(findSettingsFile(join(root, 'drafts', 'winter'))).toBe(join(root, 'firnline.yaml'));
  });

  it('resolves packs and the ledger relative to the settings file', async () => {
    const root = repo('packs: [rules/house.yaml]\nledger: review/signoffs.yaml\nlevels: { value.co2-lgm: error, logic.lag-rules-out-cause: off }\nfail_on: note\n');
    expect(await loadSettings(join(root, 'firnline.yaml'))).toEqual({
      file: join(root, 'firnline.yaml'),
      include: [],
      exclude: [],
      packs: [join(root, 'rules', 'house.yaml')],
      levels: { 'value.co2-lgm': 'error', 'logic.lag-rules-out-cause': 'off' },
      failOn: 'note',
      ledger: join(root, 'review', 'signoffs.yaml'),
      // Where each levels key stands (line 3, inside the flow mapping), for errors found once the packs are loaded.
      levelPlaces: { 'value.co2-lgm': { line: 3, column: 11 }, 'logic.lag-rules-out-cause': { line: 3, column: 33 } },
    });
  });

  it('reports every mistake with line and column', async () => {
    const root = repo('include: ["**/*.md"]\nfail_on: sometimes\nlevels:\n  value.co2-lgm: loud\ncolour: blue\n');
    const lines = await loadSettings(join(root, 'firnline.yaml')).then(
      () => [],
      (e: unknown) => (e as FirnlineErrors).errors.map((x) => x.toLine().slice(root.length + 1)),
    );
    expect(lines).toEqual([
      'firnline.yaml:2:10: `fail_on` must be one of: error, warning, note, never, strict',
      'firnline.yaml:4:18: `value.co2-lgm` must be one of: error, warning, note, off',
      'firnline.yaml:5:1: unknown key `colour`; see docs/rule-packs.md for the keys',
    ]);
  });

  it('starter file written by init is valid settings', async () => {
    const root = repo(starterSettings());
    const settings = await loadSettings(join(root, 'firnline.yaml'));
    expect(settings).toMatchObject({ include: ['**/*.md', '**/*.txt'], failOn: 'error', packs: [] });
    expect(starterSettings()).toMatch(/^# /u);
  });
});
