import { existsSync } from 'node:fs';
import { mkdtemp, stat } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { reviewPage } from './review-drafts.js';

// Debian's Chromium, installed by .ci/run (apt-get install chromium); playwright-core brings no browser.
const CHROMIUM = '/usr/bin/chromium';

let browser: Browser;
let page: Page;
const requests: string[] = [];
const problems: string[] = [];

beforeAll(async () => {
  if (!existsSync(CHROMIUM)) throw new Error(`${CHROMIUM} is missing: run .ci/run, or apt-get install -y chromium`);
  const { path } = await reviewPage();
  browser = await chromium.launch({ executablePath: CHROMIUM, args: ['--no-sandbox'] });
  page = await browser.newPage({ viewport: { width: 1100, height: 900 } });
  page.setDefaultTimeout(10_000);
  page.on('request', (request) => requests.push(request.url()));
  page.on('console', (message) => {
    if (message.type() === 'error') problems.push(message.text());
  });
  page.on('pageerror', (error) => problems.push(error.message));
  await page.goto(pathToFileURL(path).href);
}, 60_000);

afterAll(async () => {
  await browser?.close();
});

const visibleRules = async (): Promise<string[]> =>
  page.locator('.flag:visible').evaluateAll((flags) => flags.map((f) => f.getAttribute('data-rule') ?? ''));

describe('the review page in a real browser (Chromium)', () => {
  it('loads with nothing fetched but the page itself, and no script error or policy violation', () => {
    expect(requests).toHaveLength(1);
    expect(requests[0]).toMatch(/^file:.*review\.html$/u);
    expect(problems).toEqual([]);
  });

  it('renders every number line with a non-zero size, its bars inside the plot', async () => {
    const plots = page.locator('svg.number-line');
    expect(await plots.count()).toBe(3);
    for (const plot of await plots.all()) {
      const box = await plot.boundingBox();
      expect(box?.width).toBeGreaterThan(200);
      expect(box?.height).toBeGreaterThan(30);
      const bar = await plot.locator('.draft .bar').boundingBox();
      const band = await plot.locator('.reference rect').first().boundingBox();
      expect(bar?.width).toBeGreaterThan(0);
      expect(band?.width).toBeGreaterThan(0);
      expect((bar?.x ?? 0) >= (box?.x ?? 0) && (bar?.x ?? 0) + (bar?.width ?? 0) <= (box?.x ?? 0) + (box?.width ?? 0) + 1).toBe(true);
    }
  });

  it('hides and shows flags by level and by rule, and says how many are shown', async () => {
    expect(await visibleRules()).toEqual(['value.edc-record-span', 'logic.lag-rules-out-cause', 'value.co2-preindustrial-1750', 'value.vostok-record-span']);
    expect(await page.locator('#shown').textContent()).toBe('Showing 4 of 4 flags');

    await page.locator('input[name=level][value=error]').uncheck();
    expect(await visibleRules()).toEqual(['logic.lag-rules-out-cause']);
    expect(await page.locator('#shown').textContent()).toBe('Showing 1 of 4 flags');
    // A file whose claims are all hidden is hidden too.
    expect(await page.locator('section.file:visible h2').allTextContents()).toEqual(['drafts/cores.md']);

    await page.locator('input[name=level][value=error]').check();
    await page.locator('select[name=rule]').selectOption('value.vostok-record-span');
    expect(await visibleRules()).toEqual(['value.vostok-record-span']);
    expect(await page.locator('section.file:visible h2').allTextContents()).toEqual(['drafts/page.html']);

    await page.locator('select[name=rule]').selectOption('');
    expect(await visibleRules()).toHaveLength(4);
  });

  it('takes a screenshot of the page', async () => {
    const folder = await mkdtemp(join(tmpdir(), 'firnline-review-shot-'));
    const file = join(folder, 'review-page.png');
    await page.screenshot({ path: file, fullPage: true });
    expect((await stat(file)).size).toBeGreaterThan(10_000);
  });

  it('prints without the filter controls', async () => {
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('#filters').isVisible()).toBe(false);
    expect(await page.locator('svg.number-line').first().isVisible()).toBe(true);
    await page.emulateMedia({ media: 'screen' });
  });
});
