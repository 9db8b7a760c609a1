import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { Command } from 'commander';
import { describe, expect, it } from 'vitest';
import { registerExplain } from '../../src/cli/commands/explain.js';
import { registerInit } from '../../src/cli/commands/init.js';
import { registerRefs } from '../../src/cli/commands/refs.js';
import type { CliContext } from '../../src/cli/context.js';
import { FirnlineError, FirnlineErrors } from '../../src/errors.js';

/** Runs one command in memory and returns what it printed. */
async function run(register: (p: Command, c: CliContext) => void, args: string[], cwd = mkdtempSync(join(tmpdir(), 'firnline-cli-'))) {
  let out = '';
  const ctx: CliContext = { cwd, env: {}, stdout: (t) => void (out += t), stderr: () => undefined, readStdin: async () => '', isTTY: false, exitCode: 0 };
  const program = new Command().exitOverride();
  register(program, ctx);
  await program.parseAsync(args, { from: 'user' });
  return { out, ctx, cwd };
}

describe('firnline refs', () => {
  it('lists matching values as JSON with sources that carry a DOI or URL', async () => {
    const { out } = await run(registerRefs, ['refs', 'EPICA Dome C', '--format', 'json']);
    const entries = JSON.parse(out) as { id: string; low: number; high: number; unit: string; sources: { cite: string; doi?: string }[] }[];
    const span = entries.find((e) => e.id === 'edc-record-span');
    // Jouzel et al. 2007; Lüthi et al. 2008: 790,000-810,000 years.
    expect(span).toMatchObject({ low: 790_000, high: 810_000, unit: 'yr' });
    expect(span?.sources.map((s) => s.doi)).toEqual(['10.1126/science.1141038', '10.1038/nature06949']);
  });

  it('prints text with the range and short citations', async () => {
    const { out } = await run(registerRefs, ['refs', 'vostok-record-span']);
    expect(out).toBe(
      'value.vostok-record-span\n  Time span of the continuous climate and CO2 record from the Vostok 5G ice core (Antarctica)\n  400,000–423,000 years\n' +
        '    Petit, J. R., Jouzel, J., Raynaud, D., Barkov, N. I., Barnola, J.-M., Basile, I., Bender, M., Chappellaz, J., Davis, M., Delaygue, G., Delmotte, M., Kotlyakov, V. M., Legrand, M., Lipenkov, V. Y., Lorius, C., Pépin, L., Ritz, C., Saltzman, E. & Stievenard, M. (1999) https://doi.org/10.1038/20859\n' +
        '    Petit, J.-R. et al. (1999/2001) https://paleo.ltrr.arizona.edu/json/noaa-icecore-2453.json\n',
    );
  });

  it('adds a team pack given with --pack, and stops on a broken one', async () => {
    const { out } = await run(registerRefs, ['refs', 'gallery', '--format', 'json', '--pack', resolve('test/fixtures/packs/good-house.yaml')]);
    expect((JSON.parse(out) as { id: string }[]).map((e) => e.id)).toEqual(['gallery-core-length']);
    await expect(run(registerRefs, ['refs', '--pack', resolve('test/fixtures/packs/low-above-high.yaml')])).rejects.toThrow(FirnlineErrors);
  });
});

describe('firnline explain', () => {
  it('shows a value in full with its sources', async () => {
    const { out } = await run(registerExplain, ['explain', 'value.co2-lgm']);
    expect(out).toMatch(/^value\.co2-lgm \(default level: warning\)\nChecks the atmospheric CO2 at the Last Glacial Maximum/u);
    expect(out).toContain('Accepted range: 180–200 ppm.');
    expect(out).toContain('doi: 10.1017/9781009157896.009');
  });

  it('accepts a value id without its prefix, and a reasoning check id', async () => {
    expect((await run(registerExplain, ['explain', 'co2-lgm'])).out).toMatch(/^value\.co2-lgm/u);
    expect((await run(registerExplain, ['explain', 'logic.lag-rules-out-cause'])).out).toContain('doi: 10.1038/nature10915');
  });

  it('rejects an unknown id with a one-line error', async () => {
    await expect(run(registerExplain, ['explain', 'value.moon-core-depth'])).rejects.toThrow(FirnlineError);
  });
});

describe('firnline init', () => {
  it('writes the commented starter file, and refuses to overwrite it without --force', async () => {
    const { cwd } = await run(registerInit, ['init']);
    const file = join(cwd, 'firnline.yaml');
    expect(readFileSync(file, 'utf8')).toMatch(/^# Firnline settings/u);
    writeFileSync(file, 'fail_on: note\n');
    await expect(run(registerInit, ['init'], cwd)).rejects.toThrow(/firnline\.yaml already exists/u);
    expect(readFileSync(file, 'utf8')).toBe('fail_on: note\n');
    await run(registerInit, ['init', '--force'], cwd);
    expect(readFileSync(file, 'utf8')).toMatch(/^# Firnline settings/u);
    expect(existsSync(file)).toBe(true);
  });
});
