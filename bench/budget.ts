/**
 * Time the loader takes on oversized inputs (informative, never a pass/fail):
 *
 *   npx tsx bench/budget.ts
 *
 * 1. 20 000 walls × 300 floors (refused by the element-floor budget): JSON.parse + budget check.
 * 2. One 10 000-vertex round slab (accepted): full validation including the polygon tests.
 * Medians of 5 runs after one warm-up, wall-clock milliseconds.
 */
import { parseProject, parseProjectText } from '@/model'

const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[xs.length >> 1]!

function time(run: () => void): number {
  run()
  const xs: number[] = []
  for (let k = 0; k < 5; k++) {
    const t = performance.now()
    run()
    xs.push(performance.now() - t)
  }
  return median(xs)
}

const walls: Record<string, unknown> = {}
for (let i = 0; i < 20000; i++) {
  walls[`w${i}`] = { p1: { x: 0, y: i * 0.001 }, p2: { x: 1, y: i * 0.001 }, thickness: 0.2, material: 'c', top: 'F300' }
}
const huge = JSON.stringify({
  format: 'gyre-project',
  version: 1,
  floors: Array.from({ length: 300 }, (_, i) => ({ id: `F${i + 1}`, height: 3 })),
  walls,
})
const circle = Array.from({ length: 10000 }, (_, i) => ({
  x: 20 * Math.cos((2 * Math.PI * i) / 10000),
  y: 20 * Math.sin((2 * Math.PI * i) / 10000),
}))
const round = {
  format: 'gyre-project',
  version: 1,
  floors: [{ id: 'F1', height: 3 }],
  slabs: { s: { floor: 'F1', outline: circle, areaMass: 500 } },
}

const refuse = time(() => {
  if (parseProjectText(huge).ok) throw new Error('expected a refusal')
})
const accept = time(() => {
  if (!parseProject(round).ok) throw new Error('expected the file to load')
})
console.log(`20 000 walls x 300 floors (${(huge.length / 1e6).toFixed(1)} MB text), refused: ${refuse.toFixed(0)} ms`)
console.log(`one 10 000-vertex outline, loaded: ${accept.toFixed(0)} ms`)
