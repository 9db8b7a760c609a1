// The editor server's warm re-check (`firnline lsp`): a 5,000-word Markdown draft, packs already
// loaded and the engine already warmed up, checked again after a one-word edit through the same
// library calls the server makes (draftFromText + checkDraft with the compiled topic matcher).
// Prints the best and the median of BENCH_RECHECKS runs (default 20). Invented demo text only.
import { performance } from 'node:perf_hooks';
import { checkDraft } from '../dist/index.js';
import { createTopicMatcher } from '../dist/prose/index.js';
import { draftFromText } from '../dist/source/index.js';
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
  const times = [];
  for (let r = 0; r < RECHECKS; r += 1) {
    // One word changed per run, as after a pause in typing.
    const edited = text.replace('gallery', `gallery${r}`);
    const t0 = performance.now();
    check(edited);
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  const median = times[Math.floor(times.length / 2)];
  console.log(`firnline bench: warm re-check of a ${count}-word draft (library API, as \`firnline lsp\` re-checks after an edit)`);
  console.log(`  best of ${RECHECKS}: ${times[0].toFixed(0)} ms, median ${median.toFixed(0)} ms  (claims: ${first.claims.length}, flags: ${first.flags.length})`);
}
