// Module hooks that let plain Node run Firnline's TypeScript sources, so a test can run the CI shell
// recipe as a real child process: `node --import ./ts-register.mjs ./firnline-from-source.mjs ...`.
// Relative `.js` imports are served from the `.ts` file beside them, compiled by TypeScript
// (transpile only: type-checking is the test suite's job, not this runner's).
import { readFile } from 'node:fs/promises';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';

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
  const { outputText } = ts.transpileModule(source, {
    fileName: fileURLToPath(url),
    compilerOptions: { module: ts.ModuleKind.ESNext, target: ts.ScriptTarget.ES2022, verbatimModuleSyntax: true },
  });
  return { format: 'module', source: outputText, shortCircuit: true };
}
