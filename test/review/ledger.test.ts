import { mkdtemp, readFile, writeFile, readdir } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { execFile } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { describe, expect, it } from 'vitest';
import { FirnlineError } from '../../src/errors.js';
import { appendSignoffs, appendToLedgerText } from '../../src/review/append-signoffs.js';
import { readLedger } from '../../src/review/read-ledger.js';
import type { SignoffEntry } from '../../src/review/signoff-entry.js';

const run = promisify(execFile);
const here = (name: string) => fileURLToPath(new URL(name, import.meta.url));

// Invented sign-offs for an invented museum newsletter (demo data, not facts under test).
const entry = (n: number, extra: Partial<SignoffEntry> = {}): SignoffEntry => ({
  claim: `c${String(n).padStart(10, '0')}`,
  file: 'drafts/winter-gallery.md',
  text: `Panel ${n}: the Dome C core reaches back about 800,000 years.`,
  decision: 'approved',
  reviewer: 'R. Okafor',
  date: '2025-02-11T10:00:00Z',
  packVersion: 'paleoclimate 1.0.0',
  ...extra,
});

async function tempLedger(text?: string): Promise<string> {
  const dir = await mkdtemp(join(tmpdir(), 'firnline-ledger-'));
  const file = join(dir, 'firnline-signoffs.yaml');
  if (text !== undefined) await writeFile(file, text);
  return file;
}

describe('readLedger', () => {
  it('reads a missing ledger as empty: nobody has signed off yet', async () => {
    const file = await tempLedger();
    expect(await readLedger(file)).toEqual({ file, signoffs: [] });
  });

  it('maps YAML keys to entries and ignores keys it does not know', async () => {
    const file = await tempLedger(
      'signoffs:\n  - claim: c0123456789\n    file: a.md\n    text: T\n    decision: waived\n    reason: quoted to answer it\n' +
        '    reviewer: J. Berg\n    date: 2025-03-14\n    pack_version: paleoclimate 1.0.0\n    ticket: NEWS-12\n',
    );
    expect((await readLedger(file)).signoffs).toEqual([
      { claim: 'c0123456789', file: 'a.md', text: 'T', decision: 'waived', reason: 'quoted to answer it', reviewer: 'J. Berg', date: '2025-03-14', packVersion: 'paleoclimate 1.0.0' },
    ]);
  });

  it.each([
    ['broken YAML', 'signoffs:\n  - claim: [c0123456789\n', 'yaml-syntax', 3, 1],
    ['an unknown decision', 'signoffs:\n  - claim: c0123456789\n    file: a.md\n    text: T\n    decision: ok\n    reviewer: J\n    date: 2025-03-14\n    pack_version: p 1\n', 'ledger-schema', 5, 15],
    ['a waiver without a reason', 'signoffs:\n  - claim: c0123456789\n    file: a.md\n    text: T\n    decision: waived\n    reviewer: J\n    date: 2025-03-14\n    pack_version: p 1\n', 'ledger-schema', 2, 5],
    ['a date that is not ISO 8601', 'signoffs:\n  - claim: c0123456789\n    file: a.md\n    text: T\n    decision: approved\n    reviewer: J\n    date: 14/03/2025\n    pack_version: p 1\n', 'ledger-schema', 7, 11],
  ])('rejects %s with one line at file:line:column', async (_name, text, code, line, column) => {
    const file = await tempLedger(text);
    const error = await readLedger(file).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(FirnlineError);
    expect((error as FirnlineError).code).toBe(code);
    expect((error as FirnlineError).where).toEqual({ file, line, column });
    expect((error as FirnlineError).toLine()).not.toContain('\n');
  });
});

describe('appendToLedgerText', () => {
  it('starts a new ledger with a header and a signoffs list', () => {
    const text = appendToLedgerText('', [entry(1)]);
    expect(text).toBe(
      '# Firnline sign-off ledger: one entry per expert decision on a claim, oldest first.\n' +
        '# Add entries with `firnline signoff`; leave earlier entries as they are. Format: docs/sign-off.md\n\n' +
        'signoffs:\n  - claim: c0000000001\n    file: drafts/winter-gallery.md\n' +
        '    text: "Panel 1: the Dome C core reaches back about 800,000 years."\n    decision: approved\n' +
        '    reviewer: R. Okafor\n    date: 2025-02-11T10:00:00Z\n    pack_version: paleoclimate 1.0.0\n',
    );
  });

  it('keeps every earlier byte (comments, odd quoting, unknown keys) and only adds lines at the end', () => {
    const before =
      '# our ledger\nproject: winter gallery   # kept\nsignoffs:\n- claim: c0000000001  # first one\n  ticket: NEWS-12\n' +
      "  text: 'Panel 1'\n  file: a.md\n  decision: approved\n  reviewer: R. Okafor\n  date: 2025-02-11\n  pack_version: p 1\n";
    const after = appendToLedgerText(before, [entry(2)]);
    expect(after.startsWith(before)).toBe(true);
    // The new entry follows the list's own indentation (items at column 0 here).
    expect(after.slice(before.length).split('\n')[0]).toBe('- claim: c0000000002');
  });

  it('keeps a flow list as a flow list when signoffs is not the last key, with comments and unknown keys as typed', () => {
    const before = 'signoffs: []\n# settings below\nproject: winter gallery\n';
    const after = appendToLedgerText(before, [entry(3)]);
    expect(after).toMatch(/^signoffs: \[\{ claim: c0000000003, [^\n]*\}\]\n# settings below\nproject: winter gallery\n$/u);
  });

  it('falls back to the Document API for a layout a text edit cannot serve, keeping comments and unknown keys', () => {
    // A comment just before the closing bracket would swallow an inserted entry.
    const before = 'signoffs: [ # none yet\n]\n# settings below\nproject: winter gallery\n';
    const after = appendToLedgerText(before, [entry(3)]);
    expect(after).toContain('# settings below\nproject: winter gallery');
    expect(after).toContain('  - claim: c0000000003\n');
  });
});

describe('appendSignoffs', () => {
  it('creates the ledger, then appends without touching earlier entries', async () => {
    const file = await tempLedger();
    await appendSignoffs(file, [entry(1)]);
    const first = await readFile(file, 'utf8');
    await appendSignoffs(file, [entry(2), entry(3, { decision: 'corrected', reason: 'now says 800,000' })]);
    const second = await readFile(file, 'utf8');
    expect(second.startsWith(first)).toBe(true);
    expect((await readLedger(file)).signoffs.map((e) => e.claim)).toEqual(['c0000000001', 'c0000000002', 'c0000000003']);
  });

  it('loses no entry when 25 writers append at once, and leaves no lock or temporary file behind', async () => {
    const file = await tempLedger();
    await Promise.all(Array.from({ length: 25 }, (_, i) => appendSignoffs(file, [entry(i + 1)])));
    const claims = (await readLedger(file)).signoffs.map((e) => e.claim).sort();
    expect(claims).toEqual(Array.from({ length: 25 }, (_, i) => entry(i + 1).claim));
    expect(await readdir(join(file, '..'))).toEqual(['firnline-signoffs.yaml']);
  });

  it('loses no entry when two processes append 15 entries each, one call at a time', async () => {
    const file = await tempLedger();
    const child = (prefix: string) =>
      run(process.execPath, ['--import', here('./ts-register.mjs'), here('./append-child.mjs'), file, prefix, '15']);
    await Promise.all([child('a'), child('b')]);
    const claims = (await readLedger(file)).signoffs.map((e) => e.claim);
    expect(claims).toHaveLength(30);
    // Each writer's own entries stay in the order it wrote them.
    expect(claims.filter((c) => c.startsWith('ca'))).toEqual(Array.from({ length: 15 }, (_, i) => `ca${String(i + 1).padStart(9, '0')}`));
  }, 60_000);

  it('refuses to write into a broken ledger', async () => {
    const file = await tempLedger('signoffs: [\n');
    await expect(appendSignoffs(file, [entry(1)])).rejects.toBeInstanceOf(FirnlineError);
    expect(await readFile(file, 'utf8')).toBe('signoffs: [\n');
  });
});
