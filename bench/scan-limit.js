// The practical limit of a scan, run as its own process beside Firnline: walk the folders, read
// every Markdown file and run one compiled regular expression (Firnline's own subject matcher,
// passed in) over its text. Prints how many files matched.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

const [source, flags, ...folders] = process.argv.slice(2);
const pattern = new RegExp(source, flags);
let hits = 0;
for (const folder of folders) {
  for (const name of readdirSync(folder, { recursive: true })) {
    if (!name.endsWith('.md')) continue;
    if (pattern.test(readFileSync(join(folder, name), 'utf8'))) hits += 1;
  }
}
process.stdout.write(`${hits}\n`);
