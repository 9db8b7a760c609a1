// The unit matchers' first characters the build stores (scripts/build-generated.js,
// dist/generated/unit-first-chars.json; src/quantities/stored-first-chars.ts) are a cache of the
// reader (first-chars.ts), which stays the truth: every stored set is read again here from its
// source and compared, and a file made by another reader, of another format or damaged is never
// used. The stored-file test runs after `npm run build` (as `npm test` does).
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { firstChars } from '../../src/quantities/first-chars.js';
import { MATCHED_UNITS, unitSource } from '../../src/quantities/match-unit.js';
import { FIRST_CHARS_FORMAT, firstCharsCode, firstCharsText, readFirstChars } from '../../src/quantities/stored-first-chars.js';

const root = fileURLToPath(new URL('../../', import.meta.url));
const stored = join(root, 'dist', 'generated', 'unit-first-chars.json');
const matchModule = pathToFileURL(join(root, 'dist', 'quantities', 'match-unit.js'));

describe('the stored first characters (dist/generated/unit-first-chars.json)', () => {
  it("hold, for every unit matcher's source, the set the reader gives now", () => {
    expect(existsSync(stored), 'run `npm run build` first').toBe(true);
    const sets = readFirstChars(pathToFileURL(stored), matchModule);
    const sources = MATCHED_UNITS.map(unitSource);
    expect(sets.size, 'the file is current for the built code').toBe(new Set(sources).size);
    for (const source of sources) {
      expect(sets.has(source), source).toBe(true);
      expect(sets.get(source), source).toEqual(firstChars(source));
    }
  });
});

describe('a stored file that does not fit is ignored, never trusted', () => {
  // A reader and package.json in a folder laid out as dist/ is.
  function layout(reader = '// first-chars.js\n'): { module: URL; file: URL; code: string } {
    const dir = mkdtempSync(join(tmpdir(), 'firnline-first-chars-'));
    mkdirSync(join(dir, 'dist', 'quantities'), { recursive: true });
    copyFileSync(join(root, 'package.json'), join(dir, 'package.json'));
    writeFileSync(join(dir, 'dist', 'quantities', 'first-chars.js'), reader);
    const module = pathToFileURL(join(dir, 'dist', 'quantities', 'match-unit.js'));
    return { module, file: pathToFileURL(join(dir, 'unit-first-chars.json')), code: firstCharsCode(module)! };
  }
  // "kyr" and "ppm" start with k and p; a source the reader gives up on is stored as null (any).
  const read = (source: string): ReadonlySet<number> | undefined => (source === 'any' ? undefined : new Set([source.codePointAt(0)!]));

  it('reads a file made by the same reader', () => {
    const { module, file, code } = layout();
    writeFileSync(file, firstCharsText(['kyr', 'ppm', 'any'], read, code));
    const sets = readFirstChars(file, module);
    expect(sets.get('kyr')).toEqual(new Set([0x6b]));
    expect(sets.has('any')).toBe(true);
    expect(sets.get('any')).toBeUndefined();
  });

  it('ignores a file made by another reader, of another format, or damaged', () => {
    const { module, file, code } = layout();
    writeFileSync(file, firstCharsText(['kyr'], read, code.replace(/^./u, (c) => (c === '0' ? '1' : '0'))));
    expect(readFirstChars(file, module).size).toBe(0);
    writeFileSync(file, firstCharsText(['kyr'], read, code).replace(FIRST_CHARS_FORMAT, 'firnline-unit-first-chars/0'));
    expect(readFirstChars(file, module).size).toBe(0);
    writeFileSync(file, JSON.stringify({ format: FIRST_CHARS_FORMAT, code, sets: [['kyr', ['k']]] }));
    expect(readFirstChars(file, module).size).toBe(0);
    const whole = firstCharsText(['kyr'], read, code);
    writeFileSync(file, whole.slice(0, whole.length / 2));
    expect(readFirstChars(file, module).size).toBe(0);
    expect(readFirstChars(pathToFileURL(join(fileURLToPath(file), '..', 'none.json')), module).size).toBe(0);
  });

  it('ignores a file once the reader beside it changes', () => {
    const { module, file, code } = layout();
    writeFileSync(file, firstCharsText(['kyr'], read, code));
    writeFileSync(fileURLToPath(new URL('first-chars.js', module)), `${readFileSync(fileURLToPath(new URL('first-chars.js', module)), 'utf8')}// changed\n`);
    expect(readFirstChars(file, module).size).toBe(0);
  });
});
