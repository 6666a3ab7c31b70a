/**
 * Benchmark of the moment-frame condensation alone (src/engine/elements/momentFrame.ts): median
 * process CPU time of momentFrameStiffness for frames of several sizes. Informative, never a
 * pass/fail.
 *
 *   npx tsx bench/momentFrame.ts
 */
import { momentFrameStiffness } from '@/engine/elements/momentFrame'
import { CAUTION_SHORT } from '@/model'

const median = (xs: readonly number[]): number => {
  const s = [...xs].sort((a, b) => a - b)
  const m = s.length >> 1
  return s.length % 2 ? s[m]! : 0.5 * (s[m - 1]! + s[m]!)
}

const cases: [bays: number, stories: number][] = [
  [3, 10],
  [4, 30],
  [6, 60],
  [6, 120],
  [10, 200],
  [40, 60],
  [1000, 3],
]
console.log('[bench] moment-frame condensation, median CPU ms per frame after warm-up')
console.log('  bays  stories   joints  band   cpu ms')
for (const [bays, n] of cases) {
  const stories = Array.from({ length: n }, (_, i) => ({
    h: i === 0 ? 4.5 : 3.2,
    EIc: 30e9 * 0.7 * 0.0108,
    EIb: 30e9 * 0.35 * 0.0114,
  }))
  const runs: number[] = []
  for (let r = 0; r < 7; r++) {
    const c0 = process.cpuUsage()
    momentFrameStiffness(stories, bays, 6)
    const c = process.cpuUsage(c0)
    if (r >= 2) runs.push((c.user + c.system) / 1000)
  }
  const joints = (bays + 1) * n
  const band = Math.min(bays + 1, n)
  console.log(
    `${String(bays).padStart(6)} ${String(n).padStart(8)} ${String(joints).padStart(8)} ${String(band).padStart(5)} ${median(runs).toFixed(2).padStart(8)}`,
  )
}
console.log(`[bench] ${CAUTION_SHORT}`)
