import { mkdtemp, mkdir, readFile, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../../cli/run-cli.js';
import { buildDocx, heading, paragraph } from '../../source/word/build-docx.js';

/*
 * Three drafts of our own, one per format, for the review page tests. Each numbered sentence is
 * wrong against a published value:
 * - the Vostok record spans about 420,000 years (Petit et al. 1999, Nature 399, 429-436, doi:10.1038/20859);
 * - CO2 in 1750 was about 278 ppm (IPCC AR6 WGI, Gulev et al. 2021, section 2.2.3);
 * - the EPICA Dome C record spans about 800,000 years (Jouzel et al. 2007, Science 317, 793-796,
 *   doi:10.1126/science.1141038);
 * - CO2 trailing Antarctic temperature does not rule out CO2 as a cause (Shakun et al. 2012, Nature 484, 49-54).
 * The HTML draft carries markup-like text as prose (`&lt;b onmouseover=...&gt;`), which the page must
 * show as text and never as markup.
 */
export const HOSTILE = '<b onmouseover="alert(1)">';

const MARKDOWN = [
  '# Ice cores',
  '',
  'The EPICA Dome C core holds a climate record spanning 400,000 years.',
  '',
  'CO2 rose after Antarctic temperature, so CO2 cannot have caused the warming.',
  '',
  'The museum shop sells postcards.',
  '',
].join('\n');

const HTML = [
  '<!doctype html><html><head><title>t</title></head><body>',
  '<h1>Cores &amp; &lt;CO2&gt;</h1>',
  '<p>The Vostok ice core spans 800,000 years &lt;b onmouseover="alert(1)"&gt;.</p>',
  '</body></html>',
  '',
].join('\n');

const DOCX = buildDocx([heading('Before industry'), paragraph(['Before the industrial era, atmospheric CO2 stood near 350 ppm.'])].join(''));

/** Writes the three drafts to a new folder and returns it. */
export async function reviewDrafts(): Promise<string> {
  const dir = await mkdtemp(join(tmpdir(), 'firnline-review-'));
  await mkdir(join(dir, 'drafts'));
  await writeFile(join(dir, 'drafts', 'cores.md'), MARKDOWN);
  await writeFile(join(dir, 'drafts', 'page.html'), HTML);
  await writeFile(join(dir, 'drafts', 'letter.docx'), DOCX);
  return dir;
}

/** `firnline check drafts --format html -o review.html` in a fresh folder: the page and its path. */
export async function reviewPage(): Promise<{ dir: string; path: string; html: string }> {
  const dir = await reviewDrafts();
  const run = await runCli(['check', 'drafts', '--format', 'html', '-o', 'review.html'], dir);
  if (run.code !== 1) throw new Error(`check exited ${run.code}: ${run.stderr}`);
  const path = join(dir, 'review.html');
  return { dir, path, html: await readFile(path, 'utf8') };
}
