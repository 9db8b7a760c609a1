// A separate process that appends sign-offs one call at a time (for the concurrency test):
// node --import ./ts-register.mjs append-child.mjs LEDGER PREFIX COUNT
import { appendSignoffs } from '../../src/review/append-signoffs.ts';

const [ledger, prefix, count] = process.argv.slice(2);
for (let i = 1; i <= Number(count); i += 1) {
  await appendSignoffs(ledger, [
    {
      claim: `c${prefix}${String(i).padStart(10 - prefix.length, '0')}`,
      file: 'drafts/winter-gallery.md',
      text: `Panel ${i} from writer ${prefix}.`,
      decision: 'approved',
      reviewer: `Writer ${prefix}`,
      date: '2025-02-11T10:00:00Z',
      packVersion: 'paleoclimate 1.0.0',
    },
  ]);
}
