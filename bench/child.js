// One `firnline` command run by the launcher itself (bin/firnline.js, required into this process, so
// the bench takes the path a user's command takes: the one-file bundle with its code cache for a
// check), reporting its peak resident memory (all threads: the pool's workers live in this
// process) on the last line of stderr as the process exits.
import { createRequire } from 'node:module';

process.on('exit', () => process.stderr.write(`\nBENCH-MAXRSS-KB ${process.resourceUsage().maxRSS}\n`));
createRequire(import.meta.url)('../bin/firnline.js');
