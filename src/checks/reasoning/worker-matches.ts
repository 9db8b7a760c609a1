/**
 * The time limit for regular expressions, kept cheap: the patterns run on one long-lived worker
 * thread while the calling thread waits (Atomics.wait) for at most the limit. A pattern that runs
 * longer is stopped by ending the worker (V8 interrupts even a backtrack); the next call starts a
 * fresh one. A `node:vm` call with a timeout starts and joins a watchdog thread every time, which
 * cost 0.06 to 0.4 ms per sentence here (see bench/); a trip to the worker costs about 0.01 ms.
 * When no worker can be started, `workerMatches` says so and the caller falls back to `node:vm`.
 */
import { MessageChannel, receiveMessageOnPort, Worker, type MessagePort } from 'node:worker_threads';

/** A match as UTF-16 offsets into the text. */
export interface Span {
  start: number;
  end: number;
}

// CommonJS source, so it runs the same from dist/ and from the TypeScript sources under vitest.
// Each pattern arrives once (source and flags) and is kept under a number; matches as in matchAll,
// empty ones dropped. The reply is posted before the flag is set, so it is there when the caller
// wakes.
const WORKER_SOURCE = `
const { workerData } = require('node:worker_threads');
const { port, shared } = workerData;
const state = new Int32Array(shared);
const patterns = new Map();
port.on('message', ({ added, ids, texts }) => {
  let reply;
  try {
    for (const [n, source, flags] of added) patterns.set(n, new RegExp(source, flags.includes('g') ? flags : flags + 'g'));
    reply = { spans: texts.map((text) => ids.map((n) => {
      const spans = [];
      for (const m of text.matchAll(patterns.get(n))) if (m[0].length > 0) spans.push({ start: m.index, end: m.index + m[0].length });
      return spans;
    })) };
  } catch (error) {
    reply = { error: String(error && error.message || error) };
  }
  port.postMessage(reply);
  Atomics.store(state, 0, 1);
  Atomics.notify(state, 0);
});
Atomics.store(state, 1, 1);
Atomics.notify(state, 1);
`;

/** How long a new worker may take to start before the vm fallback is used for good. */
const START_LIMIT_MS = 10_000;

interface Guard {
  worker: Worker;
  port: MessagePort;
  state: Int32Array;
  ids: WeakMap<RegExp, number>;
}

let guard: Guard | undefined;
let unavailable = false;
let nextId = 0;

/**
 * For each text of `texts`, the matches of each regex in `regexes`, run on the worker under one
 * limit of `ms` for the lot; `undefined` when the limit ran out, `'unavailable'` when no worker
 * thread can run here.
 */
export function workerMatches(regexes: readonly RegExp[], texts: readonly string[], ms: number): Span[][][] | undefined | 'unavailable' {
  const current = guard ?? start();
  if (current === undefined) return 'unavailable';
  const added: [number, string, string][] = [];
  const ids = regexes.map((regex) => {
    let id = current.ids.get(regex);
    if (id === undefined) {
      id = (nextId += 1);
      current.ids.set(regex, id);
      added.push([id, regex.source, regex.flags]);
    }
    return id;
  });
  Atomics.store(current.state, 0, 0);
  current.port.postMessage({ added, ids, texts });
  if (Atomics.wait(current.state, 0, 0, ms) === 'timed-out') {
    stop(current);
    return undefined;
  }
  const reply = receiveMessageOnPort(current.port)?.message as { spans?: Span[][][]; error?: string } | undefined;
  if (reply?.spans === undefined) throw new Error(`regular-expression worker failed: ${reply?.error ?? 'no reply'}`);
  return reply.spans;
}

function start(): Guard | undefined {
  if (unavailable) return undefined;
  try {
    const shared = new SharedArrayBuffer(8);
    const state = new Int32Array(shared);
    const { port1, port2 } = new MessageChannel();
    const worker = new Worker(WORKER_SOURCE, { eval: true, workerData: { port: port2, shared }, transferList: [port2] });
    // Neither the worker nor its port may keep the process alive once the run is over.
    worker.unref();
    port1.unref();
    const started = { worker, port: port1, state, ids: new WeakMap<RegExp, number>() };
    // A worker that dies is replaced at the next call; its error must not end the process.
    const forget = () => {
      if (guard === started) guard = undefined;
    };
    worker.on('error', forget);
    worker.on('exit', forget);
    if (Atomics.wait(state, 1, 0, START_LIMIT_MS) === 'timed-out') {
      stop(started);
      unavailable = true;
      return undefined;
    }
    guard = started;
    return started;
  } catch {
    unavailable = true;
    return undefined;
  }
}

function stop(stopped: Guard): void {
  if (guard === stopped) guard = undefined;
  stopped.port.close();
  void stopped.worker.terminate();
}
