/** The shape of one labelled item of the reasoning corpus, and how rows of the corpus files become items. */
export interface CorpusItem {
  id: string;
  scenario: 'audio guide' | 'newsletter' | 'science desk';
  /** The sentences of one paragraph, in order. */
  paragraph: string[];
  /** Rule ids expected anywhere in the paragraph; empty for a correct paragraph. */
  expect: string[];
}

/** One row as written in a corpus file: scenario, the sentence (or the paragraph's sentences), rule ids. */
export type Row = [CorpusItem['scenario'], string | string[], string[]];

/** Numbers the rows `<prefix>-001`, `<prefix>-002`... so a failing item can be named. */
export function toItems(rows: Row[], prefix: string): CorpusItem[] {
  return rows.map(([scenario, text, expect], i) => ({
    id: `${prefix}-${String(i + 1).padStart(3, '0')}`,
    scenario,
    paragraph: typeof text === 'string' ? [text] : text,
    expect,
  }));
}
