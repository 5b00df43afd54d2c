// CPU time spent by processes, read from /proc (Linux): on a machine shared with other work, a server's CPU
// milliseconds per answer say more about its own cost than requests per second do.
import { readFileSync, readdirSync } from 'node:fs'

const TICKS_PER_SECOND = 100 // USER_HZ on Linux

/** User + system CPU milliseconds of one process so far (0 once it is gone). */
export function cpuMsOf(pid: number): number {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8')
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ')
    return ((Number(fields[11]) + Number(fields[12])) * 1000) / TICKS_PER_SECOND
  } catch {
    return 0
  }
}

/** The process ids whose parent is `pid` (PostgreSQL's backends are children of its postmaster). */
export function childrenOf(pid: number): number[] {
  return readdirSync('/proc')
    .filter((name) => /^\d+$/.test(name))
    .map(Number)
    .filter((child) => {
      try {
        const stat = readFileSync(`/proc/${child}/stat`, 'utf8')
        return Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]) === pid
      } catch {
        return false
      }
    })
}

/** CPU milliseconds of a process and all its children (ended children are counted by the parent's cutime). */
export function treeCpuMs(pid: number): number {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8')
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ')
    const waited = ((Number(fields[13]) + Number(fields[14])) * 1000) / TICKS_PER_SECOND
    return cpuMsOf(pid) + waited + childrenOf(pid).reduce((sum, child) => sum + cpuMsOf(child), 0)
  } catch {
    return 0
  }
}
