// The synthetic drafts of the benchmark: invented demo text set in an invented museum (the
// Hollowmere Museum of Cold Places) and its newsletter. Nothing here is a test of correctness; the
// figures are only there so that the checks have something to read, right and wrong alike.

/** Sentences that mention no topic term: most pages of a real docs repository look like this. */
export const OFF_TOPIC = [
  'The volunteer rota for the spring fair is pinned in the staff kitchen.',
  'Please return the gallery keys to the front desk before six.',
  'Our new accessibility guide explains the lift and the quiet room.',
  'The café will close early on Thursday for a private event.',
];

/** On-topic sentences of the many-files scenario (kept as first published, so figures compare). */
export const ON_TOPIC = [
  'The Vostok core holds a climate record of about 420,000 years.',
  'EPICA Dome C reaches back roughly 800,000 years.',
  'At the Last Glacial Maximum, CO2 stood near 190 ppm.',
  'Ice cores show that CO2 rose about 800 years after the warming, so CO2 cannot have caused it.',
  'Global mean temperature was about 6 °C lower at the peak of the last ice age.',
  'Before the industrial era, CO2 was about 280 ppm.',
];

/** One page of the many-files scenario: a heading and twelve two-sentence paragraphs. */
export function docsPage(i, topical) {
  const lines = [`# Page ${i}`, ''];
  for (let p = 0; p < 12; p += 1) {
    const pool = topical && p % 3 === 0 ? ON_TOPIC : OFF_TOPIC;
    lines.push(`${pool[(i + p) % pool.length]} ${pool[(i + p + 1) % pool.length]}`, '');
  }
  return lines.join('\n');
}

// Templates for the large-file scenario; `n` varies the figures so that few sentences repeat
// exactly, as in a long real draft.
const LONG_TEMPLATES = [
  (n) => `The Vostok core in case ${n} holds a climate record of about ${380 + (n % 60)},000 years.`,
  (n) => `EPICA Dome C reaches back roughly ${700 + (n % 120)},000 years, drilled to a depth of ${3000 + (n % 300)} m.`,
  (n) => `At the Last Glacial Maximum, CO2 stood near ${180 + (n % 30)} ppm, against ${270 + (n % 20)} ppm before the industrial era.`,
  (n) => `Ice cores show that CO2 rose about ${600 + (n % 400)} years after the warming, so CO2 cannot have caused it.`,
  (n) => `Global mean temperature was about ${4 + (n % 4)} °C lower at the peak of the last ice age (panel ${n}).`,
  (n) => `Warmer water holds more CO2, so the oceans of gallery ${n} took up carbon as they warmed.`,
  (n) => `The air bubbles in sample ${n} are older than the ice around them.`,
  (n) => `CO2 and temperature rise and fall together over ${800 - (n % 100)},000 years, which proves that CO2 controls the climate.`,
  (n) => `Sea level was about ${110 + (n % 30)} m lower at the Last Glacial Maximum, and rose ${70 + (n % 20)} m during the deglaciation.`,
  (n) => `Today CO2 makes up about ${(0.03 + (n % 5) / 1000).toFixed(3)} percent of the air, or ${400 + (n % 30)} ppm.`,
  (n) => `The ice sheets ended because of changes in Earth's orbit alone, says visitor note ${n}.`,
  (n) => `The deglaciation took about ${8 + (n % 5)},000 years, from ${18 + (n % 3)},000 to ${11 - (n % 2)},000 years ago.`,
];

/**
 * One long Markdown draft of about `bytes` UTF-8 bytes, mostly on topic: headings, paragraphs of
 * three sentences, lists, a table, quotes, code fences and links, as a long exhibition text has.
 */
export function largeDraft(bytes) {
  const parts = ['---', 'title: The long winter, gallery text', '---', '', '# The long winter', ''];
  let size = parts.join('\n').length;
  for (let n = 0; size < bytes; n += 1) {
    const t = (k) => LONG_TEMPLATES[(n * 5 + k) % LONG_TEMPLATES.length](n + k);
    const block = [];
    if (n % 8 === 0) block.push(`## Room ${n / 8 + 1}`, '');
    if (n % 10 === 9) block.push(OFF_TOPIC[n % OFF_TOPIC.length] + ` See [the visitor map](https://example.org/map/${n}).`, '');
    else if (n % 10 === 5) block.push(`- ${t(0)}`, `- ${t(1)}`, `- *Note:* ${t(2)}`, '');
    else if (n % 10 === 7) block.push('| Record | Span |', '| --- | --- |', `| Vostok | about ${400 + (n % 20)},000 years |`, `| EPICA Dome C | about 800,000 years |`, '');
    else if (n % 20 === 3) block.push('```', `co2_ppm = ${180 + (n % 100)}`, '```', '');
    else if (n % 10 === 1) block.push(`> ${t(0)} ${t(1)}`, '');
    else block.push(`${t(0)} **${t(1)}** ${t(2)}`, '');
    const text = block.join('\n');
    parts.push(text);
    size += Buffer.byteLength(text) + 1;
  }
  return parts.join('\n');
}
