import type { Command } from 'commander';
import { FirnlineError } from '../../errors.js';
import { fullReference } from '../../report/format-source.js';
import { describeRule } from '../../rulepack/describe-rule.js';
import { closeIds, knownRuleIds } from '../../rulepack/known-rule-ids.js';
import { SIGNOFF_RULES } from '../../review/review-flags.js';
import type { CliContext } from '../context.js';

/** `firnline explain <id>`: one rule or reference value in full, with its citations. */
export function registerExplain(program: Command, ctx: CliContext): void {
  program
    .command('explain')
    .description('show one rule or reference value in full, with citations (e.g. value.edc-record-span)')
    .argument('<id>', 'rule id, or a reference value id without the value. prefix')
    .option('--config <file>', 'settings file to use instead of the firnline.yaml found by walking up')
    .option('--pack <file>', 'add a rule pack (repeatable)', (v: string, all: string[]) => [...all, v], [] as string[])
    .action(async (id: string, flags: { config?: string; pack: string[] }) => {
      const { packs } = await (await import('../run-settings.js')).loadRunSettings(ctx.cwd, flags.config, flags.pack);
      const info = describeRule(packs, id) ?? describeRule(packs, `value.${id}`) ?? SIGNOFF_RULES.find((r) => r.id === id);
      if (info === undefined) {
        const close = closeIds(id, knownRuleIds(packs));
        const hint = close.length > 0 ? `did you mean ${close.map((c) => `\`${c}\``).join(' or ')}? ` : '';
        throw new FirnlineError('unknown-rule', `no rule or reference value has the id \`${id}\`; ${hint}run \`firnline refs\` or \`firnline refs --reasoning\` to list them`);
      }
      // The full reference (every author, container, pages, link), then the locators and how the value was checked.
      const sources = info.sources.map((s) => {
        const link = [s.kind === undefined ? undefined : `kind: ${s.kind}`, s.doi === undefined ? undefined : `doi: ${s.doi}`, s.url === undefined ? undefined : `url: ${s.url}`].filter((x) => x !== undefined);
        return `  - ${fullReference(s)}\n${link.map((l) => `    ${l}\n`).join('')}    how: ${s.how}\n`;
      });
      ctx.stdout(`${info.id} (default level: ${info.defaultLevel})\n${info.summary}\n\n${info.description}\n\nSources:\n${sources.join('')}`);
    });
}
