import { deflateSync } from 'node:zlib'
import { describe, expect, it } from 'vitest'
import { contentShare, decodePng, differenceShare, hasPngSignature } from './pngDecode'

/** Build a 2x2 RGB PNG by hand (PNG spec chunk layout; CRCs are not checked by the reader). */
function tinyPng(pixels: number[][]): Uint8Array {
  const chunk = (type: string, data: Uint8Array) => {
    const out = new Uint8Array(12 + data.length)
    const v = new DataView(out.buffer)
    v.setUint32(0, data.length)
    out.set([...type].map((c) => c.charCodeAt(0)), 4)
    out.set(data, 8)
    return out
  }
  const ihdr = new Uint8Array(13)
  const v = new DataView(ihdr.buffer)
  v.setUint32(0, 2)
  v.setUint32(4, 2)
  ihdr.set([8, 2, 0, 0, 0], 8)
  // Row 0 unfiltered, row 1 with the Up filter (adds the byte above), to exercise un-filtering.
  const r0 = [...pixels[0]!, ...pixels[1]!]
  const r1 = [...pixels[2]!, ...pixels[3]!].map((x, i) => (x - r0[i]! + 256) & 255)
  const raw = Uint8Array.from([0, ...r0, 2, ...r1])
  const parts = [
    Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(raw)),
    chunk('IEND', new Uint8Array(0)),
  ]
  return Uint8Array.from(parts.flatMap((p) => [...p]))
}

describe('decodePng', () => {
  it('reads pixels back, including an Up-filtered row', () => {
    const png = tinyPng([
      [10, 20, 30],
      [200, 100, 50],
      [10, 20, 30],
      [10, 20, 31],
    ])
    expect(hasPngSignature(png)).toBe(true)
    const img = decodePng(png)
    expect(img.width).toBe(2)
    expect(Array.from(img.rgba.subarray(4, 8))).toEqual([200, 100, 50, 255])
    expect(Array.from(img.rgba.subarray(12, 16))).toEqual([10, 20, 31, 255])
    expect(contentShare(img)).toBeCloseTo(0.25, 12)
    expect(differenceShare(img, img)).toBe(0)
  })
})
