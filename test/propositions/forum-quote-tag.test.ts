/**
 * A forum quotation tag ("[quote=name]...[/quote]", common practice of forum software) quotes the
 * post a reply answers: a wrong claim inside it is the quoted writer's, so its flag is a note, while
 * the same words posted as the writer's own keep their level (src/propositions/stance.ts QUOTE_TAG).
 * The fact: air trapped in an ice core is younger than the ice around it, since bubbles close only at
 * the base of the firn (Caillon et al. 2003, Science 299, doi:10.1126/science.1078758, as the pack
 * cites it for its direction fact). Posts of our own.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';

const levelOf = async (text: string) =>
  (await checkText(text, { path: 'thread.txt' })).flags.find((f) => f.ruleId === 'direction.trapped-air-younger-than-ice')?.level;

describe('a forum quotation tag quotes the post a reply answers', () => {
  const opening = '#3  moss_wren\nthe Vostok ice core is a great read\n\n#4  heron_gale\n';
  const claim = 'in an ice core the trapped air is older than the ice around it';
  const answer = '\nno, the firn stays open for centuries before the bubbles seal\n';
  it.each([
    `${opening}[quote=moss_wren]${claim}[/quote]${answer}`,
    `${opening}[QUOTE]${claim}[/QUOTE]${answer}`,
  ])('reads the wrong direction inside the tag as a note: %j', async (text) => {
    expect(await levelOf(text)).toBe('note');
  });

  it('keeps the level of the same words posted as the writer\'s own', async () => {
    expect(await levelOf(`${opening}${claim}, the firn seals fast\n`)).toBe('warning');
  });
});
