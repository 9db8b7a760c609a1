/**
 * A figure beside a subject's name, with no word for what it measures, binds the one value its unit
 * implies (src/claims/bind-implied.ts). Sentences are our own, in several wordings; the quantities
 * come from the real parser. The reference values are the pack's, with its sources:
 * EPICA Dome C drilled to about 3,260-3,270 m (Lüthi et al. 2008, Nature 453, 379-382; Bouchet et
 * al. 2023) and a record of about 800,000 years (Jouzel et al. 2007, Science 317, 793-796); EDML
 * drilled to 2,774 m (Wilhelms et al. 2014, Annals of Glaciology); Dome Fuji's record about 720,000
 * years (Kawamura et al. 2017, Science Advances 3, e1600446); GRIP drilled to about 3,029 m with a
 * record of about 250,000 years (Dansgaard et al. 1993, Nature 364, 218-220); the Beyond EPICA core
 * drilled to about 2,800 m (Beyond EPICA consortium 2025 release); the Holocene about 11,700 years
 * long (Walker et al. 2009, Journal of Quaternary Science 24, 3-17); Vostok drilled to 3,623 m
 * (Petit et al. 1999, Nature 399, 429-436) and its borehole to the lake at about 3,769 m (Jouzel et
 * al. 1999, Science 286, 2138-2141).
 * Look-alikes that must stay unbound: the Concordia station at Dome C stands about 3,233 m above sea
 * level and Vostok lies some 560 km from Dome C (both from memory; the tests assert only that these
 * figures bind nothing).
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { FirnlineErrors } from '../../src/errors.js';
import { checkText } from '../../src/index.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';
import { TARN_PACK_HEAD } from './fixtures/tarn-pack.js';

const packs = await loadPacks([]);

/** Per quantity of `sentence`, the value it binds, '?' when ambiguous, '-' when none. */
function bound(sentence: string, with_: LoadedPacks = packs): string[] {
  const quantities = parseQuantities(sentence);
  const { bindings, ambiguous } = bindQuantities(sentence, quantities, with_);
  return quantities.map((_, i) => bindings.find((b) => b.quantityIndex === i)?.referenceId ?? (ambiguous.includes(i) ? '?' : '-'));
}

const IMPLIED: [sentence: string, expected: string[]][] = [
  // A core and a length: its drilled depth.
  ['EPICA Dome C reached 3,623 metres.', ['edc-drilled-depth']],
  ['In the end EPICA Dome C got to about 3,270 m.', ['edc-drilled-depth']],
  ['The EDML core: 2,774 m.', ['edml-drilled-depth']],
  ['At EDML, the team hit 2,100 m.', ['edml-drilled-depth']],
  ['GRIP made it to 3,029 m before the drill was pulled.', ['grip-depth-and-span']],
  // The rank value needs "deepest" (`implied: false`), so Beyond EPICA's own depth is the one reading.
  ['Beyond EPICA: 2,800 m.', ['beyond-epica-drilled-depth']],
  // A core and a span of years: its record's span.
  ['Dome Fuji gives us some 720,000 years.', ['dome-fuji-record-span']],
  ['Vostok is like 800k years, I think.', ['vostok-record-span']],
  ['GRIP offers about 250,000 years.', ['grip-record-span']],
  // The delta-age needs "delta-age", which the record span vetoes: it is the marked reading and yields.
  ['EPICA Dome C alone gives about 400,000 years.', ['edc-record-span']],
  // Another core named past a clause break after the number speaks of that clause.
  ['Dome Fuji comes in at about 420,000 years, with Vostok a little way behind.', ['dome-fuji-record-span']],
  // A period and a span of years: how long it has lasted.
  ['The Holocene: roughly 9,000 years so far, give or take.', ['holocene-duration']],
  ['People have farmed through the Holocene for roughly 30,000 years.', ['holocene-duration']],
];

const UNBOUND: [sentence: string, expected: string[]][] = [
  // Another measure of the same dimension named in words (lexicon `other-measures`).
  ['Dome C sits 3,233 m above sea level.', ['-']],
  ['Dome C sits at an elevation of 3,233 m.', ['-']],
  ['The GRIP site is 3,230 m high.', ['-']],
  ['Dome Fuji is 1,000 km inland.', ['-']],
  ['The Dome Fuji team spent 12 years on it.', ['-']],
  // Two cores named: which one's depth?
  ['Vostok lies 560 km from Dome C.', ['-']],
  ['Vostok and Dome C are about 560 km apart.', ['-']],
  ['EPICA Dome C and Vostok both reach about 3,000 m.', ['-']],
  ['Dome Fuji trails Vostok by about 300,000 years.', ['-']],
  // Another attribute of the dimension that a value of the pack needs ("thick": the ice thickness).
  ["EPICA Dome C's ice is 3,200 m thick.", ['-']],
  // Off the value's scale by more than ten times: the years of a drilling, not of the record.
  ['Dome Fuji was drilled over ten years.', ['-']],
  // A date beside a period says when something happened in it, not when the period began.
  ['About 12,900 years ago, just as the thaw seemed well under way, the north turned cold again.', ['-']],
  // A stretch of the core holds the years, not the core.
  ['The lowest 200-odd metres of Dome C hold about 150,000 years.', ['-', '-']],
  // The period is named after the figure, in a clause of its own: no subject of the figure.
  ['That cold snap dragged on for some three thousand years before the climate tipped into the mild Holocene.', ['-']],
  // Vostok's drilled depth (3,623 m) and its borehole to the lake (about 3,769 m) both fit: nothing binds.
  ['Vostok goes down about 3,700 m.', ['-']],
  // The gas alone: a dozen levels fit a figure in ppm.
  ['CO2 stood at 185 ppm.', ['-']],
];

describe('an attribute implied by the subject and the unit', () => {
  it.each(IMPLIED)('%s', (sentence, expected) => expect(bound(sentence)).toEqual(expected));
  it.each(UNBOUND)('stays unbound: %s', (sentence, expected) => expect(bound(sentence)).toEqual(expected));

  it('a full match elsewhere wins: the words that name the measure decide', () => {
    // "drilled" names the depth; the figure binds it in its own words, as before.
    expect(bound('EPICA Dome C was drilled until it reached 3,623 metres.')).toEqual(['edc-drilled-depth']);
    expect(bound('Vostok delivers roughly 420,000 years of climate.')).toEqual(['vostok-record-span']);
  });

  it('flags a wrong depth and a wrong span with the reference in the correction, and passes right ones', async () => {
    const wrong = await checkText('EPICA Dome C reached 3,623 metres.\n\nDome Fuji gives us some 420,000 years.\n');
    expect(wrong.flags.map((f) => [f.ruleId, f.excerpt])).toEqual([
      ['value.edc-drilled-depth', '3,623 metres'],
      ['value.dome-fuji-record-span', 'some 420,000 years'],
    ]);
    expect(wrong.flags[0]?.correction).toMatch(/3,2[67]0/u);
    expect(wrong.flags[1]?.correction).toMatch(/720,000/u);
    const right = await checkText('EPICA Dome C reached about 3,270 metres.\n\nDome Fuji gives us some 720,000 years.\n');
    expect(right.flags).toEqual([]);
  });

  it('leaves the look-alikes unflagged in a whole check', async () => {
    const result = await checkText('Dome C sits 3,233 m above sea level. Vostok lies 560 km from Dome C.\n');
    expect(result.flags).toEqual([]);
  });
});

const dir = mkdtempSync(join(tmpdir(), 'firnline-implied-'));

/** A team pack (an invented museum's meltwater tank) whose one value has the given `implied` line. */
function tankPack(name: string, implied: string, lexicon: string[] = []): string {
  const file = join(dir, `${name}.yaml`);
  writeFileSync(
    file,
    [
      ...TARN_PACK_HEAD,
      '  - id: peak',
      '    words: [peak]',
      'reference_values:',
      '  - id: tank-peak',
      '    measures: Peak CO2 in the demo tank during one show',
      '    low: 440',
      '    high: 460',
      '    unit: ppm',
      '    binds_when:',
      '      all: [[tank], [peak]]',
      `      ${implied}`,
      '    correction: about 450 ppm',
      '    sources: [tarn-notes]',
      'lexicon:',
      '  subjects: [tank]',
      '  entities:',
      '    tank: [demo tank]',
      ...lexicon,
      '',
    ].join('\n'),
  );
  return file;
}

describe('binds_when.implied', () => {
  const sentence = 'The demo tank got to 520 ppm.';

  it('by default a figure beside the subject alone binds the one value its unit fits', async () => {
    const team = await loadPacks([tankPack('default', '# implied left to the default')], { builtin: false });
    expect(team.reference('tank-peak')?.binding.implied).toBeUndefined();
    expect(bound(sentence, team)).toEqual(['tank-peak']);
  });

  it('`implied: false` keeps the value to sentences that name what it measures', async () => {
    const team = await loadPacks([tankPack('never', 'implied: false')], { builtin: false });
    expect(team.reference('tank-peak')?.binding.implied).toBe(false);
    expect(bound(sentence, team)).toEqual(['-']);
    expect(bound('The demo tank peak was 520 ppm.', team)).toEqual(['tank-peak']);
  });

  it('rejects a value other than true or false with file:line:column', async () => {
    const file = tankPack('wrong', 'implied: sometimes');
    const lines = await loadPacks([file], { builtin: false }).then(
      () => [],
      (error: unknown) => (error instanceof FirnlineErrors ? error.errors.map((e) => e.toLine()) : [String(error)]),
    );
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(new RegExp(`^${file.replace(/[.*+?^${}()|[\]\\]/gu, '\\$&')}:22:\\d+: .*implied`, 'u'));
  });

  it('rejects an `other-measures` key that is no dimension with file:line:column', async () => {
    const file = tankPack('misspelt', '# implied left to the default', ['  other-measures:', '    lenght: [elevation]']);
    const lines = await loadPacks([file], { builtin: false }).then(
      () => [],
      (error: unknown) => (error instanceof FirnlineErrors ? error.errors.map((e) => e.toLine()) : [String(error)]),
    );
    expect(lines).toEqual([`${file}:30:5: \`other-measures\` must be one of: duration, age, concentration, temperature-change, temperature, length, concentration-rate, temperature-rate, length-rate, duration-per-length, count, ratio, percent, number`]);
  });

  it("an `other-measures` word of the figure's dimension stops the implied reading", async () => {
    const team = await loadPacks([tankPack('other', '# implied left to the default', ['  other-measures:', '    concentration: [outside air]'])], { builtin: false });
    expect(bound('The demo tank got to 520 ppm.', team)).toEqual(['tank-peak']);
    expect(bound('The demo tank got to 520 ppm in the outside air.', team)).toEqual(['-']);
  });
});
