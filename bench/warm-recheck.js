// The editor server's warm re-check (`firnline lsp`): a 5,000-word Markdown draft, packs already
// loaded and the engine already warmed up, checked again after a one-word edit. Two figures:
// (a) the whole draft through the library API (draftFromText + checkDraft with the compiled topic
// matcher); (b) the server's own re-check (dist/lsp/incremental-check.js), which sends only the
// changed blocks through the engine. Best and median of BENCH_RECHECKS runs (default 20).
// Invented demo text only.
import { performance } from 'node:perf_hooks';
import { checkDraft } from '../dist/index.js';
import { createTopicMatcher } from '../dist/prose/index.js';
import { draftFromText } from '../dist/source/index.js';
import { createCheckSetup } from '../dist/lsp/check-document.js';
import { createDocumentChecker } from '../dist/lsp/incremental-check.js';
import { largeDraft } from './corpus.js';

const WORDS = 5000;
const RECHECKS = Number(process.env.BENCH_RECHECKS ?? 20);

/** The first blocks of the long synthetic draft, up to `WORDS` words. */
function draftOfWords(words) {
  const blocks = largeDraft(WORDS * 12).split('\n\n');
  const kept = [];
  let count = 0;
  for (const block of blocks) {
    if (count >= words) break;
    kept.push(block);
    count += block.split(/\s+/u).filter((w) => /\p{L}|\p{N}/u.test(w)).length;
  }
  return { text: kept.join('\n\n'), count };
}

/** Measures and prints the warm re-check of a 5,000-word draft. */
export async function measureWarmRecheck(packs) {
  const { text, count } = draftOfWords(WORDS);
  const topic = createTopicMatcher(packs.topicWords);
  const check = (t) => checkDraft(draftFromText('draft.md', t, 'markdown'), packs, { topic, levels: {} });
  const first = check(text); // warm-up: the regex worker, compromise and the caches start here
  const checker = createDocumentChecker(createCheckSetup(packs, {}, { file: 'firnline-signoffs.yaml', signoffs: [] }));
  checker.check(text, 'markdown', 'draft.md', 'draft.md');
  // One word changed per run, as after a pause in typing.
  const edited = (r) => text.replace('gallery', `gallery${r}`);
  const whole = timeRuns((r) => check(edited(r)));
  const server = timeRuns((r) => checker.check(edited(r), 'markdown', 'draft.md', 'draft.md'));
  console.log(`firnline bench: warm re-check of a ${count}-word draft after a one-word edit (claims: ${first.claims.length}, flags: ${first.flags.length})`);
  console.log(`  whole draft through the library API: best of ${RECHECKS}: ${whole.best} ms, median ${whole.median} ms`);
  console.log(`  as \`firnline lsp\` re-checks (changed blocks only): best of ${RECHECKS}: ${server.best} ms, median ${server.median} ms`);
}

function timeRuns(run) {
  const times = [];
  for (let r = 0; r < RECHECKS; r += 1) {
    const t0 = performance.now();
    run(r);
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return { best: times[0].toFixed(1), median: times[Math.floor(times.length / 2)].toFixed(1) };
}
