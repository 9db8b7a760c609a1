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
    // Petit et al. 1999, Nature 399, 429-436; NOAA NCEI study 2453 (the Vostok data).
    expect(out).toBe(
      'value.vostok-record-span\n  Time span of the continuous climate and CO2 record from the Vostok 5G ice core (Antarctica)\n  400,000–423,000 years\n' +
        '    Petit et al. 1999, Nature 399, doi:10.1038/20859 (value and DOI from memory)\n' +
        '    Petit et al. 2001, IGBP PAGES/World Data Center for Paleoclimatology Data Contribution Series, https://www.ncei.noaa.gov/access/paleo-search/study/2453 (author, number, URL from memory)\n',
    );
  });

  it('lists at least 120 values as JSON, each with its range in words and its sources in short and full form', async () => {
    const { out } = await run(registerRefs, ['refs', '--format', 'json']);
    const entries = JSON.parse(out) as { id: string; range: string; sources: { short: string; cite: string; csl?: { type: string } }[] }[];
    expect(entries.length).toBeGreaterThanOrEqual(120);
    const span = entries.find((e) => e.id === 'edc-record-span');
    expect(span?.range).toBe('790,000–810,000 years');
    // Jouzel et al. 2007, Science 317, 793-796 (doi 10.1126/science.1141038).
    expect(span?.sources[0]?.short).toMatch(/^Jouzel et al\. 2007, Science 317, doi:10\.1126\/science\.1141038/u);
    expect(span?.sources[0]?.cite).toMatch(/^Jouzel, J\., Masson-Delmotte, V\., .*\(2007\)\. Orbital/u);
    expect(span?.sources[0]?.csl?.type).toBe('article-journal');
  });

  it('lists the values past their review date on a given day, and exits 1 when there are any', async () => {
    const early = await run(registerRefs, ['refs', '--due', '--today', '2025-11-01']);
    expect(early.out).toBe('No reference value is past its review date (today: 2025-11-01).\n');
    expect(early.ctx.exitCode).toBe(0);
    const later = await run(registerRefs, ['refs', '--due', '--today', '2026-07-01']);
    expect(later.out).toMatch(/^\d+ reference values are past the review date \(today: 2026-07-01\)/u);
    expect(later.out).toContain('value.co2-present-day: review by 2026-06-30 (as of 2025-10-15)');
    expect(later.out).not.toContain('value.allan-hills-oldest-ice');
    expect(later.ctx.exitCode).toBe(1);
    await expect(run(registerRefs, ['refs', '--due', '--today', '2026-13-45'])).rejects.toThrow(/--today takes a date as YYYY-MM-DD/u);
  });

  it('exports the cited sources as BibTeX', async () => {
    const { out } = await run(registerRefs, ['refs', 'edc-record-span', '--format', 'bibtex']);
    // BibTeX entry shape: @type{key, field = {value}, ...} (BibTeX documentation, common practice).
    expect(out).toMatch(/@article\{Jouzel2007\w*,/u);
    expect(out).toContain('doi = {10.1126/science.1141038}');
    expect(out).toContain('volume = {317}');
    expect((out.match(/^@/gmu) ?? []).length).toBe(3);
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
    // The full reference: every author and the chapter of the assessment (IPCC AR6 WGI ch. 7, Forster et al. 2021).
    expect(out).toContain('  - Forster, P., Storelvmo, T., Armour, K.');
    expect(out).toContain('In: Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, Chapter 7, Cambridge University Press, 923–1054. https://doi.org/10.1017/9781009157896.009');
    expect(out).toContain('    kind: assessment\n');
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
