// citation-js ships no type declarations; these cover the calls src/cite/ makes.
declare module '@citation-js/core' {
  export class Cite {
    constructor(data: unknown);
    format(format: 'bibliography', options: { format: 'text'; template: string; lang: string }): string;
    format(format: 'bibtex' | 'biblatex', options?: { format: 'text' }): string;
    format(format: 'data', options?: { format: 'object' }): unknown[];
  }
  export const plugins: {
    config: { get(name: '@csl'): { templates: { add(name: string, style: string): void; has(name: string): boolean } } };
  };
}
declare module '@citation-js/plugin-csl';
declare module '@citation-js/plugin-bibtex';
