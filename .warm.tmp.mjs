import { performance } from 'node:perf_hooks';
import { checkDraft, loadPacks } from './dist/index.js';
import { createTopicMatcher } from './dist/prose/index.js';
import { draftFromText } from './dist/source/index.js';
import { largeDraft } from './bench/corpus.js';
const packs = await loadPacks([]);
const blocks = largeDraft(5000 * 12).split('\n\n'); const kept = []; let count = 0;
for (const b of blocks) { if (count >= 5000) break; kept.push(b); count += b.split(/\s+/u).filter((w) => /\p{L}|\p{N}/u.test(w)).length; }
const text = kept.join('\n\n');
const topic = createTopicMatcher(packs.topicWords);
const check = (t) => checkDraft(draftFromText('draft.md', t, 'markdown'), packs, { topic, levels: {} });
check(text);
const times = [];
for (let r = 0; r < 20; r++) { const t0 = performance.now(); check(text.replace('gallery', `gallery${r}`)); times.push(performance.now() - t0); }
times.sort((a, b) => a - b); console.log('best', times[0].toFixed(1), 'median', times[10].toFixed(1));
