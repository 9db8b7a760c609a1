// The one-file bundle is written in ASCII alone (scripts/ascii-source.js) so V8 keeps its text one
// byte a character and the launcher reads it without decoding (docs/speed.md, Start-up). The
// rewrite must keep the meaning of every literal it touches: these run code before and after it
// and compare what each literal evaluates to, and check that the built bundle holds no other byte.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
// @ts-expect-error: a build script in plain JavaScript, without type declarations.
import { asciiSource } from '../../scripts/ascii-source.js';

const rewrite = asciiSource as (code: string, fileName?: string) => string;
const PAST_ASCII = /\P{ASCII}/u;

/** The values `code` leaves in `names`, each regular expression as its source, flags and lastIndex. */
function valuesOf(code: string, names: string[]): unknown[] {
  const values = new Function(`${code}\nreturn [${names.join(', ')}];`)() as unknown[];
  return values.map((v) => (v instanceof RegExp ? { source: v.source, flags: v.flags, lastIndex: v.lastIndex } : v));
}

describe('asciiSource', () => {
  it('keeps the source and flags of a regular expression literal with a typographic apostrophe and a subscript', () => {
    const code = 'const a = /[\\p{L}’]+₂\\/x/gu; const b = "it’s".replace(/’/gu, "\'"); const c = /°C/i.test("20°c");';
    const out = rewrite(code);
    expect(PAST_ASCII.test(out)).toBe(false);
    expect(valuesOf(out, ['a', 'b', 'c'])).toEqual(valuesOf(code, ['a', 'b', 'c']));
  });

  it('keeps the cooked and raw text of templates, untagged and tagged by String.raw', () => {
    const code = 'const n = 3; const a = `${n} km²`; const b = String.raw`\\d+\\s*‰${n}–${n}—`; const c = `–`;';
    const out = rewrite(code);
    expect(PAST_ASCII.test(out)).toBe(false);
    expect(valuesOf(out, ['a', 'b', 'c'])).toEqual(valuesOf(code, ['a', 'b', 'c']));
  });

  it('writes strings, names and comments past ASCII as escapes with the same value', () => {
    const code = '/* ‰ of the air */ const café = "δ18O ≈ −3‰"; // ±\nconst d = café;';
    const out = rewrite(code);
    expect(PAST_ASCII.test(out)).toBe(false);
    expect(valuesOf(out, ['d'])).toEqual(valuesOf(code, ['d']));
  });

  it('refuses a template with another tag, whose strings the tag would see changed', () => {
    expect(() => rewrite('const tag = (s) => s.raw.join("|"); const t = tag`a–b`;')).toThrow(/tagged tag/u);
  });

  it('leaves code in ASCII as it is', () => {
    const code = 'const a = /x/g; // plain\n';
    expect(rewrite(code)).toBe(code);
  });

  it('leaves no byte past ASCII in the built bundle', () => {
    const bytes = readFileSync(fileURLToPath(new URL('../../dist/bundle/cli.cjs', import.meta.url)));
    expect(bytes.every((b) => b < 0x80)).toBe(true);
  });
});
