import type { LocationQueryValue } from 'vue-router'

type Filters = Record<string, string>

function first(v: LocationQueryValue | LocationQueryValue[] | undefined): string {
  return (Array.isArray(v) ? v[0] : v) ?? ''
}

/**
 * A list page's search, sort, paging and filters, kept in the URL so a view can be shared and
 * survives reload. `query` is what to send to the list route.
 */
export function useListQuery(defaults: { sort?: string; pageSize?: number; filters?: Filters } = {}) {
  const route = useRoute()
  const router = useRouter()
  const filterKeys = Object.keys(defaults.filters ?? {})

  const read = (key: string, fallback: string) => first(route.query[key]) || fallback
  const q = ref(read('q', ''))
  const sort = ref(read('sort', defaults.sort ?? ''))
  const page = ref(Number(read('page', '1')) || 1)
  const pageSize = ref(Number(read('pageSize', String(defaults.pageSize ?? 25))) || 25)
  const filters = reactive<Filters>(Object.fromEntries(filterKeys.map((k) => [k, read(k, defaults.filters![k]!)])))

  const query = computed(() => {
    const out: Record<string, string | number> = { page: page.value, pageSize: pageSize.value }
    if (q.value) out.q = q.value
    if (sort.value) out.sort = sort.value
    for (const k of filterKeys) if (filters[k]) out[k] = filters[k]!
    return out
  })

  watch(query, (next) => {
    router.replace({ query: Object.fromEntries(Object.entries(next).map(([k, v]) => [k, String(v)])) })
  })

  // Typing in the search box waits for a pause before asking the server.
  const searchText = ref(q.value)
  let timer: ReturnType<typeof setTimeout> | undefined
  watch(searchText, (text) => {
    clearTimeout(timer)
    timer = setTimeout(() => {
      q.value = text.trim()
      page.value = 1
    }, 300)
  })
  watch(
    () => ({ ...filters }),
    () => (page.value = 1),
  )

  /** The CSV export of the same filtered list: `format=csv` on the list route, without paging. */
  function exportHref(route: string) {
    return computed(() => {
      const params = new URLSearchParams()
      for (const [k, v] of Object.entries(query.value)) if (k !== 'page' && k !== 'pageSize') params.set(k, String(v))
      params.set('format', 'csv')
      return `${route}?${params}`
    })
  }

  return { q, searchText, sort, page, pageSize, filters, query, exportHref }
}
