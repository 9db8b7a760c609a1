#!/usr/bin/env node
// Compares two folders of JSON reports written by bench/report-snapshots.js: the findings (claims,
// flags with their sources in full, rules, summary, skipped files, packs) must be the same, byte
// for byte once written out. A report whose flags name their sources by place in the
// top-level `sources` list is read with each place replaced by its entry, so a report written before that
// format compares with one written after it. Usage: node bench/compare-reports.js BEFORE AFTER
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';

const [before, after] = process.argv.slice(2);
if (before === undefined || after === undefined) {
  console.error('usage: node bench/compare-reports.js BEFORE_DIR AFTER_DIR');
  process.exit(2);
}

/** The report's findings with every flag's sources in full, written as `check` writes JSON. */
function findings(text) {
  const report = JSON.parse(text);
  const { sources, ...rest } = report;
  if (sources !== undefined) {
    rest.flags = rest.flags.map((f) => ({ ...f, sources: f.sources.map((i) => sources[i] ?? { missing: i }) }));
  }
  return JSON.stringify(rest, null, 2);
}

const names = (await readdir(before)).filter((n) => n.endsWith('.json')).sort();
const other = new Set((await readdir(after)).filter((n) => n.endsWith('.json')));
let differ = 0;
for (const name of names) {
  if (!other.has(name)) {
    console.log(`missing in ${after}: ${name}`);
    differ += 1;
    continue;
  }
  const [a, b] = await Promise.all([readFile(join(before, name), 'utf8'), readFile(join(after, name), 'utf8')]);
  if (findings(a) !== findings(b)) {
    console.log(`differs: ${name}`);
    differ += 1;
  }
}
console.log(`${names.length - differ} of ${names.length} reports have the same findings`);
process.exitCode = differ === 0 ? 0 : 1;
