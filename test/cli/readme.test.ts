import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCli } from './run-cli.js';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const README = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');

describe('the README', () => {
  it('gives exactly the two quick-start commands', () => {
    const quick = /## Quick start\n\n```sh\n([\s\S]*?)\n```/u.exec(README)?.[1];
    expect(quick).toBe('npm install && npx firnline check examples\nnpm test');
  });

  it('shows what `firnline check examples` really prints: the same flags, places and summary', async () => {
    const shown = /```text\n([\s\S]*?)\n```/u.exec(README)?.[1] ?? '';
    const run = await runCli(['check', 'examples'], ROOT);
    expect(run.code).toBe(1);
    const heads = (text: string) => [...text.matchAll(/^\s*(examples\/\S+:\d+:\d+ · \w+ · \S+)$/gmu)].map((m) => m[1]).sort();
    expect(heads(shown)).toEqual(heads(run.stdout));
    const summary = (text: string) => /^Checked .*$/mu.exec(text)?.[0];
    expect(summary(shown)).toBe(summary(run.stdout));
    // The blocks shown in full are the real blocks, word for word.
    for (const block of shown.split('\n\n').filter((b) => b.startsWith('examples/'))) expect(run.stdout).toContain(block);
  });

  it('states the cautions', () => {
    expect(README).toContain('Firnline supports, and does not replace, expert review.');
    expect(README).toMatch(/Reference values carry uncertainty and\s+dates/u);
  });

  it('points CI at exactly the README test command', () => {
    const ci = readFileSync(new URL('../../.ci/run', import.meta.url), 'utf8');
    expect(ci).toMatch(/\nnpm ci\nnpm test\n$/u);
  });
});
