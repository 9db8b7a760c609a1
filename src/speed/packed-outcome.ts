/**
 * A file's outcome held as bytes until the report needs it (speed/run-files.ts). A run over files
 * keeps every file's claims and flags to the end, since the report's order, summary and source list
 * need them all; as objects on the V8 heap they cost some 3.5 MiB per 128 KB file of the bench's
 * topical prose, and the heap grows to half as much again above what it holds. The same outcome
 * written by V8's serializer (the structured clone a pool worker's answer goes through anyway) is
 * some 1.9 MB of bytes outside the heap, which no collection walks and no heap growth multiplies.
 * `unpackOutcome` gives back an outcome equal to the one packed, as a worker's answer always was: the
 * clone keeps every value and every object shared within the outcome (a source entry cited by many
 * flags is one object again), not the identity of a pack's own objects (run-files.ts shareSources).
 */
import { deserialize, serialize } from 'node:v8';
import type { FileOutcome } from './cache.js';

/** An outcome as the bytes of V8's serializer. */
export type PackedOutcome = Uint8Array;

export function packOutcome(outcome: FileOutcome): PackedOutcome {
  return serialize(outcome);
}

export function unpackOutcome(packed: PackedOutcome): FileOutcome {
  return deserialize(packed) as FileOutcome;
}
