#!/usr/bin/env node
// `npm run eval`: scores the built engine on the keyed sets in test/corpus and prints recall,
// false flags and the correction-value rate per set and per kind of error, then totals for the
// sets to tune on and (with --holdout) for the blind hold-out sets. `--details` lists misses and false flags, but
// never for a hold-out set: whoever changes the engine must not read what the hold-out caught.
import { readdir } from 'node:fs/promises';
import { join, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { loadPacks } from '../dist/rulepack/index.js';
import { ERROR_KINDS, formatTally, loadAnswerSet, scoreSet, summarizeScore } from '../dist/evaluate/index.js';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', 'test', 'corpus');
const details = process.argv.includes('--details');
// The blind hold-out sets are measured only when asked: a figure read during tuning spends them.
const holdout = process.argv.includes('--holdout');
const only = process.argv.slice(2).filter((a) => !a.startsWith('--'));
const packs = await loadPacks([]);
const names = (await readdir(root, { withFileTypes: true }))
  .filter((d) => d.isDirectory() && (only.length === 0 || only.includes(d.name)))
  .filter((d) => holdout || only.includes(d.name) || !d.name.startsWith('holdout'))
  .map((d) => d.name)
  .sort();

const totals = { tuning: [], holdout: [] };
for (const name of names) {
  const set = await loadAnswerSet(join(root, name), name);
  const score = await scoreSet(set, packs);
  const blind = name.startsWith('holdout');
  totals[blind ? 'holdout' : 'tuning'].push(score);
  console.log(summarizeScore(score));
  for (const problem of score.keyProblems) console.log(`  key: ${problem}`);
  if (!details || blind) continue;
  for (const m of score.misses) {
    const as = score.missedAs.get(m);
    console.log(`  missed ${m.kind} ${m.file}:${m.line} "${m.text}"${as === undefined ? '' : ` (flagged only as ${as.join(', ')})`}`);
  }
  for (const f of score.falses) {
    console.log(`  false ${f.line.file}:${f.line.line} ${f.flags.map((x) => x.ruleId).join(', ')} "${f.line.text}"`);
  }
  for (const k of score.keyless) {
    const said = k.flags.map((x) => `${x.ruleId}: ${x.correction ?? x.reference?.text ?? '(no correction)'}`).join(' | ');
    console.log(`  keyless ${k.line.file}:${k.line.line} wants [${k.line.key.join(', ')}] got ${said}`);
  }
}

const REASONING = ['logic', 'scope', 'direction'];
for (const [group, scores] of Object.entries(totals)) {
  if (scores.length === 0) continue;
  const sum = (pick) => scores.reduce((t, s) => ({ hit: t.hit + pick(s).hit, of: t.of + pick(s).of }), { hit: 0, of: 0 });
  const reasoning = scores.reduce(
    (t, s) => REASONING.reduce((u, k) => ({ hit: u.hit + s.byKind[k].hit, of: u.of + s.byKind[k].of }), t),
    { hit: 0, of: 0 },
  );
  const kinds = ERROR_KINDS.map((k) => `${k} ${formatTally(sum((s) => s.byKind[k]))}`).join('; ');
  console.log(
    `${group} total (${scores.length} sets): errors caught ${formatTally(sum((s) => s.recall))}; ` +
      `reasoning ${formatTally(reasoning)}; false flags ${formatTally(sum((s) => s.falseFlags))}; ` +
      `correction carries the reference number ${formatTally(sum((s) => s.correctionValue))}`,
  );
  console.log(`  by kind: ${kinds}`);
}
