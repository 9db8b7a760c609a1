import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { checkPaths } from '../../src/engine.js';
import { answerKey } from './answer-key.js';
import type { FlagLike } from './score.js';
import { assignFlags, countByKind, flagMatchesError, flagTouches, isSerious, locateClaim } from './score.js';

// A blind evaluation: six drafts in invented settings, written without reading the engine, its
// rule packs or its tests, with errors seeded against the ranges in REFERENCE-VALUES.md (each
// `why` in answer-key.ts names the published source). The floors are deliberately low; the
// developers raise them as they fix what the printed misses and false flags show.

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const errors = answerKey.flatMap((draft) => draft.errors);
const claims = answerKey.flatMap((draft) => draft.correct);
const read = (file: string): string => readFileSync(resolve(root, file), 'utf8');

describe('the answer key', () => {
  it('holds 30-40 seeded errors of every kind, 60 or more correct claims, and 300-700 words per draft', () => {
    expect(errors.length).toBeGreaterThanOrEqual(30);
    expect(errors.length).toBeLessThanOrEqual(40);
    expect(claims.length).toBeGreaterThanOrEqual(60);
    const kinds = new Set(errors.map((error) => error.kind));
    expect([...kinds].sort()).toEqual(['arith', 'direction', 'logic', 'scope', 'unit', 'value']);
    for (const draft of answerKey) {
      const words = read(draft.file).split(/\s+/).filter((word) => word.length > 0).length;
      expect({ file: draft.file, inRange: words >= 300 && words <= 700 }).toEqual({ file: draft.file, inRange: true });
    }
  });

  it('puts each error\'s exact words on its line, and no two errors of one kind on one line', () => {
    for (const error of errors) {
      const line = read(error.file).split(/\r\n|\r|\n/)[error.line - 1] ?? '';
      expect({ at: `${error.file}:${error.line}`, found: line.includes(error.text) }).toEqual({
        at: `${error.file}:${error.line}`,
        found: true,
      });
    }
    const places = errors.map((error) => `${error.file}:${error.line}:${error.kind}`);
    expect(new Set(places).size).toBe(places.length);
  });

  it('finds every correct claim starting on its line, and no correct claim contains a seeded error', () => {
    for (const claim of claims) {
      const where = locateClaim(read(claim.file), claim);
      expect({ claim: claim.text, startLine: where?.start.line }).toEqual({ claim: claim.text, startLine: claim.line });
      const inside = errors.filter((error) => error.file === claim.file && claim.text.includes(error.text));
      expect(inside).toEqual([]);
    }
  });
});

describe('the engine on the blind drafts', () => {
  // The floors guard against regressions. They were 50% and 10 when the set was written blind; the
  // engine was then tuned on this set (it scored 41% and 12 false flags before), so its figures are
  // optimistic: test/holdout, never tuned on, is the honest measure.
  it('detects at least 85% of the seeded errors with at most 3 false flags', async () => {
    const result = await checkPaths(['test/evaluation/drafts'], { cwd: root });
    const all: readonly FlagLike[] = result.flags;
    const serious = all.filter(isSerious);
    const credited = assignFlags(serious, errors);
    const detected = credited.map((flagIndex) => flagIndex !== -1);
    const falseFlags = serious.filter((flag) => !errors.some((error) => flagMatchesError(flag, error)));
    const claimPlaces = claims.map((claim) => ({ claim, where: locateClaim(read(claim.file), claim) }));
    const onClaim = (flag: FlagLike): string | undefined =>
      claimPlaces.find(
        ({ claim, where }) => where !== undefined && claim.file === flag.file && flagTouches(flag, where),
      )?.claim.text;
    const falseOnClaims = falseFlags.filter((flag) => onClaim(flag) !== undefined);
    const claimsHit = new Set(falseOnClaims.map(onClaim));

    const found = detected.filter(Boolean).length;
    const percent = Math.round((100 * found) / errors.length);
    const byKind = [...countByKind(errors, detected)].map(([kind, [a, b]]) => `${kind} ${a}/${b}`).join(', ');
    const lines = [
      `evaluation: detected ${found}/${errors.length} seeded errors (${percent}%), ` +
        `${falseFlags.length} false flags on ${claims.length} correct claims; by kind: ${byKind}`,
      `  of the false flags, ${falseOnClaims.length} fall on ${claimsHit.size} of the listed correct claims`,
      `  flags seen: ${all.length} (${serious.length} at warning or error)`,
      'misses:',
      ...errors.flatMap((error, index) => {
        if (detected[index] === true) return [];
        const here = all.filter(
          (flag) => flag.file === error.file && flag.span.start.line <= error.line && error.line <= flag.span.end.line,
        );
        const tool = here.length === 0 ? 'no flag on the line' : here.map((flag) => `${flag.ruleId} (${flag.level}) on "${shorten(flag.excerpt ?? '')}"`).join(', ');
        return [`  ${error.file}:${error.line} [${error.kind}] "${error.text}" -> ${tool}`];
      }),
      'false flags:',
      ...falseFlags.map((flag) => {
        const claim = onClaim(flag);
        return (
          `  ${flag.file}:${flag.span.start.line}:${flag.span.start.column} ${flag.ruleId} (${flag.level}) ` +
          `"${shorten(flag.excerpt ?? '')}"${claim === undefined ? '' : ` [on correct claim: "${shorten(claim)}"]`}`
        );
      }),
    ];
    console.log(lines.join('\n'));

    expect(found / errors.length).toBeGreaterThanOrEqual(0.85);
    expect(falseFlags.length).toBeLessThanOrEqual(3);
  });
});

function shorten(text: string): string {
  const flat = text.replace(/\s+/g, ' ').trim();
  return flat.length > 110 ? `${flat.slice(0, 107)}...` : flat;
}
