/**
 * A draft whose blocks name a subject throughout (at least three blocks, and a third of them) is
 * about the subject as a whole: a thread's reply or an article's paragraph that names only a
 * region or a temperature ("the Antarctic ice shows it was ten degrees colder") is read as part of
 * it. A docs page that mentions the subject once stays read block by block.
 */
export function topicalThroughout(named: readonly boolean[]): boolean {
  const count = named.filter(Boolean).length;
  return count >= 3 && count * 3 >= named.length;
}
