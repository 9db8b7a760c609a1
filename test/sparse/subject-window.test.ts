// A draft is on topic because it names the subject (an entity of the packs), never because of a
// generic word such as "percent" or "record": such a word makes a sentence a candidate claim only
// where its paragraph, or a block beside its block, names a subject. Elsewhere a sentence is a
// claim only through the draft's own arithmetic or unit slip. Sentences are our own.
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { checkDocument, createCheckSetup } from '../../src/lsp/check-document.js';
import { createDocumentChecker } from '../../src/lsp/incremental-check.js';
import { loadPacks } from '../../src/rulepack/index.js';

const SUBJECT = 'The EPICA Dome C core was drilled in East Antarctica.';
const GENERIC = 'Ticket sales rose 12 percent on the record weekend.';
// Two paragraphs that name no subject and hold no number, between a subject and what follows.
const FAR = 'The shop sells postcards and maps.\n\nVolunteers meet in the library.\n\n';

async function claimsOf(text: string): Promise<{ text: string; line: number; rules: string[] }[]> {
  const result = await checkText(text, { path: 'draft.md' });
  return result.claims.map((c) => ({ text: c.text, line: c.span.start.line, rules: c.flags.map((f) => f.ruleId) }));
}

describe('generic topic words need a subject nearby', () => {
  it('makes no claim of a generic-word sentence far from any subject', async () => {
    expect(await claimsOf(`${SUBJECT}\n\n${FAR}${GENERIC}\n`)).toEqual([]);
  });

  it('keeps a generic-word sentence whose paragraph names the subject', async () => {
    const claims = await claimsOf(`${SUBJECT} ${GENERIC}\n`);
    expect(claims.map((c) => c.text)).toEqual([GENERIC]);
  });

  it('lets a number take its subject from the sentence before', async () => {
    // EPICA Dome C was drilled to about 3,270 m (Augustin et al. 2007, Annals of Glaciology 47,
    // as the built-in pack's edc-drilled-depth notes; Lüthi et al. 2008, Nature 453, 379-382).
    const claims = await claimsOf('The EPICA Dome C core was drilled by ten nations. It was drilled to a depth of 1,000 metres.\n');
    expect(claims).toEqual([{ text: 'It was drilled to a depth of 1,000 metres.', line: 1, rules: ['value.edc-drilled-depth'] }]);
  });

  it('keeps a sentence inside a paragraph about a period', async () => {
    const claims = await claimsOf('The last deglaciation ended the ice age. The rise took 70,000 years.\n');
    expect(claims.map((c) => c.text)).toContain('The rise took 70,000 years.');
    expect((await claimsOf(`The last deglaciation ended the ice age.\n\n${FAR}The rise took 70,000 years.\n`)).map((c) => c.text)).not.toContain('The rise took 70,000 years.');
  });

  it('takes the subject from the block beside, as in a thread of short posts, but not from further away', async () => {
    // The highest CO2 of the 800,000-year ice-core record before industrial times is about 300 ppm
    // (Lüthi et al. 2008, Nature 453, 379-382), so "roughly 350 ppm" is off.
    const post = '2/ the highest natural reading was roughly 350 ppm.';
    const beside = await claimsOf(`1/ CO2 in Antarctic ice cores tracks temperature.\n\n${post}\n`);
    expect(beside).toEqual([{ text: post, line: 3, rules: ['value.co2-highest-preindustrial-800kyr'] }]);
    expect(await claimsOf(`1/ CO2 in Antarctic ice cores tracks temperature.\n\n${FAR}${post}\n`)).toEqual([]);
  });

  it('reads every post of a thread that names the subject throughout, and a docs page post by post', async () => {
    // Antarctic ice-core temperature fell about 8-10 °C at the Last Glacial Maximum, about twice the
    // global mean cooling of about 6 °C (Jouzel et al. 2007, Science 317, 793-796; Tierney et al.
    // 2020, Nature 584, 569-573): an Antarctic figure read as the planet's is a scope error.
    const reply = 'Someone upthread said the Antarctic ice shows it was ten degrees colder, so the whole planet was ten degrees colder.';
    const posts = [
      'The Vostok ice core goes back about 420,000 years.',
      'EPICA Dome C reaches about 800,000 years.',
      'Ice-age CO2 sat near 180 ppm at the coldest points.',
      'Great thread, thanks all.',
    ];
    const thread = await claimsOf(`${posts.join('\n\n')}\n\nNice to see this.\n\n${reply}\n`);
    expect(thread.find((c) => c.text === reply)?.rules).toContain('scope.regional-record-as-global');
    // One mention of a subject in a long page is no thread about it: the far block stays unread.
    const docs = await claimsOf(`${SUBJECT}\n\n${FAR}${FAR}${reply}\n`);
    expect(docs.map((c) => c.text)).not.toContain(reply);
  });

  it("still flags a sentence's own arithmetic slip far from any subject", async () => {
    // 12,900 − 11,700 = 1,200 years (common practice: subtraction).
    const claims = await claimsOf(`The Younger Dryas was a cold return in the last deglaciation.\n\n${FAR}It ran from about 12,900 to 11,700 years ago: a cold spell of some 2,000 years.\n`);
    expect(claims).toEqual([{ text: 'It ran from about 12,900 to 11,700 years ago: a cold spell of some 2,000 years.', line: 7, rules: ['arith.duration'] }]);
  });

  it('gives the editor the same result block by block when a block beside gains or loses its subject', async () => {
    const setup = createCheckSetup(await loadPacks([]), {}, { file: 'firnline-signoffs.yaml', signoffs: [] });
    const checker = createDocumentChecker(setup);
    const post = '2/ the highest natural reading was roughly 350 ppm.';
    const tail = `\n\n${FAR}${SUBJECT}\n`;
    const texts = [
      `1/ CO2 in Antarctic ice cores tracks temperature.\n\n${post}${tail}`,
      `1/ The shop sells postcards.\n\n${post}${tail}`,
      `1/ CO2 in Antarctic ice cores tracks temperature.\n\n${post}${tail}`,
    ];
    const counts: number[] = [];
    for (const text of texts) {
      const full = checkDocument(text, 'markdown', 'draft.md', 'draft.md', setup);
      expect(checker.check(text, 'markdown', 'draft.md', 'draft.md').flags).toEqual(full.flags);
      counts.push(full.flags.length);
    }
    expect(counts).toEqual([1, 0, 1]);
  });
});
