/**
 * English inflections of lexicon words: verb forms (-s, -ed, -ing, irregular past and participle)
 * and noun plurals. Rules plus a table of irregular verbs; fast enough to run on every load (the
 * NLP library derives the same forms but takes seconds for a lexicon of this size).
 *
 *   formsOf('lag')  → lag, lags, lagged, lagging
 *   formsOf('rise') → rise, rises, rose, risen, rising
 */

/** Irregular verbs: infinitive → past and participle forms. */
export const IRREGULAR: Readonly<Record<string, readonly string[]>> = {
  be: ['is', 'are', 'was', 'were', 'been', 'being'], have: ['has', 'had', 'having'], do: ['does', 'did', 'done', 'doing'],
  take: ['took', 'taken'], hold: ['held'], give: ['gave', 'given'], lead: ['led'], rise: ['rose', 'risen'], fall: ['fell', 'fallen'],
  drive: ['drove', 'driven'], grow: ['grew', 'grown'], go: ['went', 'gone', 'goes'], come: ['came'], show: ['shown'], keep: ['kept'],
  lose: ['lost'], set: ['set'], begin: ['began', 'begun'], make: ['made'], run: ['ran'], sink: ['sank', 'sunk'], freeze: ['froze', 'frozen'],
  swing: ['swung'], bring: ['brought'], draw: ['drew', 'drawn'], feed: ['fed'], write: ['wrote', 'written'], say: ['said'], tell: ['told'],
  hear: ['heard'], think: ['thought'], swear: ['swore', 'sworn'], spread: ['spread'], put: ['put'], let: ['let'], cut: ['cut'],
  find: ['found'], leave: ['left'], shake: ['shook', 'shaken'], speak: ['spoke', 'spoken'], know: ['knew', 'known'], see: ['saw', 'seen'],
  become: ['became'], mean: ['meant'], build: ['built'], spit: ['spat'], stand: ['stood'], hang: ['hung'], throw: ['threw', 'thrown'],
  break: ['broke', 'broken'], win: ['won'], send: ['sent'], catch: ['caught'], get: ['got', 'gotten'], undergo: ['underwent', 'undergone'],
  overtake: ['overtook', 'overtaken'], outrun: ['outran'], forget: ['forgot', 'forgotten'], hide: ['hid', 'hidden'], ride: ['rode', 'ridden'],
  strike: ['struck'], drink: ['drank', 'drunk'], swim: ['swam', 'swum'], shrink: ['shrank', 'shrunk'], sweep: ['swept'], seek: ['sought'],
  teach: ['taught'], fight: ['fought'], bear: ['bore', 'borne'], tear: ['tore', 'torn'], wear: ['wore', 'worn'], lie: ['lay', 'lain'],
  lay: ['laid'], pay: ['paid'], sell: ['sold'], slide: ['slid'], spin: ['spun'], stick: ['stuck'], wind: ['wound'], weep: ['wept'],
  sleep: ['slept'], feel: ['felt'], deal: ['dealt'], light: ['lit'], shine: ['shone'], shoot: ['shot'], split: ['split'], quit: ['quit'],
};
const VOWEL = /[aeiou]/u;

/** A word with its verb forms and noun plural. */
export function inflect(word: string): string[] {
  if (!/^[a-z]+$/u.test(word)) return [word];
  // "do", "be", "go": short irregular verbs still have their forms ("did the whole job") and their
  // participle in -ing ("going up and down together"); other short words (up, in) have none.
  if (word.length < 3) return IRREGULAR[word] === undefined ? [word] : [...new Set([word, ...IRREGULAR[word], gerund(word)])];
  const forms = new Set([word, plural(word), past(word), gerund(word), ...(IRREGULAR[word] ?? [])]);
  if (IRREGULAR[word] !== undefined) forms.delete(past(word));
  return [...forms];
}

/** A noun's plural: age → ages, glaciation → glaciations, depth → depths. */
export function plural(w: string): string {
  if (/(?:s|x|z|ch|sh)$/u.test(w)) return `${w}es`;
  if (/[^aeiou]y$/u.test(w)) return `${w.slice(0, -1)}ies`;
  return `${w}s`;
}

/** Doubles a final consonant after one short vowel: lag → lagg(ed), trap → trapp(ing). */
function stem(w: string): string {
  // Stressed final syllables double too: control → controlling, begin → beginning, emit → emitted.
  const cvc = /^[^aeiou]*[aeiou][^aeiouwxy]$/u.test(w) || /(?:mit|fer|pel|gas|rol|cur|gin|bat)$/u.test(w);
  return cvc ? w + w.at(-1) : w;
}

function past(w: string): string {
  if (w.endsWith('e')) return `${w}d`;
  if (/[^aeiou]y$/u.test(w)) return `${w.slice(0, -1)}ied`;
  return `${stem(w)}ed`;
}

function gerund(w: string): string {
  if (w.endsWith('ie')) return `${w.slice(0, -2)}ying`;
  if (w.endsWith('e') && !w.endsWith('ee') && VOWEL.test(w.slice(0, -1))) return `${w.slice(0, -1)}ing`;
  return `${stem(w)}ing`;
}
