/** Semantic version of the species engine; recorded with every stored result (DESIGN §3). */
export const ENGINE_VERSION = '1.5.0'
