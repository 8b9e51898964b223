// The answer of a species look-up is a pure function of the notation asked for, the engine version
// (fixed for the life of the process) and the cached SCF estimates (which never change for a given
// engine version once solved). Under load, building the record and serialising it (20–30 kB with
// the relativistic densities) was most of a look-up's cost, so a finished answer is kept here as
// its JSON text. Only final answers are kept: a look-up whose SCF part is still pending, was
// computed for this very request, or failed is rebuilt next time, so it turns into "cached".
// Bounded by entries and by characters; the oldest go first.

const MAX_ENTRIES = 2_000
const MAX_CHARS = 48 * 1024 * 1024

const answers = new Map<string, string>()
let chars = 0

/** The kept JSON answer for this notation, or undefined. */
export function keptLookup(notation: string): string | undefined {
  return answers.get(notation)
}

/** Keeps a final answer (evicting the oldest when over either bound). */
export function keepLookup(notation: string, json: string): void {
  const before = answers.get(notation)
  if (before !== undefined) {
    chars -= before.length
    answers.delete(notation)
  }
  answers.set(notation, json)
  chars += json.length
  while (answers.size > MAX_ENTRIES || chars > MAX_CHARS) {
    const oldest = answers.keys().next().value!
    chars -= answers.get(oldest)!.length
    answers.delete(oldest)
  }
}

/** How many answers are kept (for tests and the health page). */
export function keptLookupCount(): number {
  return answers.size
}
