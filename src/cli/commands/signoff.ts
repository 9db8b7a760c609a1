import type { Command} from 'commander';
import { Option } from 'commander';
import { readRegularText } from '../../guard/read-regular-file.js';
import { visibleLine } from '../../guard/visible-text.js';
import { relative, resolve } from 'node:path';
import { FirnlineError } from '../../errors.js';
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
    .option('--reason <text>', 'for claim ids: what was corrected, or why a waived claim stands')
    .option('--note <text>', 'a remark recorded with each sign-off (a box\'s own "(note: ...)" wins)')
    .option('--config <file>', 'settings file to use instead of the firnline.yaml found by walking up')
    .option('--pack <file>', 'add a rule pack (repeatable)', (value: string, previous: string[]) => [...previous, value], [])
    .action(async (ids: string[], flags: SignoffFlags) => {
      const reviewer = (flags.by ?? '').trim();
      if (reviewer === '') throw new FirnlineError('signoff-no-reviewer', 'say who signs off: --by "Your Name"');
      if ((flags.from === undefined) === (ids.length === 0)) {
        throw new FirnlineError('signoff-what', 'give either --from CHECKLIST or one or more claim ids, not both and not neither');
      }
      if (flags.from !== undefined && (flags.decision !== undefined || flags.reason !== undefined)) {
        throw new FirnlineError('signoff-decision-from', 'with --from, write decisions on the ticked lines: (corrected: ...) or (waived: ...)');
      }
      const [{ checkPaths }, { appendSignoffs }, { packVersionOf, planSignoffs }, { readLedger }, { checkOptionsOf, loadRunSettings }] = await Promise.all([
        import('../../engine.js'), import('../../review/append-signoffs.js'), import('../../review/plan-signoffs.js'),
        import('../../review/read-ledger.js'), import('../run-settings.js'),
      ]);
      const { requests, drafts } = flags.from === undefined ? fromIds(ids, flags) : await fromChecklist(resolve(ctx.cwd, flags.from), flags.from);
      const run = await loadRunSettings(ctx.cwd, flags.config, flags.pack);
      const result = await checkPaths(drafts.length > 0 ? drafts : ['.'], checkOptionsOf(run, ctx));
      const withNote = requests.map((r) => (r.note === undefined && flags.note !== undefined ? { ...r, note: flags.note } : r));
      const plan = planSignoffs(withNote, result.claims, await readLedger(run.ledger, ctx.cwd), {
        reviewer,
        date: ledgerDate(),
        packVersion: packVersionOf(run.packs),
      });
      const written = await appendSignoffs(run.ledger, plan.entries);
      const unchanged = plan.unchanged + plan.entries.length - written;
      const again = unchanged > 0 ? ` (${unchanged} already recorded as they are, left out)` : '';
      ctx.stdout(`Recorded ${written} sign-off${written === 1 ? '' : 's'} by ${visibleLine(reviewer)} in ${visibleLine(relative(ctx.cwd, run.ledger) || run.ledger)}${again}.\n`);
    });
}

function fromIds(ids: string[], flags: SignoffFlags): { requests: SignoffRequest[]; drafts: string[] } {
  const requests = ids.map((claimId): SignoffRequest => ({
    claimId,
    decision: flags.decision ?? 'approved',
    ...(flags.reason === undefined ? {} : { reason: flags.reason }),
    where: { file: 'command line' },
  }));
  return { requests, drafts: [] };
}

async function fromChecklist(file: string, shown: string): Promise<{ requests: SignoffRequest[]; drafts: string[] }> {
  let text: string;
  try {
    text = await readRegularText(file, { shown, code: 'checklist-missing' });
  } catch (error) {
    if (error instanceof FirnlineError) throw error;
    throw new FirnlineError('checklist-missing', 'cannot read this checklist; check the path', { file: shown });
  }
  const { parseTickedChecklist } = await import('../../report/checklist-ticks.js');
  const ticked = parseTickedChecklist(text, shown);
  if (ticked.length === 0) throw new FirnlineError('checklist-nothing-ticked', 'no ticked boxes (- [x]) in this checklist; tick the claims you have checked', { file: shown });
  const requests = ticked.map(({ claimId, decision, reason, note, line }): SignoffRequest => ({
    claimId,
    decision,
    ...(reason === undefined ? {} : { reason }),
    ...(note === undefined ? {} : { note }),
    where: { file: shown, line, column: 1 },
  }));
  // Scan only the drafts the checklist covers: faster, and an id is only ever looked for where it was made.
  const drafts = ticked.some((t) => t.file === undefined) ? [] : [...new Set(ticked.map((t) => t.file as string))];
  return { requests, drafts };
}
