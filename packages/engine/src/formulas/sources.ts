/** Where a closed form comes from, as cited beside it and shown with every value it gives. */
export interface FormulaSource {
  title: string;
  authors?: string;
  venue?: string;
  year?: number;
  /** How the statement reached Cairn: from the paper, from memory (checked by search), or common practice. */
  basis: 'published' | 'from memory, checked by exhaustive search' | 'common practice';
}

export const BODLAENDER_1998: FormulaSource = {
  title: 'Rankings of graphs',
  authors: 'H. L. Bodlaender, J. S. Deogun, K. Jansen, T. Kloks, D. Kratsch, H. Müller, Zs. Tuza',
  venue: 'SIAM J. Discrete Math. 11',
  year: 1998,
  basis: 'published',
};

export const ALPERT_2010: FormulaSource = {
  title: 'Rank numbers of grid graphs',
  authors: 'M. Alpert',
  venue: 'Discrete Math. 310',
  year: 2010,
  basis: 'from memory, checked by exhaustive search',
};

export const COMMON_PRACTICE: FormulaSource = { title: 'common practice', basis: 'common practice' };
