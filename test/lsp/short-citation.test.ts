// Short author-date citations of the built-in pack's sources (the full citations are in
// rules/paleoclimate.yaml, each with its DOI): one or two surnames, "et al." past two, the year.
import { describe, expect, it } from 'vitest';
import { shortCitation, shortCitationWithLink } from '../../src/lsp/short-citation.js';
import { loadPacks } from '../../src/rulepack/index.js';

describe('shortCitation', () => {
  it.each([
    // Petit et al. (1999), Nature 399, 429-436: nineteen authors.
    ['Petit, J. R., Jouzel, J., Raynaud, D., Barkov, N. I. & Stievenard, M. (1999). Climate and atmospheric history. Nature 399, 429-436.', 'Petit et al. 1999'],
    // Sigman & Boyle (2000), Nature 407, 859-869: two authors.
    ['Sigman, D. M. & Boyle, E. A. (2000). Glacial/interglacial variations in atmospheric carbon dioxide. Nature 407, 859-869.', 'Sigman & Boyle 2000'],
    // Pedro, Rasmussen & van Ommen (2012), Climate of the Past 8: three authors, a particle in a surname.
    ['Pedro, J. B., Rasmussen, S. O. & van Ommen, T. D. (2012). Tightened constraints. Climate of the Past 8, 1213-1221.', 'Pedro et al. 2012'],
    ['Forster, P., Storelvmo, T. et al. (2021). The Earth\'s Energy Budget. Chapter 7.', 'Forster et al. 2021'],
    ['EPICA community members (Augustin, L. et al.) (2004). Eight glacial cycles from an Antarctic ice core. Nature 429, 623-628.', 'EPICA community members 2004'],
    ['IPCC (2021). Summary for Policymakers.', 'IPCC 2021'],
    ['Petit, J.-R. et al. (1999/2001). Vostok Ice Core Data for 420,000 Years.', 'Petit et al. 1999/2001'],
    ['NOAA Research (2024-04-05). No sign of greenhouse gases increases slowing in 2023.', 'NOAA Research 2024'],
    ['Motoyama, H. (2007). The second deep ice coring project at Dome Fuji. Scientific Drilling 5, 41-43.', 'Motoyama 2007'],
  ])('%s', (cite, expected) => {
    expect(shortCitation(cite)).toBe(expected);
  });

  it('gives every source of the built-in pack a short form of at most a few words', async () => {
    const packs = await loadPacks([]);
    for (const source of packs.sources) {
      const short = shortCitation(source.cite);
      expect(short.length, source.id).toBeLessThan(70);
      expect(source.cite.startsWith(short.split(/[ ,&]/u)[0] ?? ''), source.id).toBe(true);
    }
  });

  it('adds the DOI link', async () => {
    const packs = await loadPacks([]);
    const petit = packs.sources.find((s) => s.doi === '10.1038/20859');
    expect(petit && shortCitationWithLink(petit)).toBe('Petit et al. 1999, https://doi.org/10.1038/20859');
  });
});
