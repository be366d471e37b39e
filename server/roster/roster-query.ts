// Filtering, sorting and paging the roster rows (pure, so the rules are easy to test).
import type { RosterFilter, RosterQuery } from './roster-schema'
import { attentionScore } from './attention'
import type { RosterPage, RosterRow, RosterSortKey, RosterStatus } from '../../src/contract/roster'

const STATUS_ORDER: Record<RosterStatus, number> = { behind: 0, inactive: 1, 'on-track': 2 }

const SORT_VALUE: Record<RosterSortKey, (row: RosterRow) => string | number | null> = {
  // ascending = most in need first (the default order of the roster)
  attention: (r) => -attentionScore(r.attention),
  name: (r) => r.name.toLocaleLowerCase(),
  email: (r) => r.email,
  lastPracticeAt: (r) => (r.lastPracticeAt ? Date.parse(r.lastPracticeAt) : null),
  minutesThisWeek: (r) => r.minutesThisWeek,
  accuracy: (r) => r.accuracy,
  recallTrend: (r) => r.recall.change,
  planCompletion: (r) => r.planCompletion,
  status: (r) => STATUS_ORDER[r.status],
  fastestTempo: (r) => r.fastestTempo?.bpm ?? null,
}

export function filterRoster(
  rows: readonly RosterRow[],
  filter: Pick<RosterFilter, 'search' | 'studio' | 'status'>,
) {
  const needle = filter.search?.toLocaleLowerCase()
  return rows.filter(
    (row) =>
      (!needle || row.name.toLocaleLowerCase().includes(needle) || row.email.includes(needle)) &&
      (!filter.studio || row.studios.some((s) => s.id === filter.studio)) &&
      (!filter.status || row.status === filter.status),
  )
}

/** Sorts by one column; rows without a value go last in either direction; ties by name. */
export function sortRoster(
  rows: readonly RosterRow[],
  sortBy: RosterSortKey,
  desc: boolean,
): RosterRow[] {
  const value = SORT_VALUE[sortBy]
  return [...rows].sort((a, b) => {
    const [va, vb] = [value(a), value(b)]
    if (va === null || vb === null) {
      if (va !== vb) return va === null ? 1 : -1
    } else if (va !== vb) {
      return (va < vb ? -1 : 1) * (desc ? -1 : 1)
    }
    return a.name.localeCompare(b.name)
  })
}

export function pageRoster(rows: readonly RosterRow[], query: RosterQuery): RosterPage {
  const filtered = sortRoster(filterRoster(rows, query), query.sortBy, query.sortDesc)
  const start = (query.page - 1) * query.pageSize
  return { total: filtered.length, items: filtered.slice(start, start + query.pageSize) }
}
