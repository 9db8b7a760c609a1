// Other commands must not pay for the editor server: nothing the CLI loads at start imports the
// LSP libraries or src/lsp/ statically; only the `lsp` command imports them, when it runs.
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const SRC = fileURLToPath(new URL('../../src/', import.meta.url));
const STATIC_IMPORT = /^\s*import\s+(?!type\b)[^;]*?from\s+'([^']+)'/gmu;

async function staticImports(file: string): Promise<string[]> {
  const text = await readFile(file, 'utf8');
  return [...text.matchAll(STATIC_IMPORT)].map((m) => m[1] ?? '');
}

describe('lazy loading of the editor server', () => {
  it('keeps vscode-languageserver and src/lsp out of every static import outside src/lsp', async () => {
    const files = (await readdir(SRC, { recursive: true })).filter((f) => f.endsWith('.ts') && !f.startsWith('lsp'));
    expect(files.length).toBeGreaterThan(50);
    for (const file of files) {
      for (const specifier of await staticImports(join(SRC, file))) {
        expect(specifier, file).not.toMatch(/^vscode-|\/lsp\//u);
      }
    }
  });

  it('loads the server from the lsp command only when it runs', async () => {
    const text = await readFile(join(SRC, 'cli/commands/lsp.ts'), 'utf8');
    expect(text).toContain("import('../../lsp/server.js')");
  });
});
