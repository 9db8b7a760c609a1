// Runs the command line from its one-file CommonJS bundle (dist/bundle/cli.cjs, scripts/build-bundle.js)
// with V8's code cache for it (dist/bundle/cli.code-cache), made by `npm run build` from a check of
// the demo drafts. A cold `check` then skips compiling the bundle and every function that check
// used (docs/speed.md, Start-up). The cache is derived data and is never trusted blindly: it is used
// only when its header names this format, the SHA-256 of the bundle's text as read now, this Node
// and V8 version and architecture, the V8 flag the check command sets, and the SHA-256 of its
// payload as read now; V8 then checks its own version, flags and source length and may still refuse
// it (`cachedDataRejected`). Anything else compiles the bundle from its text, with the same results.
// Nothing is written at run time: the cache sits beside the code it was made from, as trusted as
// that code, and a run never leaves a file behind.
'use strict';
const { isAscii } = require('node:buffer');
const { createHash } = require('node:crypto');
const { readFileSync } = require('node:fs');
const { createRequire } = require('node:module');
const { dirname } = require('node:path');
const { setFlagsFromString } = require('node:v8');
const vm = require('node:vm');

const FORMAT = 'firnline-code-cache/1';
/**
 * The V8 flag `firnline check` sets from its start (cli/speed-options.ts CHECK_V8_FLAGS: the young
 * generation's growth; the heap's growth is bounded only once a run is large): V8 hashes its flags
 * into the cache, so the cache is made and read with it set. test/build/code-cache.test.ts checks
 * that the two agree.
 */
const CHECK_FLAG = '--semi-space-growth-factor=1';

const sha256 = (data) => createHash('sha256').update(data).digest('hex');

/** The header a cache made now for `source` (the bundle's text) and `payload` must carry. */
function headerFor(source, payload) {
  return { format: FORMAT, source: sha256(source), node: process.version, v8: process.versions.v8, arch: process.arch, flag: CHECK_FLAG, payload: sha256(payload) };
}

/** The cache file's bytes: its header as one line of JSON, then V8's payload. */
function encodeCache(source, payload) {
  return Buffer.concat([Buffer.from(`${JSON.stringify(headerFor(source, payload))}\n`), payload]);
}

/**
 * V8's payload from a cache file's bytes, or undefined when anything about it does not match.
 * `source` is the bundle's text or its bytes as read (the same digest: text is hashed as UTF-8).
 */
function decodeCache(bytes, source) {
  if (bytes === undefined) return undefined;
  const end = bytes.indexOf(10);
  if (end < 0 || end > 4096) return undefined;
  let header;
  try {
    header = JSON.parse(bytes.subarray(0, end).toString('utf8'));
  } catch {
    return undefined;
  }
  const payload = bytes.subarray(end + 1);
  if (header === null || typeof header !== 'object') return undefined;
  const expected = headerFor(source, payload);
  for (const key of Object.keys(expected)) if (header[key] !== expected[key]) return undefined;
  return payload;
}

/**
 * Compiles and runs the bundle `file` (its code cache `cacheFile`, if usable) and returns its exports
 * with `script` (for making a cache) and `cacheUsed` (the cache passed every check, V8's included).
 * `forCheck` sets the check command's V8 flag first, which the cache was made with.
 */
function loadBundle(file, cacheFile, forCheck) {
  if (forCheck) setFlagsFromString(CHECK_FLAG);
  // The bundle is written in ASCII (scripts/ascii-source.js): its bytes are hashed as read and taken
  // as one-byte text without decoding; a bundle with any other byte is decoded as UTF-8.
  const bytesOfSource = readFileSync(file);
  const source = isAscii(bytesOfSource) ? bytesOfSource.toString('latin1') : bytesOfSource.toString('utf8');
  let bytes;
  if (forCheck) {
    try {
      bytes = readFileSync(cacheFile);
    } catch {
      // No cache: compile from the text.
    }
  }
  const cachedData = decodeCache(bytes, bytesOfSource);
  const script = new vm.Script(`(function (exports, require, module, __filename, __dirname, __firnlineImport) {${source}\n})`, { filename: file, cachedData });
  const module = { exports: {} };
  // The bundle's one dynamic import (tinypool, an ES module package) is the launcher's own.
  script.runInThisContext()(module.exports, createRequire(file), module, file, dirname(file), (specifier) => import(specifier));
  return { exports: module.exports, script, cacheUsed: cachedData !== undefined && !script.cachedDataRejected };
}

module.exports = { loadBundle, encodeCache, decodeCache, CHECK_FLAG, FORMAT };
