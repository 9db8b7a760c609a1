/**
 * Linear time for long paragraphs and table cells in the Markdown parse.
 *
 * micromark (pinned 4.0.3) ends every run of inline text by merging adjacent `data` events, one
 * `Array#splice` per run (`resolveAllText` in micromark/lib/initialize/text.js). Each splice moves
 * every later event of the block, so a block with many runs costs time quadratic in its length.
 * The GFM autolink extension breaks `data` at every word start, so every line of a paragraph is
 * such a run: one 20,000-line paragraph took 18 s to parse against 1.4 s for 10,000 lines.
 *
 * This module merges the runs first, in one pass that moves each event once; the library's own
 * resolver then finds nothing left to merge and goes on to its other work (line suffixes, hard
 * breaks) unchanged. It wraps the three initial constructs that carry that resolver (text, string,
 * and the one inside link labels), in both builds of the package (`lib/` by default, `dev/lib/`
 * under the `development` condition), once. The parse trees are the same with and without it
 * (test/source/micromark-linear-text.test.ts); `npm run bench` measures the growth.
 */
import { initialTextModules } from './micromark-initial-text.js';

/** One micromark event: `[enter | exit, token, context]`, reduced to what the merge touches. */
type Event = [string, { type: string; end: unknown }, unknown];
type Resolver = (events: Event[], context: unknown) => Event[];
interface Initial {
  resolveAll?: Resolver;
}

const WRAPPED = Symbol.for('firnline.linear-text-resolver');

let enabled = true;
let calls = 0;

/**
 * Merges every run of adjacent `data` events into its first token, in place and in one pass: the
 * token's end becomes the run's end and the rest of the run is dropped. This is what micromark's
 * resolver does, without moving the events after each run once per run.
 */
export function mergeDataRuns(events: Event[]): Event[] {
  let write = 0;
  let read = 0;
  while (read < events.length) {
    const event = events[read] as Event;
    if (event[1].type !== 'data') {
      events[write++] = event;
      read += 1;
      continue;
    }
    let end = read + 1;
    while (end < events.length && (events[end] as Event)[1].type === 'data') end += 1;
    if (end - read > 2) {
      // The enter and exit event of the first data token share the token object.
      event[1].end = (events[end - 1] as Event)[1].end;
      events[write++] = event;
      events[write++] = events[read + 1] as Event;
    } else {
      for (let i = read; i < end; i += 1) events[write++] = events[i] as Event;
    }
    read = end;
  }
  events.length = write;
  return events;
}

function wrap(initial: Initial | undefined): void {
  const original = initial?.resolveAll;
  if (initial === undefined || original === undefined || (original as unknown as Record<symbol, boolean>)[WRAPPED] === true) return;
  const linear: Resolver = (events, context) => {
    calls += 1;
    return original(enabled ? mergeDataRuns(events) : events, context);
  };
  (linear as unknown as Record<symbol, boolean>)[WRAPPED] = true;
  initial.resolveAll = linear;
}

for (const module of initialTextModules) {
  const text = module as { text?: Initial; string?: Initial; resolver?: Initial };
  wrap(text.text);
  wrap(text.string);
  wrap(text.resolver);
}

/**
 * For the tests: switch the merge off (to compare trees with the library's own resolver) and count
 * how often the wrapped resolver ran (to prove the parse goes through it).
 */
export const linearTextResolver = {
  set enabled(on: boolean) {
    enabled = on;
  },
  get calls(): number {
    return calls;
  },
};
