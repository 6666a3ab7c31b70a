import { describe, expect, it } from 'vitest'
import { shadeOf } from '@/viewer/buildingLayout'
import { presetView } from '@/viewer/cameraPresets'

const box = { minX: 0, maxX: 30, minY: 0, maxY: 24 }
const H = 23.7
const dir = (v: { position: number[]; target: number[] }) => {
  const d = v.target.map((t, i) => t - v.position[i]!)
  const n = Math.hypot(...d)
  return d.map((x) => x / n)
}

describe('presetView', () => {
  it('looks straight down for top, along +y for front, along -x for side', () => {
    expect(dir(presetView('top', box, H, 35, 1.5))[2]).toBeCloseTo(-1, 5)
    expect(dir(presetView('front', box, H, 35, 1.5))).toEqual([expect.closeTo(0, 9), expect.closeTo(1, 9), expect.closeTo(0, 9)])
    expect(dir(presetView('side', box, H, 35, 1.5))).toEqual([expect.closeTo(-1, 9), expect.closeTo(0, 9), expect.closeTo(0, 9)])
  })

  it('frames the whole bounding sphere in the narrower field of view', () => {
    // Closed form: distance >= radius / sin(half angle) keeps a sphere of that radius in view.
    const radius = 0.5 * Math.hypot(30, 24, H)
    for (const aspect of [0.5, 1, 2]) {
      const v = presetView('three-quarter', box, H, 35, aspect)
      const d = Math.hypot(...v.target.map((t, i) => t - v.position[i]!))
      const halfV = (35 * Math.PI) / 360
      const halfH = Math.atan(Math.tan(halfV) * aspect)
      expect(d).toBeGreaterThanOrEqual(radius / Math.sin(Math.min(halfV, halfH)))
      expect(v.target).toEqual([15, 12, H / 2])
    }
  })
})

describe('shadeOf', () => {
  it('lights faces towards the sun more than faces away, within 0..1', () => {
    const up = shadeOf(0, 0, 1)
    const towards = shadeOf(-0.35, -0.6, 0.72)
    const away = shadeOf(0.35, 0.6, -0.72)
    expect(towards).toBeGreaterThan(up)
    expect(up).toBeGreaterThan(away)
    expect(away).toBeGreaterThanOrEqual(0.4)
    expect(towards).toBeLessThanOrEqual(1)
  })
})
