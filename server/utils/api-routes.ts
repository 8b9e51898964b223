import routes from '#api-routes'

function matches(pattern: string, path: string): boolean {
  const a = pattern.split('/')
  const b = path.replace(/\/+$/, '').split('/')
  if (a.length !== b.length) return false
  return a.every((seg, i) => seg.startsWith(':') || seg === b[i])
}

/** The methods some route file answers for `path`, e.g. ['GET', 'PATCH']; empty when none. */
export function apiMethodsFor(path: string): string[] {
  const found = new Set<string>()
  for (const r of routes as Array<{ route: string; method: string }>) {
    if (matches(r.route, path)) found.add(r.method === 'ALL' ? 'GET' : r.method)
  }
  return [...found].sort()
}
