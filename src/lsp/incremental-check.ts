/**
 * Re-checks an edited document block by block. Every check of the engine stays inside one prose
 * block (sentences never cross blocks; the context a check reads is the block's earlier
 * sentences), except one bit: whether a block beside it, or the draft throughout, names a subject (engine.subjectNearby),
 * and the lead-in the arithmetic and unit checks read on from (prose/lead-in.ts).
 * So a block whose source, prose text, offsets, heading and that bit are unchanged has the same
 * claims as before, only perhaps further down the file. Those are moved to their new place; only
 * new or changed blocks go through the engine. Claim ids, which count repeated sentences across
 * the whole draft, are then numbered again in document order, exactly as `checkDraft` numbers
 * them, so the result equals a full check (the tests compare the two).
 */
import { checkDraft, namesSubject, subjectNearby } from '../engine.js';
import { claimIdOf, foldClaimText } from '../review/claim-id.js';
import { CHECKLIST_MARKER } from '../report/checklist-markdown.js';
import { leadInOf } from '../prose/lead-in.js';
import { quotesEarlierLine } from '../prose/reply-quote.js';
import { createLineIndex, draftFromText, type LineIndex } from '../source/index.js';
import type { Claim, Draft, Flag, ProseBlock, Span } from '../types.js';
import { joinSignoffs, type CheckSetup, type DocumentCheck } from './check-document.js';
import { createPositionMap, type PositionMap } from './positions.js';

/** The formats an editor sends as text (a Word file never comes through the protocol). */
type TextFormat = Exclude<Draft['format'], 'docx'>;

/** A claim of a block, with its spans (and its flags' spans) as UTF-16 indices from the block start. */
interface CachedClaim {
  claim: Claim;
  span: [number, number];
  flags: [number, number][];
}

/** Checks one document again and again, reusing the claims of unchanged blocks. */
export interface DocumentChecker {
  check(text: string, format: TextFormat, path: string, projectPath: string): DocumentCheck;
}

/** A checker bound to one setup (a new setup means a new checker: the packs or levels changed). */
export function createDocumentChecker(setup: CheckSetup): DocumentChecker {
  let cache = new Map<string, CachedClaim[][]>();
  let cacheFormat: TextFormat | undefined;
  let cachePath: string | undefined;
  return {
    check(text, format, path, projectPath) {
      const draft = draftFromText(path, text, format);
      if (text.trimStart().startsWith(CHECKLIST_MARKER) || !namesSubject(text, setup.packs)) {
        cache = new Map();
        return { draft, flags: [] };
      }
      if (format !== cacheFormat || projectPath !== cachePath) cache = new Map();
      cacheFormat = format;
      cachePath = projectPath;
      const positions = createPositionMap(text);
      const lines = createLineIndex(text);
      const beside = subjectNearby(draft.blocks, setup.packs);
      const leadIns = draft.blocks.map((_b, i) => leadInOf(text, draft.blocks, i, (t) => namesSubject(t, setup.packs)));
      const keys = draft.blocks.map((block, i) => blockKey(text, block, beside[i] === true, leadIns[i] ?? []));
      // A block that appears twice uses one cached entry per appearance.
      const queues = new Map([...cache].map(([key, entries]) => [key, [...entries]]));
      const reused = keys.map((key) => queues.get(key)?.shift());
      const changedAt = draft.blocks.flatMap((_b, i) => (reused[i] === undefined ? [i] : []));
      const changed = changedAt.map((i) => draft.blocks[i] as ProseBlock);
      const subjectNextTo = changedAt.map((i) => beside[i] === true);
      const leadInsOf = changedAt.map((i) => leadIns[i] ?? []);
      const fresh = changed.length === 0 ? [] : checkDraft({ ...draft, blocks: changed }, setup.packs, { topic: setup.topic, levels: setup.levels, projectPath, subjectBeside: subjectNextTo, leadIns: leadInsOf }).claims;
      const freshByBlock = groupByBlock(fresh, changed, positions);

      const next = new Map<string, CachedClaim[][]>();
      const claims: Claim[] = [];
      draft.blocks.forEach((block, i) => {
        const start = block.offsets[0] ?? 0;
        const key = keys[i] ?? '';
        const cached = reused[i] ?? toCached(freshByBlock.get(block) ?? [], start, positions);
        next.set(key, [...(next.get(key) ?? []), cached]);
        for (const c of cached) claims.push(placed(c, start, lines));
      });
      cache = next;
      const numbered = numberClaims(claims, projectPath);
      return { draft, flags: joinSignoffs(numbered, setup.ledger) };
    },
  };
}

/** What makes a block's claims the same: its source text, prose text, offset pattern, kind, heading, a subject beside it and its lead-in. */
function blockKey(text: string, block: ProseBlock, subjectBeside: boolean, leadIn: readonly string[]): string {
  const start = block.offsets[0] ?? 0;
  const end = block.offsets[block.offsets.length - 1] ?? start;
  const shape = block.offsets.map((o) => o - start).join(',');
  // Whether each of a plain-text block's lines quotes words said earlier in the draft ("> ..."): an edit above can change it.
  const quoting = block.kind === 'text' ? [...block.text.matchAll(/^|\n/gu)].map((m) => quotesEarlierLine(text, block.offsets[m.index + m[0].length] ?? start)) : [];
  return [block.kind, block.heading, text.slice(start, end), block.text, shape, subjectBeside, quoting.join(','), ...leadIn].join('\u0000');
}

/** The claims of `fresh` grouped by the block (of `blocks`) their sentence starts in. */
function groupByBlock(fresh: Claim[], blocks: ProseBlock[], positions: PositionMap): Map<ProseBlock, Claim[]> {
  const grouped = new Map<ProseBlock, Claim[]>();
  let b = 0;
  for (const claim of fresh) {
    const at = positions.indexOf(claim.span.start.offset);
    // Claims come in block order; move on to the block that holds this one.
    while (b < blocks.length - 1 && at >= (blocks[b]?.offsets.at(-1) ?? Infinity)) b += 1;
    const block = blocks[b];
    if (block === undefined) continue;
    grouped.set(block, [...(grouped.get(block) ?? []), claim]);
  }
  return grouped;
}

function toCached(claims: Claim[], blockStart: number, positions: PositionMap): CachedClaim[] {
  const relative = (span: Span): [number, number] => [positions.indexOf(span.start.offset) - blockStart, positions.indexOf(span.end.offset) - blockStart];
  return claims.map((claim) => ({ claim, span: relative(claim.span), flags: claim.flags.map((f) => relative(f.span)) }));
}

/** The cached claim placed at its block's current start. */
function placed(cached: CachedClaim, blockStart: number, lines: LineIndex): Claim {
  const at = ([s, e]: [number, number]): Span => lines.toSpan(blockStart + s, blockStart + e);
  return {
    ...cached.claim,
    span: at(cached.span),
    flags: cached.claim.flags.map((flag, i): Flag => ({ ...flag, span: at(cached.flags[i] ?? [0, 0]) })),
  };
}

/** Claim ids numbered as `checkDraft` numbers them: a repeated sentence gets `-2`, `-3`... in document order. */
function numberClaims(claims: Claim[], projectPath: string): Claim[] {
  const seen = new Map<string, number>();
  return claims.map((claim) => {
    const folded = foldClaimText(claim.text);
    const occurrence = (seen.get(folded) ?? 0) + 1;
    seen.set(folded, occurrence);
    const id = claimIdOf(projectPath, claim.text, occurrence);
    return id === claim.id ? claim : { ...claim, id, flags: claim.flags.map((f) => ({ ...f, claimId: id })) };
  });
}
