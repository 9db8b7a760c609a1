// Module hooks that let plain Node run Firnline's TypeScript sources, so a test can run the CI shell
// recipe as a real child process: `node --import ./ts-register.mjs ./firnline-from-source.mjs ...`.
// Relative `.js` imports are served from the `.ts` file beside them, compiled by TypeScript
// (transpile only: type-checking is the test suite's job, not this runner's).
import { createHash } from 'node:crypto';
import { mkdir, readFile, rename, writeFile } from 'node:fs/promises';
import { existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';

// Transpiled output is kept by content hash, so the recipe's several child processes (and later
// runs) compile each module once: on a loaded machine, transpiling every module in every process
// took most of the test's time. TypeScript itself (several megabytes) is loaded only on a miss.
const TS_VERSION = createRequire(import.meta.url)('typescript/package.json').version;
const CACHE = join(tmpdir(), `firnline-ts-hooks-${TS_VERSION}`);
let typescript;

export async function resolve(specifier, context, next) {
  if ((specifier.startsWith('.') || specifier.startsWith('/')) && specifier.endsWith('.js') && context.parentURL?.startsWith('file:')) {
    const url = new URL(specifier.replace(/\.js$/u, '.ts'), context.parentURL);
    if (existsSync(fileURLToPath(url))) return { url: url.href, shortCircuit: true, format: 'module' };
  }
  return next(specifier, context);
}

export async function load(url, context, next) {
  if (!url.endsWith('.ts')) return next(url, context);
  const source = await readFile(fileURLToPath(url), 'utf8');
  const cached = join(CACHE, `${createHash('sha256').update(url).update('\0').update(source).digest('hex')}.js`);
  const hit = await readFile(cached, 'utf8').catch(() => undefined);
  if (hit !== undefined) return { format: 'module', source: hit, shortCircuit: true };
  typescript ??= (await import('typescript')).default;
  const ts = typescript;
  const { outputText } = ts.transpileModule(source, {
    fileName: fileURLToPath(url),
    compilerOptions: { module: ts.ModuleKind.ESNext, target: ts.ScriptTarget.ES2022, verbatimModuleSyntax: true },
  });
  // Written beside and renamed into place, so a process reading at the same time never sees half a file.
  await mkdir(CACHE, { recursive: true });
  const partial = `${cached}.${process.pid}.${Date.now()}`;
  await writeFile(partial, outputText).then(() => rename(partial, cached)).catch(() => undefined);
  return { format: 'module', source: outputText, shortCircuit: true };
}
