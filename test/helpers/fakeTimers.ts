/** Timers a test advances by hand (the worker watch and the analysis client take them injected). */
import type { WatchTimers } from '@/ui/workerWatch'

export function fakeTimers() {
  let t = 0
  let nextId = 1
  const due = new Map<number, { at: number; fn: () => void }>()
  const timers: WatchTimers = {
    now: () => t,
    setTimeout: (fn, ms) => {
      const id = nextId++
      due.set(id, { at: t + ms, fn })
      return id
    },
    clearTimeout: (h) => {
      due.delete(h as number)
    },
  }
  const advance = (ms: number): void => {
    const end = t + ms
    for (;;) {
      const next = [...due.entries()].filter(([, d]) => d.at <= end).sort((a, b) => a[1].at - b[1].at)[0]
      if (!next) break
      due.delete(next[0])
      t = next[1].at
      next[1].fn()
    }
    t = end
  }
  return { timers, advance }
}
