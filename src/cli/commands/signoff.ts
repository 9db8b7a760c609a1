import type { Command } from 'commander';
import { Option } from 'commander';
import { readRegularText } from '../../guard/read-regular-file.js';
import { visibleLine } from '../../guard/visible-text.js';
import { relative, resolve } from 'node:path';
import { FirnlineError } from '../../errors.js';
import { readChecklistBoxes } from '../../report/checklist-remarks.js';
import { existsSync } from 'node:fs';
import type { SignoffRequest } from '../../review/plan-signoffs.js';
import { DECISIONS, ledgerDate, type Decision } from '../../review/signoff-entry.js';
import type { CliContext } from '../context.js';

interface SignoffFlags {
  from?: string;
  by?: string;
  decision?: Decision;
  reason?: string;
  note?: string;
  config?: string;
  pack: string[];
}

/** `firnline signoff`: record sign-offs in the ledger, from a ticked checklist or by claim id. */
export function registerSignoff(program: Command, ctx: CliContext): void {
  program
    .command('signoff')
    .description('record sign-offs in the ledger: every ticked box of a checklist (--from), or the claim ids given')
    .argument('[claim-ids...]', 'claim ids to sign off (as shown in the checklist)', [])
    .option('--from <checklist>', 'a ticked checklist made by `firnline checklist`')
    .option('--by <name>', 'who signs off (required)')
    .addOption(new Option('--decision <decision>', 'for claim ids: the decision (default approved)').choices([...DECISIONS]))
    .option('--reason <text>', 'for claim ids: what was corrected, why a waived claim stands, or what must change (needs-change)')
    .option('--note <text>', 'a remark recorded with each sign-off (a box\'s own "(note: ...)" wins)')
    .option('--config <file>', 'settings file to use instead of the firnline.yaml found by walking up')
    .option('--pack <file>', 'add a rule pack (repeatable)', (value: string, previous: string[]) => [...previous, value], [])
    .action(async (ids: string[], flags: SignoffFlags) => {
      const by = (flags.by ?? '').trim();
      if (by === '') throw new FirnlineError('signoff-no-reviewer', 'say who signs off: --by "Your Name"');
      if ((flags.from === undefined) === (ids.length === 0)) {
        throw new FirnlineError('signoff-what', 'give either --from CHECKLIST or one or more claim ids, not both and not neither');
      }
      if (flags.from !== undefined && (flags.decision !== undefined || flags.reason !== undefined)) {
        throw new FirnlineError('signoff-decision-from', 'with --from, write decisions on the ticked lines: (corrected: ...) or (waived: ...)');
      }
      // The engine, the rule-pack loader and the ledger load here, so that `--version` and `--help` stay light.
      const [{ checkPaths }, { checkReviewer, formatGitIdentity, readGitIdentity }, { checklistRequests }, { appendSignoffEntries }, { packVersionOf, planSignoffs }, { readLedger }, { checkOptionsOf, loadRunSettings }] =
        await Promise.all([
          import('../../engine.js'), import('../../review/reviewers.js'), import('../checklist-requests.js'), import('../../review/append-signoffs.js'),
          import('../../review/plan-signoffs.js'), import('../../review/read-ledger.js'), import('../run-settings.js'),
        ]);
      const run = await loadRunSettings(ctx.cwd, flags.config, flags.pack);
      const git = await readGitIdentity(ctx.cwd);
      const reviewer = checkReviewer(by, run.reviewers, git, relative(ctx.cwd, run.settingsFile ?? '') || 'firnline.yaml').name;
      const checklist = flags.from === undefined ? undefined : await readChecklist(resolve(ctx.cwd, flags.from), flags.from, ctx.cwd);
      const result = await checkPaths(checklist !== undefined && checklist.drafts.length > 0 ? checklist.drafts : ['.'], checkOptionsOf(run, ctx));
      const read = checklist === undefined ? { requests: fromIds(ids, flags), notRecorded: [], alreadySignedOff: 0 } : checklistRequests(checklist.text, checklist.shown, result.claims);
      if (checklist !== undefined && read.requests.length === 0 && read.notRecorded.length === 0 && read.alreadySignedOff === 0) {
        throw new FirnlineError('checklist-nothing-ticked', 'no ticked boxes (- [x]) and no comments in this checklist; tick the claims you have checked', { file: checklist.shown });
      }
      const withNote = read.requests.map((r) => (r.note === undefined && flags.note !== undefined ? { ...r, note: flags.note } : r));
      const plan = planSignoffs(withNote, result.claims, await readLedger(run.ledger, ctx.cwd), {
        reviewer,
        date: ledgerDate(),
        packVersion: packVersionOf(run.packs),
      });
      const identity = git === undefined || git.email === '' ? undefined : formatGitIdentity(git);
      const entries = identity === undefined ? plan.entries : plan.entries.map((e) => ({ ...e, gitIdentity: identity }));
      // Under the ledger lock, an entry another run recorded meanwhile is left out: report what was written.
      const written = await appendSignoffEntries(run.ledger, entries);
      const unchanged = plan.unchanged + entries.length - written.length;
      const changes = written.filter((e) => e.decision === 'needs-change').length;
      const signed = written.length - changes;
      const again = unchanged > 0 ? ` (${unchanged} already recorded as they are, left out)` : '';
      const comments = changes === 0 ? '' : ` and ${changes} needs-change comment${changes === 1 ? '' : 's'}`;
      const lines = [`Recorded ${signed} sign-off${signed === 1 ? '' : 's'}${comments} by ${visibleLine(reviewer)} in ${visibleLine(relative(ctx.cwd, run.ledger) || run.ledger)}${again}.`];
      if (read.alreadySignedOff > 0) lines.push(`${read.alreadySignedOff} box${read.alreadySignedOff === 1 ? ' was' : 'es were'} ticked because the sign-off already held; nothing new recorded for them.`);
      if (read.notRecorded.length > 0) lines.push('Not recorded, and why:', ...read.notRecorded.map((n) => `  ${visibleLine(n)}`));
      ctx.stdout(`${lines.join('\n')}\n`);
    });
}

function fromIds(ids: string[], flags: SignoffFlags): SignoffRequest[] {
  return ids.map((claimId): SignoffRequest => ({
    claimId,
    decision: flags.decision ?? 'approved',
    ...(flags.reason === undefined ? {} : { reason: flags.reason }),
    where: { file: 'command line' },
  }));
}

/** The checklist's text, and the drafts it covers (scanning only those is faster, and an id is only looked for where it was made). */
async function readChecklist(file: string, shown: string, cwd: string): Promise<{ text: string; shown: string; drafts: string[] }> {
  let text: string;
  try {
    text = await readRegularText(file, { shown, code: 'checklist-missing' });
  } catch (error) {
    if (error instanceof FirnlineError) throw error;
    throw new FirnlineError('checklist-missing', 'cannot read this checklist; check the path', { file: shown });
  }
  const boxes = readChecklistBoxes(text);
  const drafts = boxes.length === 0 || boxes.some((b) => b.file === undefined) ? [] : [...new Set(boxes.map((b) => b.file as string))];
  return { text, shown, drafts: drafts.filter((d) => existsSync(resolve(cwd, d))) };
}
