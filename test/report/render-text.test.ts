import chalk from 'chalk';
import { describe, expect, it } from 'vitest';
import type { ReportOptions } from '../../src/report/report-options.js';
import { renderText } from '../../src/report/render-text.js';
import { EMPTY_RESULT, ICE_AGE_RESULT } from './fixtures/ice-age-result.js';

const OPTIONS: ReportOptions = { color: false, toolVersion: '0.1.0', failOn: 'error' };
// SGR escape sequences (ECMA-48 "CSI ... m"), the only kind chalk writes.
// eslint-disable-next-line no-control-regex -- ANSI escapes begin with ESC (ECMA-48)
const ANSI = /\u001b\[[0-9;]*m/g;
const stripAnsi = (text: string): string => text.replace(ANSI, '');

describe('text report', () => {
  const plain = renderText(ICE_AGE_RESULT, OPTIONS);

  it('matches the golden report for the sample run', async () => {
    await expect(plain).toMatchFileSnapshot('./__snapshots__/ice-age-result.txt');
  });

  it('writes one block per flag, in place order, each headed by path:line:column, level and rule id', () => {
    const heads = plain.split('\n\n').map((block) => block.split('\n')[0]);
    expect(heads.slice(0, 3)).toEqual([
      'drafts/glacial-co2.md:5:55 · note · value.deglacial-co2-rise',
      'drafts/ice-ages.md:3:88 · error · value.edc-record-span',
      'drafts/ice-ages.md:5:99 · warning · logic.lag-rules-out-cause',
    ]);
  });

  it('ends with the skipped files and one summary line', () => {
    expect(plain.endsWith(
      'Skipped drafts/staff-picnic.md: no topic term.\n' +
        'Checked 2 files: 4 claims found, 3 flags (1 error, 1 warning, 1 note), 1 file skipped.\n',
    )).toBe(true);
  });

  it('has no escape codes when colour is off', () => {
    expect(plain).not.toContain('\u001b');
  });

  it('colours only when asked, and the colours hide nothing: stripped, it is the plain report', () => {
    const coloured = renderText(ICE_AGE_RESULT, { ...OPTIONS, color: true });
    expect(coloured).toMatch(ANSI);
    expect(coloured).toContain('\u001b[31m'); // red for error (ECMA-48 SGR 31)
    expect(stripAnsi(coloured)).toBe(plain);
  });

  it('leaves the shared chalk instance as it found it', () => {
    const before = chalk.level;
    renderText(ICE_AGE_RESULT, { ...OPTIONS, color: true });
    renderText(ICE_AGE_RESULT, OPTIONS);
    expect(chalk.level).toBe(before);
  });

  it('says so when nothing was flagged', () => {
    expect(renderText(EMPTY_RESULT, OPTIONS)).toBe(
      'No flags.\nChecked 1 file: 0 claims found, 0 flags (0 errors, 0 warnings, 0 notes), 0 files skipped.\n',
    );
  });
});

describe('citations in the text report', () => {
  it('keep every line a citation adds within 200 characters, however long the author list', async () => {
    const { checkText } = await import('../../src/engine.js');
    // Claims that draw the longest author lists of the built-in pack: Buizert et al. 2021 (40 authors),
    // Jouzel et al. 2007 (32), Clark et al. 2012 (31). Every value here is wrong on purpose (invented text).
    const draft = [
      'East Antarctica was 20 °C colder at the Last Glacial Maximum.',
      'The EPICA Dome C record reaches back 400,000 years.',
      'Over the deglaciation sea level rose 10 metres.',
      'The IPCC finds the world was 2 °C colder at the Last Glacial Maximum.',
    ].join('\n\n');
    const result = await checkText(draft, { path: 'draft.md' });
    expect(result.flags.length).toBeGreaterThanOrEqual(4);
    const text = renderText(result, OPTIONS);
    const cited = result.flags.flatMap((f) => f.sources.map((s) => s.short ?? s.id));
    expect(cited).toEqual(expect.arrayContaining(['Buizert et al. 2021, Science 372, doi:10.1126/science.abd2897', 'Clark et al. 2012, Proceedings of the National Academy of Sciences 109, doi:10.1073/pnas.1116619109']));
    const citationLines = text.split('\n').filter((line) => cited.some((c) => line.includes(c)));
    expect(citationLines.length).toBe(new Set(cited).size);
    expect(citationLines.filter((line) => [...line].length > 200)).toEqual([]);
  });

  it('states the packs and their as-of dates under the summary', async () => {
    const { checkText } = await import('../../src/engine.js');
    const result = await checkText('The EPICA Dome C record reaches back 400,000 years.', { path: 'draft.md' });
    expect(renderText(result, OPTIONS)).toMatch(/\nReference packs: paleoclimate \d+\.\d+\.\d+ \(values as of \d{4}-\d{2}-\d{2}\)\. Values carry uncertainty and dates; an expert reviews every flag\.\n$/u);
  });
});
