/**
 * Issue 15, "Done when": the sign-off gate scripted end to end in a fresh git repository. A docs
 * repository of an invented museum ("Tarnbrook Museum of the Cold", demo wording) holds two drafts
 * with seeded errors in paragraphs, front matter, a table, image alt text and an HTML caption. The
 * test proves: no seeded error reaches a green gate without having been in front of the expert; a
 * rename and copy-edits keep sign-offs; a meaning change reopens with a marked diff; and the
 * exit status, JUnit, SARIF and JSON agree in every state.
 */
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { Ajv2020 } from 'ajv/dist/2020.js';
import type { FormatsPlugin } from 'ajv-formats';
import { mkdir, mkdtemp, readFile, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readLedger } from '../../src/review/read-ledger.js';
import type { Checklist } from '../../src/report/checklist-json.js';
import { firnline } from '../review/workflow-helpers.js';

// Each seeded error, the words that find it, and the accepted value (the correction the editor makes).
// Vostok spans ~420,000 years: Petit et al. 1999, Nature 399, 429-436.
// EPICA Dome C spans ~800,000 years: Jouzel et al. 2007, Science 317, 793-796.
// LGM sea level ~120-130 m below present: Lambeck et al. 2014, PNAS 111, 15296-15303.
// Glacial-maximum CO2 ~180-190 ppm: Monnin et al. 2001, Science 291, 112-114; Lüthi et al. 2008, Nature 453, 379-382.
// Global temperature lagged CO2 in the last deglaciation, and Antarctica is not the globe:
// Shakun et al. 2012, Nature 484, 49-54.
const SEEDED = [
  { find: 'spans about 2 million years', fix: ['about 2 million years', 'about 420,000 years'] },
  { find: 'reaches back about 800,000 years', fix: ['Vostok core from East Antarctica reaches back about 800,000', 'Vostok core from East Antarctica reaches back about 420,000'] },
  { find: 'sea level was about 50 metres lower', fix: ['about 50 metres lower', 'about 120 to 130 metres lower'] },
  { find: 'CO2 stood near 100 ppm', fix: ['near 100 ppm', 'near 185 ppm'] },
  { find: 'EPICA Dome C, Span: 420,000 years', fix: ['| EPICA Dome C | 420,000 |', '| EPICA Dome C | 800,000 |'] },
  { find: 'CO2 stood near 1,000 ppm', fix: ['near 1,000 ppm during', 'near 185 ppm during'] },
  { find: 'global temperature rose before CO2', fix: ['show that global temperature rose before CO2 at the end of every ice age', 'show that Antarctic temperature rose with CO2 at the end of the last ice age'] },
  { find: 'CO2 cannot have caused the warming', fix: ['Because the CO2 rise lagged the warming by several centuries, CO2 cannot have caused the warming.', 'The CO2 rise amplified the warming that orbital changes began.'] },
  { find: 'CO2 stood near 400 ppm', fix: ['near 400 ppm', 'near 190 ppm'] },
  // A causal claim without a number (Shakun et al. 2012 again: CO2 was both a feedback and a driver).
  { find: 'CO2 was an effect of the warming, not a cause', fix: ['CO2 was an effect of the warming, not a cause.', 'CO2 was both an effect of the warming and a cause of further warming.'] },
] as const;

// Correct claims (values as above; pre-industrial 278 ppm in 1750: Gulev et al. 2021, IPCC AR6 WG1 ch. 2).
const RIGHT_EDC = 'The EPICA Dome C core reaches back about 800,000 years.';
const RIGHT_PI = 'Before industrialisation, CO2 was about 280 ppm.';

const ICE_CORES = `---
title: Reading the ice
description: The Vostok ice core spans about 2 million years of climate.
tags: [ice, cores]
---

# Ice cores

The Vostok core from East Antarctica reaches back about 800,000 years.

${RIGHT_EDC}

During the last ice age, CO2 stood near 100 ppm.

CO2 was an effect of the warming, not a cause.

| Core | Span (years) |
| --- | --- |
| EPICA Dome C | 420,000 |

![Chart: CO2 stood near 1,000 ppm during the last ice age](co2.png)

Antarctic ice cores show that global temperature rose before CO2 at the end of every ice age.

Because the CO2 rise lagged the warming by several centuries, CO2 cannot have caused the warming.
`;

const SEA_LEVEL = `# Sea level

At the Last Glacial Maximum, sea level was about 50 metres lower – the coast lay far out.

${RIGHT_PI}

<figure><img src="shore.png" alt="A drowned shoreline"><figcaption>During the last ice age, CO2 stood near 400 ppm.</figcaption></figure>
`;

const SETTINGS = `include: ["drafts/**/*.md"]
reviewers:
  - name: Dr A. Rahman
    git: a.rahman@tarnbrook.example
`;

/** A fresh git repository with the settings and both drafts committed. */
async function museumRepository(): Promise<{ dir: string; git: (...args: string[]) => string }> {
  const dir = await mkdtemp(join(tmpdir(), 'firnline-issue15-'));
  const git = (...args: string[]) => execFileSync('git', args, { cwd: dir, encoding: 'utf8' });
  git('init', '-q');
  git('config', 'user.email', 'web-desk@tarnbrook.example');
  git('config', 'user.name', 'Tarnbrook web desk');
  await mkdir(join(dir, 'drafts'));
  await writeFile(join(dir, 'firnline.yaml'), SETTINGS);
  await writeFile(join(dir, 'drafts', 'ice-cores.md'), ICE_CORES);
  await writeFile(join(dir, 'drafts', 'sea-level.md'), SEA_LEVEL);
  git('add', '.');
  git('commit', '-q', '-m', 'First drafts');
  return { dir, git };
}

// The OASIS SARIF 2.1.0 schema, as shipped in the SARIF SDK package (draft 2020-12; strict off), and
// our own report schema.
const sarifAjv = new Ajv2020({ strict: false, allErrors: true });
(createRequire(import.meta.url)('ajv-formats') as FormatsPlugin)(sarifAjv);
const validateSarif = sarifAjv.compile(
  JSON.parse(readFileSync(new URL('../../node_modules/@microsoft/sarif-multitool-linux/sarif-2.1.0.json', import.meta.url), 'utf8')) as object,
);
const validateJson = new Ajv2020({ strict: true, allErrors: true }).compile(
  JSON.parse(readFileSync(new URL('../../schemas/report.schema.json', import.meta.url), 'utf8')) as object,
);

interface Reports {
  code: number;
  text: string;
  junitFailures: number;
  sarifBlocking: { ruleId: string; message: string }[];
  jsonBlocking: number;
}

/**
 * Runs the gate once per format and checks that they agree with the exit status: JUnit's failure
 * count (JUnit XML, Ant/Surefire shape), SARIF 2.1.0 results at level "error" without an accepted
 * suppression (SARIF §3.27.10, §3.35), and the JSON report's error flags without a sign-off.
 */
async function gate(dir: string, ...extra: string[]): Promise<Reports> {
  const base = ['check', '--require-signoff', ...extra];
  const text = await firnline(dir, ...base);
  const junit = await firnline(dir, ...base, '--format', 'junit', '-o', 'out/report.xml');
  const sarif = await firnline(dir, ...base, '--format', 'sarif', '-o', 'out/report.sarif');
  const json = await firnline(dir, ...base, '--format', 'json', '-o', 'out/report.json');
  expect([junit.code, sarif.code, json.code]).toEqual([text.code, text.code, text.code]);
  const xml = await readFile(join(dir, 'out/report.xml'), 'utf8');
  const junitFailures = Number(/<testsuites [^>]*failures="(\d+)"/u.exec(xml)?.[1] ?? NaN);
  const log = JSON.parse(await readFile(join(dir, 'out/report.sarif'), 'utf8')) as {
    runs: { results: { ruleId: string; level: string; message: { text: string }; suppressions?: unknown[] }[] }[];
  };
  const sarifBlocking = (log.runs[0]?.results ?? [])
    .filter((r) => r.level === 'error' && (r.suppressions ?? []).length === 0)
    .map((r) => ({ ruleId: r.ruleId, message: r.message.text }));
  const report = JSON.parse(await readFile(join(dir, 'out/report.json'), 'utf8')) as { flags: { level: string; signoff?: unknown }[] };
  expect(validateSarif(log), JSON.stringify(validateSarif.errors)).toBe(true);
  expect(validateJson(report), JSON.stringify(validateJson.errors)).toBe(true);
  const jsonBlocking = report.flags.filter((f) => f.level === 'error' && f.signoff === undefined).length;
  // The three reports and the exit status say the same thing.
  expect(junitFailures > 0).toBe(text.code === 1);
  expect(sarifBlocking.length > 0).toBe(text.code === 1);
  expect(jsonBlocking > 0).toBe(text.code === 1);
  return { code: text.code, text: text.out, junitFailures, sarifBlocking, jsonBlocking };
}

/** The checklist's box line holding `words`, changed by `edit`. */
function onBox(checklist: string, words: string, edit: (line: string) => string): string {
  const lines = checklist.split('\n');
  const at = lines.findIndex((l) => /^- \[[ x]\] \*\*c[0-9a-f]{10}/u.test(l) && l.includes(words));
  expect(at, `a box for "${words}"`).toBeGreaterThanOrEqual(0);
  lines[at] = edit(lines[at] ?? '');
  return lines.join('\n');
}

const tick = (line: string) => line.replace('- [ ]', '- [x]');

describe('issue 15: a sign-off gate that means what it says', () => {
  it('puts every seeded error in front of the expert, keeps sign-offs through a rename and copy-edits, reopens a meaning change, and every report agrees', async () => {
    const { dir, git } = await museumRepository();

    // 1. Nothing reviewed: the gate is red, and every seeded error is a claim on the checklist,
    //    wherever it stands (paragraph, front matter, table cell, alt text, HTML caption).
    const first = await gate(dir);
    expect(first.code).toBe(1);
    expect(first.sarifBlocking.filter((r) => r.ruleId === 'signoff.open').length).toBeGreaterThanOrEqual(SEEDED.length + 2);
    const made = await firnline(dir, 'checklist', '-o', 'review/round-1/checklist.md');
    expect(made.code).toBe(0); // -o made the folder
    let checklist = await readFile(join(dir, 'review/round-1/checklist.md'), 'utf8');
    for (const seeded of SEEDED) expect(checklist, seeded.find).toContain(seeded.find);

    // 2. The expert reviews: ticks the two correct claims, asks for changes in three ways (a
    //    bracketed mark, a note, and a remark typed after the sentence) and leaves a waiver on an
    //    unticked box by mistake.
    checklist = onBox(checklist, RIGHT_EDC, tick);
    checklist = onBox(checklist, RIGHT_PI, tick);
    checklist = onBox(checklist, SEEDED[2].find, (l) => `${l} wrong: sea level was about 120 to 130 m lower`);
    checklist = onBox(checklist, SEEDED[0].find, (l) => `${l} (needs change: Vostok spans about 420,000 years, Petit et al. 1999)`);
    checklist = onBox(checklist, SEEDED[1].find, (l) => `${l} (note: that is the EPICA Dome C figure; Vostok is about 420,000 years)`);
    for (const seeded of SEEDED.slice(3)) checklist = onBox(checklist, seeded.find, (l) => `${l} (needs change: see the sources)`);
    checklist = onBox(checklist, SEEDED[8].find, (l) => `${l} (waived: fine)`);
    await writeFile(join(dir, 'review/round-1/checklist.md'), checklist);

    // Only listed reviewers sign, and only from their own git identity.
    const stranger = await firnline(dir, 'signoff', '--from', 'review/round-1/checklist.md', '--by', 'Summer Intern');
    expect(stranger.code).toBe(2);
    expect(stranger.out).toContain('"Summer Intern" is not among the reviewers allowed to sign in firnline.yaml (Dr A. Rahman)');
    const borrowed = await firnline(dir, 'signoff', '--from', 'review/round-1/checklist.md', '--by', 'Dr A. Rahman');
    expect(borrowed.code).toBe(2);
    expect(borrowed.out).toContain('git here is configured as Tarnbrook web desk <web-desk@tarnbrook.example>');
    git('config', 'user.email', 'a.rahman@tarnbrook.example');
    git('config', 'user.name', 'Aisha Rahman');
    const signed = await firnline(dir, 'signoff', '--from', 'review/round-1/checklist.md', '--by', 'Dr A. Rahman');
    expect(signed.code).toBe(0);
    expect(signed.out).toContain(`Recorded 2 sign-offs and ${SEEDED.length} needs-change comments by Dr A. Rahman in firnline-signoffs.yaml.`);
    expect(signed.out).toMatch(/Not recorded, and why:\n {2}review\/round-1\/checklist\.md:\d+: "\(waived: fine\)" is on an unticked box; tick the box to record it\./u);
    const ledger = (await readLedger(join(dir, 'firnline-signoffs.yaml'))).signoffs;
    expect(new Set(ledger.map((e) => e.gitIdentity))).toEqual(new Set(['Aisha Rahman <a.rahman@tarnbrook.example>']));
    expect(ledger.find((e) => e.text.includes('50 metres'))).toMatchObject({ decision: 'needs-change', reason: 'wrong: sea level was about 120 to 130 m lower' });

    // 3. The comments reach the editor: a plain check shows them on the claims and fails.
    const plain = await firnline(dir, 'check');
    expect(plain.code).toBe(1);
    expect(plain.out).toContain('signoff.needs-change');
    expect(plain.out).toContain('Dr A. Rahman on ');
    expect(plain.out).toContain('marked this claim as needing a change: wrong: sea level was about 120 to 130 m lower');
    const reviewed = await gate(dir);
    expect(reviewed.code).toBe(1);
    expect(reviewed.sarifBlocking.filter((r) => r.ruleId === 'signoff.needs-change')).toHaveLength(SEEDED.length);

    // 4. The editor corrects every seeded error. Each corrected claim is "changed since" its
    //    needs-change comment, with the changed words marked, so the gate stays red.
    let iceCores = ICE_CORES;
    let seaLevel = SEA_LEVEL;
    for (const { fix } of SEEDED) {
      iceCores = iceCores.replace(fix[0], fix[1]);
      seaLevel = seaLevel.replace(fix[0], fix[1]);
    }
    await writeFile(join(dir, 'drafts', 'ice-cores.md'), iceCores);
    await writeFile(join(dir, 'drafts', 'sea-level.md'), seaLevel);
    git('commit', '-qam', 'Corrections from the review');
    const corrected = await gate(dir);
    expect(corrected.code).toBe(1);
    expect(corrected.text).toContain('changed:    At the Last Glacial Maximum, sea level was about [50 → 120 to 130] metres lower');
    expect(corrected.text).toContain('changed:    During the last ice age, CO2 stood near [100 → 185] ppm.');

    // 5. The next checklist holds only what still needs the expert; every box ticked, the gate is green.
    const open = await firnline(dir, 'checklist', '--open', '--format', 'json');
    const round2 = JSON.parse(open.out) as Checklist;
    // The seven corrected numbers are claims changed since the comment; the reasoning errors were
    // rewritten, and a rewritten sentence is changed since its comment when its words are close
    // enough, else a new open claim: either way it goes back in front of the expert.
    const statuses = round2.claims.map((c) => c.signoff.status);
    expect(statuses.filter((s) => s === 'stale').length).toBeGreaterThanOrEqual(7);
    expect(statuses.every((s) => s === 'stale' || s === 'open')).toBe(true);
    expect(round2.claims.map((c) => c.sentence)).toContain('CO2 was both an effect of the warming and a cause of further warming.');
    await firnline(dir, 'checklist', '--open', '-o', 'review/round-2.md');
    const ticked = (await readFile(join(dir, 'review/round-2.md'), 'utf8')).replaceAll('- [ ] **', '- [x] **');
    await writeFile(join(dir, 'review/round-2.md'), ticked);
    expect((await firnline(dir, 'signoff', '--from', 'review/round-2.md', '--by', 'Dr A. Rahman')).code).toBe(0);
    const green = await gate(dir);
    expect(green).toMatchObject({ code: 0, junitFailures: 0, sarifBlocking: [], jsonBlocking: 0 });

    // 6. A rename keeps every sign-off and says where they came from.
    await mkdir(join(dir, 'drafts', 'exhibits'));
    git('mv', 'drafts/ice-cores.md', 'drafts/exhibits/ice-cores.md');
    git('commit', '-qm', 'Move the ice-core panel');
    const renamed = await gate(dir);
    expect(renamed.code).toBe(0);
    expect(renamed.text).toContain('signed off, moved from drafts/ice-cores.md: drafts/exhibits/ice-cores.md:');

    // 7. Copy-edits that change no meaning keep them too: dash, spelling, quotes, white space.
    const copyEdited = seaLevel.replace(' – ', ' - ').replace('metres', 'meters').replace('Last Glacial Maximum,', 'Last  Glacial Maximum,');
    await writeFile(join(dir, 'drafts', 'sea-level.md'), copyEdited);
    expect((await gate(dir)).code).toBe(0);

    // 8. A meaning change (a direction word) reopens the claim, with the change marked.
    await writeFile(join(dir, 'drafts', 'sea-level.md'), copyEdited.replace('meters lower', 'meters higher'));
    const reopened = await gate(dir);
    expect(reopened.code).toBe(1);
    expect(reopened.junitFailures).toBe(1);
    expect(reopened.sarifBlocking.map((r) => r.ruleId)).toEqual(['signoff.changed']);
    expect(reopened.sarifBlocking[0]?.message).toContain('[lower → higher]');
  }, 120_000);
});
