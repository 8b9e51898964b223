/** Avogadro constant, 1/mol: exact since the 2019 SI redefinition (BIPM SI Brochure, 9th edition). */
export const AVOGADRO_CONSTANT = 6.02214076e23
