// CPU time spent by processes (Linux /proc), for benchmarks that report CPU per request: a figure
// that, unlike requests per second, does not fall when other work shares the machine's cores.
import { readdirSync, readFileSync } from 'node:fs'
import path from 'node:path'
import { clusterLocation } from '../db.mjs'

const TICK_MS = 10 // USER_HZ is 100 on Linux

/** [parent pid, CPU ms (user + system, all threads)] of a process; null once it has gone. */
function processStat(pid: number): [number, number] | null {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8')
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ')
    return [Number(fields[1]), (Number(fields[11]) + Number(fields[12])) * TICK_MS]
  } catch {
    return null
  }
}

/** CPU ms used so far by one process. */
export const processCpuMs = (pid: number) => processStat(pid)?.[1] ?? 0

/** CPU ms used so far by this checkout's PostgreSQL: the postmaster and its live children. */
export function postgresCpuMs(): number {
  const postmaster = Number(
    readFileSync(path.join(clusterLocation().cluster, 'postmaster.pid'), 'utf8').split('\n')[0],
  )
  let total = processCpuMs(postmaster)
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue
    const stat = processStat(Number(entry))
    if (stat && stat[0] === postmaster) total += stat[1]
  }
  return total
}
