/**
 * micromark's initial text constructs: the module `lib/initialize/text.js` of each build of the
 * package on disk (`lib/` by default, `dev/lib/` under the `development` condition), which
 * micromark-linear-text.ts wraps. The package does not export that module, so it is imported by
 * its file, once, here (the one top-level await of the load path).
 *
 * The bundled command line (scripts/build-bundle.js) replaces this module with a static import of
 * the same file of the micromark build it bundles: the bundle holds its own copy of micromark, and
 * only a static import reaches that copy, not the one on disk.
 */
import { existsSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join, sep } from 'node:path';
import { pathToFileURL } from 'node:url';

/** The exports of one `lib/initialize/text.js` that the wrapper touches (each an initial construct). */
export interface InitialTextModule {
  text?: unknown;
  string?: unknown;
  resolver?: unknown;
}

/** The micromark package folder, found from the entry point the resolver picks. */
function packageFolder(): string {
  const entry = createRequire(import.meta.url).resolve('micromark');
  const marker = `${sep}micromark${sep}`;
  return entry.slice(0, entry.lastIndexOf(marker) + marker.length);
}

const found: InitialTextModule[] = [];
const folder = packageFolder();
for (const build of ['lib', join('dev', 'lib')]) {
  const file = join(folder, build, 'initialize', 'text.js');
  if (existsSync(file)) found.push((await import(pathToFileURL(file).href)) as InitialTextModule);
}

/** Every build's initial text module, in the order `lib/`, `dev/lib/`. */
export const initialTextModules: readonly InitialTextModule[] = found;
