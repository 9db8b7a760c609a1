#!/usr/bin/env node
// Makes docs/review-page.png, the README's picture of the review page: the built CLI writes the page
// for the demo newsletter, and Debian's Chromium (driven by playwright-core) photographs its top.
import { execFileSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { chromium } from 'playwright-core';

const root = fileURLToPath(new URL('..', import.meta.url));
const page = join(mkdtempSync(join(tmpdir(), 'firnline-shot-')), 'review.html');
try {
  execFileSync(process.execPath, ['bin/firnline.js', 'check', 'examples/winter-newsletter.md', '--format', 'html', '-o', page], { cwd: root });
} catch (error) {
  if (error.status !== 1) throw error; // exit status 1: the newsletter has flags, as intended
}
const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox'] });
const tab = await browser.newPage({ viewport: { width: 1000, height: 1250 } });
await tab.goto(pathToFileURL(page).href);
await tab.screenshot({ path: join(root, 'docs', 'review-page.png') });
await browser.close();
