// The synthetic corpora of the benchmark: invented demo text set in an invented museum (the
// Hollowmere Museum of Cold Places), generated from a seeded generator so that every run reads the
// same bytes. Nothing here is a test of correctness; the figures are only there so that the checks
// have something to read, right and wrong alike.

/** A small seeded generator (mulberry32): the same seed gives the same corpus on every machine. */
export function seeded(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * Sentences of an ordinary docs repository, off the subject. Several use the generic words that
 * a naive prefilter takes for the topic ("percent", "record", "temperature", "now").
 */
const OFF_TOPIC = [
  (n) => `The volunteer rota for the spring fair is pinned in the staff kitchen, slot ${n}.`,
  (n) => `Please return the gallery keys to the front desk before ${(n % 4) + 5} o'clock.`,
  (n) => `Our accessibility guide explains the lift, the quiet room and the ${n % 9} ramps.`,
  (n) => `Ticket sales rose ${n % 40} percent on the record weekend, and the café ran out of scones.`,
  (n) => `Keep the storage room temperature near ${18 + (n % 4)} °C for the textile loans.`,
  (n) => `The newsletter now goes out to ${1200 + n * 7} readers every month.`,
  (n) => `Build the site with \`npm run docs\` and open page ${n} to review the layout.`,
  (n) => `The print shop needs ${n % 50 + 10} days to deliver the new posters.`,
  (n) => `Staff training on fire doors takes place in room ${n % 12} on Tuesdays.`,
  (n) => `Donations of ${n % 90 + 10} pounds or more are listed in the annual report.`,
];

/** Sentences that name the subject (Vostok, EPICA Dome C, CO2, the Last Glacial Maximum...). */
const ON_TOPIC = [
  (n) => `The Vostok core in case ${n} holds a climate record of about ${380 + (n % 60)},000 years.`,
  (n) => `EPICA Dome C reaches back roughly ${700 + (n % 120)},000 years, drilled to a depth of ${3000 + (n % 300)} m.`,
  (n) => `At the Last Glacial Maximum, CO2 stood near ${180 + (n % 30)} ppm, against ${270 + (n % 20)} ppm before the industrial era.`,
  (n) => `Ice cores show that CO2 rose about ${600 + (n % 400)} years after the warming, so CO2 cannot have caused it.`,
  (n) => `Global mean temperature was about ${4 + (n % 4)} °C lower at the peak of the last ice age (panel ${n}).`,
  (n) => `Warmer water holds more CO2, so the oceans of gallery ${n} took up carbon as they warmed.`,
  (n) => `CO2 and temperature in Antarctic ice cores rise and fall together over ${800 - (n % 100)},000 years, which proves that CO2 controls the climate.`,
  (n) => `Sea level was about ${110 + (n % 30)} m lower at the Last Glacial Maximum, and rose ${70 + (n % 20)} m during the deglaciation.`,
  (n) => `Today CO2 makes up about ${(0.03 + (n % 5) / 1000).toFixed(3)} percent of the air, or ${400 + (n % 30)} ppm.`,
  (n) => `The deglaciation took about ${8 + (n % 5)},000 years, from ${18 + (n % 3)},000 to ${11 - (n % 2)},000 years ago.`,
];

/** One Markdown docs page of about `bytes` bytes; an on-topic page names the subject in a few paragraphs. */
export function docsPage(i, bytes, topical) {
  const random = seeded(i + 1);
  const pick = (pool) => pool[Math.floor(random() * pool.length)](Math.floor(random() * 1000));
  const parts = [`# Page ${i}`, ''];
  let size = 10;
  for (let p = 0; size < bytes; p += 1) {
    if (p % 6 === 0) parts.push(`## Section ${p / 6 + 1}`, '');
    let paragraph;
    if (topical && p % 10 === 3) paragraph = `${pick(ON_TOPIC)} ${pick(ON_TOPIC)} ${pick(OFF_TOPIC)}`;
    else if (p % 9 === 4) paragraph = `- ${pick(OFF_TOPIC)}\n- ${pick(OFF_TOPIC)}\n- ${pick(OFF_TOPIC)}`;
    else if (p % 13 === 7) paragraph = '```sh\nnpm run docs -- --page ' + p + '\n```';
    else paragraph = `${pick(OFF_TOPIC)} ${pick(OFF_TOPIC)} ${pick(OFF_TOPIC)} ${pick(OFF_TOPIC)}`;
    parts.push(paragraph, '');
    size += paragraph.length + 2;
  }
  return parts.join('\n');
}

/** Prose of about `bytes` bytes in which every paragraph is on topic: three sentences, at least one naming the subject. */
export function topicalProse(seed, bytes) {
  const random = seeded(seed);
  const pick = (pool) => pool[Math.floor(random() * pool.length)](Math.floor(random() * 1000));
  const parts = [`# The long winter, part ${seed}`, ''];
  let size = 30;
  while (size < bytes) {
    const paragraph = `${pick(ON_TOPIC)} ${random() < 0.5 ? pick(ON_TOPIC) : pick(OFF_TOPIC)} ${pick(ON_TOPIC)}`;
    parts.push(paragraph, '');
    size += Buffer.byteLength(paragraph) + 2;
  }
  return parts.join('\n');
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
    if (n % 10 === 9) block.push(OFF_TOPIC[n % OFF_TOPIC.length](n) + ` See [the visitor map](https://example.org/map/${n}).`, '');
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
