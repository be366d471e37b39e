// Percentiles exactly as PostgreSQL's percentile_cont computes them, so numbers agree everywhere.

/**
 * The p-th percentile (0..1) of the values with linear interpolation between the two nearest ranks
 * (rank = p · (n − 1), 0-based), or null for no values. percentile([1, 2, 3, 10], 0.5) is 2.5.
 */
export function percentile(values: readonly number[], p: number): number | null {
  if (!values.length) return null
  const sorted = [...values].sort((a, b) => a - b)
  const rank = p * (sorted.length - 1)
  const low = Math.floor(rank)
  const high = Math.ceil(rank)
  const a = sorted[low] ?? 0
  const b = sorted[high] ?? a
  return a + (b - a) * (rank - low)
}

export const median = (values: readonly number[]) => percentile(values, 0.5)
