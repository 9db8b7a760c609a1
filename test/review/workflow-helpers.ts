import { execFileSync } from 'node:child_process';
import { mkdir, mkdtemp, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { main } from '../../src/cli/main.js';

/** Runs `firnline <argv>` in memory in `cwd`; returns the exit status and what it printed. */
export async function firnline(cwd: string, ...argv: string[]): Promise<{ code: number; out: string }> {
  let out = '';
  const write = (t: string) => void (out += t);
  const code = await main(argv, { cwd, env: {}, isTTY: false, stdout: write, stderr: write, readStdin: async () => '' });
  return { code, out };
}

/** A fresh git repository with one committed draft. */
export async function draftRepository(draft: string): Promise<string> {
  const dir = await mkdtemp(join(tmpdir(), 'firnline-workflow-'));
  const git = (...args: string[]) => execFileSync('git', args, { cwd: dir, encoding: 'utf8' });
  git('init', '-q');
  git('config', 'user.email', 'desk@harrow-vale.example');
  git('config', 'user.name', 'Harrow Vale science desk');
  await mkdir(join(dir, 'drafts'));
  await writeFile(join(dir, 'drafts', 'ice-hall.md'), draft);
  git('add', '.');
  git('commit', '-q', '-m', 'First draft of the ice hall panels');
  return dir;
}

// Panels for the invented Harrow Vale Science Museum's ice hall. The values are the accepted ones:
// the EPICA Dome C record spans about 800,000 years (EPICA community members 2004, Nature 429, 623;
// Jouzel et al. 2007, Science 317, 793); CO2 stood near 180-190 ppm at the Last Glacial Maximum
// (Monnin et al. 2001, Science 291, 112) and near 280 ppm before industrialisation (IPCC AR6 WG1,
// Gulev et al. 2021, ch. 2: 278 ppm in 1750).
export const RECORD = 'The EPICA Dome C ice core reaches back about 800,000 years.';
export const LGM = 'At the Last Glacial Maximum, atmospheric CO2 stood near 185 ppm.';
export const PREINDUSTRIAL = 'Before industrialisation, CO2 was about 280 ppm.';
export const ICE_HALL = `# The long record\n\n${RECORD}\n\n# Carbon dioxide\n\n${LGM}\n\n${PREINDUSTRIAL}\n`;
