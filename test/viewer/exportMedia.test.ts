import { describe, expect, it } from 'vitest'
import {
  GIF_MAX,
  captionLayout,
  createGifWriter,
  exportFileName,
  exportFov,
  exportPixels,
  gifPixels,
  PNG_SIGNATURE,
  slugify,
} from '@/viewer/exportMedia'
import { readGif } from './gifRead'

describe('slugify', () => {
  it('turns a project name into a lower-case dashed stem', () => {
    expect(slugify('Corner Block, Quarry Street')).toBe('corner-block-quarry-street')
    expect(slugify('  École  Nord #2 ')).toBe('ecole-nord-2')
    expect(slugify('***')).toBe('gyre-project')
  })
})

describe('exportFileName', () => {
  it('names exports after project and mode', () => {
    expect(exportFileName('Corner Block', 1, 'png')).toBe('corner-block_mode-1.png')
    expect(exportFileName('Corner Block', 3, 'webm')).toBe('corner-block_mode-3.webm')
    expect(exportFileName('Corner Block', 'Response', 'webm')).toBe('corner-block_response.webm')
    expect(exportFileName('Corner Block', 2, 'gif')).toBe('corner-block_mode-2.gif')
  })
})

describe('PNG_SIGNATURE', () => {
  it('is the eight-byte PNG file signature', () => {
    // PNG specification (ISO/IEC 15948:2004) §5.2: 137 80 78 71 13 10 26 10
    expect([...PNG_SIGNATURE]).toEqual([137, 80, 78, 71, 13, 10, 26, 10])
  })
})

describe('exportPixels', () => {
  it('gives the preset size whatever the pane, and the pane size rounded down to even numbers', () => {
    expect(exportPixels('1920x1080', 613, 377)).toEqual({ width: 1920, height: 1080 })
    expect(exportPixels('1280x720', 3000, 2000)).toEqual({ width: 1280, height: 720 })
    // Even sides: VP8 encodes whole 2×2 chroma blocks (RFC 6386 §2, 4:2:0 sampling).
    expect(exportPixels('pane', 613, 377)).toEqual({ width: 612, height: 376 })
    expect(exportPixels('pane', 1, 0)).toEqual({ width: 2, height: 2 })
  })
})

describe('gifPixels', () => {
  it('scales the export size down to fit 960 × 540 and keeps small panes as they are', () => {
    expect(gifPixels('1920x1080', 500, 400)).toEqual({ width: 960, height: 540 })
    expect(gifPixels('1280x720', 500, 400)).toEqual({ width: 960, height: 540 })
    expect(gifPixels('pane', 600, 400)).toEqual({ width: 600, height: 400 })
    const tall = gifPixels('pane', 800, 1200)
    expect(tall.height).toBe(GIF_MAX.height)
    expect(tall.width).toBe(Math.floor((800 * 540) / 1200))
  })
})

describe('captionLayout', () => {
  it('puts the band under the 3D frame, tiling the picture without overlap', () => {
    for (const [w, h] of [
      [1920, 1080],
      [1280, 720],
      [612, 376],
      [100, 60],
    ] as const) {
      const { scene, band } = captionLayout(w, h)
      expect(scene.y).toBe(0)
      expect(scene.y + scene.height).toBe(band.y)
      expect(band.y + band.height).toBe(h)
      expect(scene.width).toBe(w)
      expect(band.width).toBe(w)
      expect(band.height).toBeGreaterThan(0)
      expect(scene.height).toBeGreaterThanOrEqual(h / 2)
    }
    expect(captionLayout(1920, 1080).band.height).toBe(162)
  })
})

describe('exportFov', () => {
  it('keeps the vertical field for a wider export and keeps the horizontal field for a narrower one', () => {
    expect(exportFov(35, 1, 16 / 9)).toBe(35)
    // Pinhole camera: tan(horizontal/2) = aspect · tan(vertical/2) (closed form).
    const v = exportFov(35, 2, 1)
    const hBefore = Math.atan(2 * Math.tan((35 * Math.PI) / 360))
    const hAfter = Math.atan(1 * Math.tan((v * Math.PI) / 360))
    expect(Math.abs(hAfter - hBefore)).toBeLessThan(1e-12)
    expect(v).toBeGreaterThan(35)
  })
})

describe('createGifWriter', () => {
  it('writes a looping GIF89a of the given screen size with one image per frame', async () => {
    const w = 8
    const h = 6
    const gif = await createGifWriter(w, h, 70)
    for (let k = 0; k < 3; k++) {
      const rgba = new Uint8Array(w * h * 4)
      for (let i = 0; i < w * h; i++) rgba.set([(i * 30 + k * 80) % 256, 40 * k, 200, 255], 4 * i)
      gif.add(rgba)
    }
    const info = readGif(gif.finish())
    // GIF89a specification: signature "GIF89a", logical screen width/height little-endian (§18),
    // delay in 1/100 s in the graphic control extension (§23): 70 ms -> 7.
    expect(info.signature).toBe('GIF89a')
    expect([info.width, info.height]).toEqual([w, h])
    expect(info.frames).toBe(3)
    expect(info.delays).toEqual([7, 7, 7])
    expect(info.loops).toBe(true)
  })

  it('refuses a frame of the wrong size and a file without frames', async () => {
    const gif = await createGifWriter(4, 4, 50)
    expect(() => gif.add(new Uint8Array(10))).toThrow(/expected 64 \(4 × 4 RGBA\)/)
    expect(() => gif.finish()).toThrow(/no frames/)
  })
})
