/**
 * The climate sensitivity as an assessment gives it: a likely range, a very likely range and a best
 * estimate, each a value of its own (pack values ecs-ar6-*), a range checked end by end. The science
 * behind every row:
 * - IPCC AR6 WGI Technical Summary TS.3.2.1 (Arias et al. 2021, doi 10.1017/9781009157896.002):
 *   best estimate 3 °C, very likely 2-5 °C, likely 2.5-4 °C, "narrower than the AR5 likely range of
 *   1.5 °C to 4.5 °C";
 * - AR5 (2013) gave a likely range of 1.5-4.5 °C and no best estimate; the Charney report (1979)
 *   gave 1.5-4.5 °C; AR4 (2007) gave likely 2-4.5 °C with a best estimate of about 3 °C (the AR6 TS
 *   names the AR5 range; the AR4 and Charney figures from memory).
 * So the AR5 range told as AR6's, or as today's, is wrong, and the same range named as AR5's is right
 * for its date. The sentences are our own.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';

async function valueFlags(sentence: string): Promise<string[]> {
  return (await checkText(sentence)).flags.filter((f) => f.ruleId.startsWith('value.')).map((f) => f.ruleId);
}

describe('an assessed range of climate sensitivity is held to the range it names', () => {
  it.each([
    ['Equilibrium climate sensitivity, which IPCC AR6 assessed as likely 1.5-4.5 °C, is the key unknown.', 'value.ecs-ar6-likely-range'],
    ['The latest IPCC report puts the warming for a doubling of carbon dioxide at likely 1.5 to 4.5 °C.', 'value.ecs-ar6-likely-range'],
    ['Climate sensitivity is likely between 1.5 and 4.5 °C, the IPCC says.', 'value.ecs-ar6-likely-range'],
    ['The 2021 assessment gives a likely range of 1 to 2 °C for equilibrium climate sensitivity.', 'value.ecs-ar6-likely-range'],
    ['Our runs span the AR6 very likely range of climate sensitivity, 1 to 3 °C.', 'value.ecs-ar6-very-likely-range'],
    ['The IPCC gives a best estimate of 4.5 °C per doubling of CO2.', 'value.ecs-ar6-best-estimate'],
    ['The latest assessment offers a best estimate of about 1.5 degrees of warming for each doubling of CO2.', 'value.ecs-ar6-best-estimate'],
    ['Doubling the CO2 would give you about ten degrees of warming.', 'value.ecs-ar6-very-likely'],
  ])('%j → %s', async (sentence, ruleId) => {
    expect(await valueFlags(sentence)).toEqual([ruleId]);
  });

  it.each([
    // The AR6 figures themselves, in several wordings.
    'IPCC AR6 puts equilibrium climate sensitivity at likely 2.5 to 4 °C, with a best estimate of 3 °C.',
    'Climate sensitivity is likely between 2.5 and 4 °C and very likely between 2 and 5 °C.',
    'Most likely, climate sensitivity is close to 3 °C per doubling of CO2.',
    'The lower end of the likely range of climate sensitivity is now 2.5 °C.',
    // The older range named with the assessment that gave it is right for its date.
    'AR5 gave a likely range of 1.5 to 4.5 °C for climate sensitivity.',
    'In 2013 the IPCC gave a likely range of 1.5 to 4.5 °C for climate sensitivity.',
    'For decades the likely range of climate sensitivity stood at 1.5 to 4.5 °C.',
    "The Charney report's likely range for climate sensitivity, 1.5 to 4.5 °C, held for decades.",
  ])('%j stays clean', async (sentence) => {
    expect(await valueFlags(sentence)).toEqual([]);
  });

  it('the correction of the AR5 range told as AR6 names the AR6 range', async () => {
    const flag = (await checkText('IPCC AR6 gives a likely range for climate sensitivity of 1.5 to 4.5 °C.')).flags[0];
    expect(flag?.correction).toContain('2.5 to 4 °C');
    expect(flag?.sources.map((s) => s.id)).toEqual(['arias-2021']);
    expect(flag?.reason).toContain('its low end');
    expect(flag?.reason).toContain('its high end');
  });
});
