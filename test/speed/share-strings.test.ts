import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { shareStrings } from '../../src/speed/run-files.js';

const packs = await loadPacks([]);

describe('shareStrings: one string per content in an outcome copied from a worker', () => {
  it('leaves every claim and flag equal to what it was', async () => {
    // Figures from memory, written wrong on purpose so that the draft has flags: the EPICA Dome C
    // record spans about 800,000 years, and CO2 stood near 280 ppm before industry.
    const text = [
      '# The ice cores',
      '',
      'The EPICA Dome C core covers about 420,000 years of climate. Before industry, CO2 stood near 380 ppm.',
      '',
      'During the last glacial maximum CO2 fell to about 180 ppm, some 100 ppm below its pre-industrial level.',
    ].join('\n');
    const result = await checkText(text, { path: 'draft.md', packs });
    expect(result.flags.length).toBeGreaterThan(0);
    const copied = structuredClone({ claims: result.claims, flags: result.flags });
    const strings = new Map<string, string>();
    for (const claim of copied.claims) shareStrings(claim, strings, 'flags');
    for (const flag of copied.flags) shareStrings(flag, strings, 'sources');
    expect(copied).toEqual({ claims: result.claims, flags: result.flags });
    // Every sentence a flag names is the text of its claim: one string met twice.
    expect(strings.has(copied.flags[0]?.sentence ?? '')).toBe(true);
  });

  it('walks nested members and arrays, and not the member it is told to skip', () => {
    const strings = new Map<string, string>();
    const skipped = { note: 'kept as it is' };
    const value = { a: 'same', list: ['same', { b: 'other' }], skip: skipped };
    shareStrings(value, strings, 'skip');
    expect(value).toEqual({ a: 'same', list: ['same', { b: 'other' }], skip: { note: 'kept as it is' } });
    expect([...strings.keys()].sort()).toEqual(['other', 'same']);
  });
});

describe('shareStrings on frozen data', () => {
  it('leaves a frozen object as it is and walks on below it', () => {
    const strings = new Map<string, string>([['unit', 'unit']]);
    const inner = { unit: 'unit' };
    const frozen = Object.freeze({ unit: 'unit', inner });
    expect(() => shareStrings({ frozen }, strings)).not.toThrow();
    expect(frozen).toEqual({ unit: 'unit', inner: { unit: 'unit' } });
  });
});
