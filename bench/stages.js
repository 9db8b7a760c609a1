// Where the time goes, stage by stage. This walks the same stages as engine.checkDraft, calling the
// same built functions in the same order, with a clock around each; it keeps no results except a
// count of claims, which the caller compares with checkPaths so that the walk cannot drift from the
// engine unnoticed. The clock calls add well under 1% to a run.
import { performance } from 'node:perf_hooks';
import { bindQuantities } from '../dist/claims/bind.js';
import { checkArithmetic } from '../dist/checks/arithmetic.js';
import { checkReasoning } from '../dist/checks/reasoning/index.js';
import { checkReferences } from '../dist/checks/reference.js';
import { checkUnits } from '../dist/checks/units.js';
import { createTopicMatcher, splitSentences } from '../dist/prose/index.js';
import { parseQuantities } from '../dist/quantities/index.js';
import { claimIdOf, foldClaimText } from '../dist/review/claim-id.js';
import { blockRange, createLineIndex, draftFormat, draftFromText, findDrafts, readDraftText } from '../dist/source/index.js';

/** Stage names in pipeline order. */
export const STAGES = ['discover', 'read', 'file topic test', 'markdown parse', 'sentences', 'sentence topic test', 'quantities', 'bind', 'references', 'arithmetic', 'units', 'reasoning', 'positions and claims'];

/** Runs every stage over `paths` (relative to `cwd`); returns milliseconds per stage and the claim count. */
export async function timeStages(paths, cwd, packs) {
  const ms = Object.fromEntries(STAGES.map((s) => [s, 0]));
  let t = performance.now();
  const lap = (stage) => {
    const now = performance.now();
    ms[stage] += now - t;
    t = now;
  };
  const topic = createTopicMatcher(packs.topicWords);
  const { files } = await findDrafts(paths, cwd, {});
  lap('discover');
  let claims = 0;
  for (const file of files) {
    const text = await readDraftText(file, cwd);
    lap('read');
    if (typeof text !== 'string') continue;
    const onTopic = topic.test(text);
    lap('file topic test');
    if (!onTopic) continue;
    const draft = draftFromText(file, text, draftFormat(file));
    const lines = createLineIndex(draft.text);
    lap('markdown parse');
    const seen = new Map();
    draft.blocks.forEach((block, blockIndex) => {
      const sentences = splitSentences(block.text, blockIndex);
      const paragraph = sentences.map((s) => s.text);
      lap('sentences');
      sentences.forEach((sentence, index) => {
        const candidate = topic.test(sentence.text);
        lap('sentence topic test');
        if (!candidate) return;
        const quantities = parseQuantities(sentence.text);
        lap('quantities');
        const { bindings } = bindQuantities(sentence.text, quantities, packs);
        lap('bind');
        const reference = checkReferences(sentence.text, quantities, bindings, packs);
        lap('references');
        const drafts = [...reference.flags, ...checkArithmetic(sentence.text, quantities)];
        lap('arithmetic');
        drafts.push(...checkUnits(sentence.text, quantities));
        lap('units');
        drafts.push(...checkReasoning(paragraph, index, packs));
        lap('reasoning');
        const measured = quantities.some((q) => q.dimension !== 'number');
        if (measured || bindings.length > 0 || drafts.length > 0) {
          const folded = foldClaimText(sentence.text);
          const occurrence = (seen.get(folded) ?? 0) + 1;
          seen.set(folded, occurrence);
          claimIdOf(file, sentence.text, occurrence);
          for (const d of [{ start: 0, end: sentence.text.length }, ...drafts]) {
            const range = blockRange(draft.text, block, sentence.start + d.start, sentence.start + d.end);
            lines.toSpan(range.start, range.end);
          }
          claims += 1;
        }
        lap('positions and claims');
      });
    });
  }
  return { ms, claims };
}

/** The stages as aligned lines: milliseconds and share of the total, largest first. */
export function formatStages(ms) {
  const total = Object.values(ms).reduce((a, b) => a + b, 0);
  return Object.entries(ms)
    .filter(([, v]) => v >= 0.5)
    .sort((a, b) => b[1] - a[1])
    .map(([stage, v]) => `    ${stage.padEnd(22)} ${v.toFixed(0).padStart(6)} ms  ${((100 * v) / total).toFixed(1).padStart(5)}%`)
    .join('\n');
}
