/**
 * The `binds_when.role` key of a rule pack: loaded as the role a value accepts (`any` and a missing
 * key both accept every role), and a wrong word stops the run with file:line:column.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { FirnlineErrors } from '../../src/errors.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { quantitiesIn } from './quantity-at.js';
import { TARN_PACK_HEAD } from './fixtures/tarn-pack.js';

const dir = mkdtempSync(join(tmpdir(), 'firnline-role-'));

/** A one-value team pack (an invented museum's tank of meltwater CO2) with the given role line. */
function pack(name: string, role: string): string {
  const file = join(dir, `${name}.yaml`);
  writeFileSync(
    file,
    [
      ...TARN_PACK_HEAD,
      'reference_values:',
      '  - id: tank-rise',
      '    measures: Rise of CO2 in the demo tank during one show',
      '    low: 40',
      '    high: 60',
      '    unit: ppm',
      '    binds_when:',
      `      ${role}`,
      '      all: [[tank]]',
      '    correction: about 50 ppm',
      '    sources: [tarn-notes]',
      '',
    ].join('\n'),
  );
  return file;
}

describe('binds_when.role', () => {
  it('loads `change` as the only role the value binds', async () => {
    const packs = await loadPacks([pack('change', 'role: change')], { builtin: false });
    expect(packs.reference('tank-rise')?.binding.role).toBe('change');
    const s = 'In the demo tank CO2 rose by 50 ppm, from 400 ppm to 450 ppm.';
    const quantities = quantitiesIn(s, [['50 ppm', 'concentration'], ['400 ppm', 'concentration'], ['450 ppm', 'concentration']]);
    expect(bindQuantities(s, quantities, packs).bindings).toEqual([{ quantityIndex: 0, referenceId: 'tank-rise' }]);
  });

  it('reads `any` as no restriction', async () => {
    const packs = await loadPacks([pack('any', 'role: any')], { builtin: false });
    expect(packs.reference('tank-rise')?.binding).toEqual({ all: [['tank']], none: [] });
  });

  it('rejects another word with file:line:column', async () => {
    const file = pack('wrong', 'role: sideways');
    const lines = await loadPacks([file], { builtin: false }).then(
      () => [],
      (error: unknown) => (error instanceof FirnlineErrors ? error.errors.map((e) => e.toLine()) : [String(error)]),
    );
    expect(lines).toEqual([`${file}:19:13: \`role\` must be one of: level, change, range, any`]);
  });
});
