/**
 * Who may sign: the `reviewers` list of firnline.yaml, and the git identity that runs
 * `firnline signoff`. With a list, `--by` must name a listed reviewer; a reviewer listed with a
 * `git` identity (an e-mail address, or `Name <email>`) may sign only from a git work tree whose
 * configured identity has that address. Without a list anyone may sign, as before.
 *
 *   reviewers:
 *     - name: Dr A. Rahman
 *       git: a.rahman@example.org
 */
import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import { FirnlineError } from '../errors.js';

/** One reviewer allowed to sign. */
export interface Reviewer {
  name: string;
  /** The commit identity's e-mail address (from `git: a@b` or `git: Name <a@b>`). */
  git?: string;
}

/** The identity git would put on a commit in `cwd`, or undefined outside a git work tree. */
export interface GitIdentity {
  name: string;
  email: string;
}

/** `Name <email>`, as the ledger's `git_identity` records it. */
export function formatGitIdentity(identity: GitIdentity): string {
  return `${identity.name} <${identity.email}>`;
}

/** The e-mail address inside `Name <email>`, or the text itself. */
export function emailOf(text: string): string {
  return (/<([^>]+)>/u.exec(text)?.[1] ?? text).trim().toLowerCase();
}

/** Reads `user.name` and `user.email` through git; undefined outside a work tree or without git. */
export async function readGitIdentity(cwd: string): Promise<GitIdentity | undefined> {
  const run = promisify(execFile);
  try {
    await run('git', ['rev-parse', '--is-inside-work-tree'], { cwd });
  } catch {
    return undefined;
  }
  const get = async (key: string) => (await run('git', ['config', key], { cwd }).catch(() => ({ stdout: '' }))).stdout.trim();
  return { name: await get('user.name'), email: await get('user.email') };
}

/** Folds case and white space, so "dr a.  rahman" is "Dr A. Rahman". */
function sameName(a: string, b: string): boolean {
  const fold = (t: string) => t.replace(/\s+/gu, ' ').trim().toLowerCase();
  return fold(a) === fold(b);
}

/**
 * The reviewer `by` names, checked against the list and the git identity. Throws a one-line error
 * naming the settings file when the name is not listed or the identity does not match.
 */
export function checkReviewer(by: string, reviewers: readonly Reviewer[], git: GitIdentity | undefined, settingsFile: string): Reviewer {
  if (reviewers.length === 0) return { name: by };
  const listed = reviewers.find((r) => sameName(r.name, by));
  if (listed === undefined) {
    throw new FirnlineError(
      'signoff-reviewer-not-allowed',
      `"${by}" is not among the reviewers allowed to sign in ${settingsFile} (${reviewers.map((r) => r.name).join(', ')}); nothing was recorded. Ask the project lead to add them under \`reviewers\`, or sign as yourself`,
    );
  }
  if (listed.git !== undefined && git !== undefined) {
    const expected = emailOf(listed.git);
    if (git.email === '' || emailOf(git.email) !== expected) {
      const have = git.email === '' ? 'no git user.email is set here' : `git here is configured as ${formatGitIdentity(git)}`;
      throw new FirnlineError(
        'signoff-identity-mismatch',
        `${listed.name} signs with the git identity ${expected} (${settingsFile}), but ${have}; nothing was recorded. Sign from ${listed.name}'s own account`,
      );
    }
  }
  return listed;
}
