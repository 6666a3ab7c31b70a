/**
 * Minimal PNG reader for tests (8-bit greyscale/RGB/RGBA, not interlaced), after the PNG
 * specification (ISO/IEC 15948:2004): signature §5.2, IHDR §11.2.2, zlib IDAT §10, filters §9.
 * Enough to check that a screenshot or an exported image has real content.
 */
import { inflateSync } from 'node:zlib'

export interface DecodedPng {
  readonly width: number
  readonly height: number
  /** RGBA, 4 bytes per pixel. */
  readonly rgba: Uint8Array
}

const SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]

export function hasPngSignature(bytes: Uint8Array): boolean {
  return SIGNATURE.every((b, i) => bytes[i] === b)
}

export function decodePng(bytes: Uint8Array): DecodedPng {
  if (!hasPngSignature(bytes)) throw new Error('[test] not a PNG file')
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength)
  let pos = 8
  let width = 0
  let height = 0
  let colourType = 0
  const idat: Uint8Array[] = []
  while (pos < bytes.length) {
    const len = view.getUint32(pos)
    const type = String.fromCharCode(...bytes.subarray(pos + 4, pos + 8))
    const data = bytes.subarray(pos + 8, pos + 8 + len)
    if (type === 'IHDR') {
      width = view.getUint32(pos + 8)
      height = view.getUint32(pos + 12)
      const depth = data[8]
      colourType = data[9] ?? 0
      if (depth !== 8 || data[12] !== 0) throw new Error('[test] only 8-bit non-interlaced PNG')
    } else if (type === 'IDAT') idat.push(data)
    else if (type === 'IEND') break
    pos += 12 + len
  }
  const channels = colourType === 6 ? 4 : colourType === 2 ? 3 : colourType === 0 ? 1 : 0
  if (!channels) throw new Error(`[test] unsupported PNG colour type ${colourType}`)
  const raw = inflateSync(Buffer.concat(idat))
  const stride = width * channels
  const out = new Uint8Array(width * height * 4)
  let prev = new Uint8Array(stride)
  for (let y = 0; y < height; y++) {
    const filter = raw[y * (stride + 1)]
    const line = raw.subarray(y * (stride + 1) + 1, (y + 1) * (stride + 1))
    const cur = new Uint8Array(stride)
    for (let i = 0; i < stride; i++) {
      const a = i >= channels ? cur[i - channels]! : 0
      const b = prev[i]!
      const c = i >= channels ? prev[i - channels]! : 0
      const x = line[i]!
      let v: number
      switch (filter) {
        case 0:
          v = x
          break
        case 1:
          v = x + a
          break
        case 2:
          v = x + b
          break
        case 3:
          v = x + ((a + b) >> 1)
          break
        case 4: {
          const p = a + b - c
          const pa = Math.abs(p - a)
          const pb = Math.abs(p - b)
          const pc = Math.abs(p - c)
          v = x + (pa <= pb && pa <= pc ? a : pb <= pc ? b : c)
          break
        }
        default:
          throw new Error(`[test] bad PNG filter ${String(filter)}`)
      }
      cur[i] = v & 0xff
    }
    for (let px = 0; px < width; px++) {
      const o = (y * width + px) * 4
      if (channels === 1) {
        out[o] = out[o + 1] = out[o + 2] = cur[px]!
        out[o + 3] = 255
      } else {
        out[o] = cur[px * channels]!
        out[o + 1] = cur[px * channels + 1]!
        out[o + 2] = cur[px * channels + 2]!
        out[o + 3] = channels === 4 ? cur[px * channels + 3]! : 255
      }
    }
    prev = cur
  }
  return { width, height, rgba: out }
}

/** Share of pixels that differ from the most common colour by more than `tol` in any channel. */
export function contentShare(img: DecodedPng, tol = 12): number {
  const counts = new Map<number, number>()
  const n = img.width * img.height
  for (let i = 0; i < n; i++) {
    const key = (img.rgba[4 * i]! << 16) | (img.rgba[4 * i + 1]! << 8) | img.rgba[4 * i + 2]!
    counts.set(key, (counts.get(key) ?? 0) + 1)
  }
  let bg = 0
  let best = -1
  counts.forEach((c, k) => {
    if (c > best) {
      best = c
      bg = k
    }
  })
  const br = (bg >> 16) & 255
  const bgG = (bg >> 8) & 255
  const bb = bg & 255
  let differ = 0
  for (let i = 0; i < n; i++) {
    if (
      Math.abs(img.rgba[4 * i]! - br) > tol ||
      Math.abs(img.rgba[4 * i + 1]! - bgG) > tol ||
      Math.abs(img.rgba[4 * i + 2]! - bb) > tol
    )
      differ++
  }
  return differ / n
}

/** Share of pixels that differ between two images of the same size by more than `tol`. */
export function differenceShare(a: DecodedPng, b: DecodedPng, tol = 8): number {
  if (a.width !== b.width || a.height !== b.height) return 1
  const n = a.width * a.height
  let differ = 0
  for (let i = 0; i < n; i++) {
    for (let c = 0; c < 3; c++) {
      if (Math.abs(a.rgba[4 * i + c]! - b.rgba[4 * i + c]!) > tol) {
        differ++
        break
      }
    }
  }
  return differ / n
}

/** The pixels of `img` inside a rectangle (clipped to the image). */
export function crop(img: DecodedPng, rect: { x: number; y: number; width: number; height: number }): DecodedPng {
  const x0 = Math.max(0, rect.x)
  const y0 = Math.max(0, rect.y)
  const width = Math.max(0, Math.min(img.width, rect.x + rect.width) - x0)
  const height = Math.max(0, Math.min(img.height, rect.y + rect.height) - y0)
  const rgba = new Uint8Array(width * height * 4)
  for (let y = 0; y < height; y++) {
    const from = 4 * ((y0 + y) * img.width + x0)
    rgba.set(img.rgba.subarray(from, from + 4 * width), 4 * y * width)
  }
  return { width, height, rgba }
}

/** Share of pixels within `tol` (every channel) of a CSS hex colour such as '#181e29'. */
export function colourShare(img: DecodedPng, hex: string, tol = 6): number {
  const v = parseInt(hex.slice(1), 16)
  const rgb = [(v >> 16) & 255, (v >> 8) & 255, v & 255]
  const n = img.width * img.height
  let near = 0
  for (let i = 0; i < n; i++) {
    if (rgb.every((c, k) => Math.abs(img.rgba[4 * i + k]! - c) <= tol)) near++
  }
  return n === 0 ? 0 : near / n
}
