// One `firnline` command run as the launcher runs it (bin/firnline.js), reporting its peak
// resident memory (all threads: the pool's workers live in this process) on the last line of stderr.
import { main } from '../dist/cli/main.js';

process.exitCode = await main(process.argv.slice(2));
process.stderr.write(`\nBENCH-MAXRSS-KB ${process.resourceUsage().maxRSS}\n`);
