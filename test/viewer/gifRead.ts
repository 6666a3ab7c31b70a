/**
 * A small GIF reader for tests: header, logical screen size and the number of image frames,
 * walking the block structure of the GIF89a specification (W3C/CompuServe 1990, sections 17-27).
 */
export interface GifInfo {
  readonly signature: string
  readonly width: number
  readonly height: number
  readonly frames: number
  /** Frame delays in hundredths of a second, from the graphic control extensions. */
  readonly delays: readonly number[]
  readonly loops: boolean
}

export function readGif(bytes: Uint8Array): GifInfo {
  const signature = String.fromCharCode(...bytes.subarray(0, 6))
  const width = bytes[6]! | (bytes[7]! << 8)
  const height = bytes[8]! | (bytes[9]! << 8)
  const packed = bytes[10]!
  let p = 13 + (packed & 0x80 ? 3 * 2 ** ((packed & 7) + 1) : 0)
  const skipSubBlocks = () => {
    while (bytes[p]! !== 0) p += bytes[p]! + 1
    p++
  }
  let frames = 0
  let loops = false
  const delays: number[] = []
  while (p < bytes.length) {
    const b = bytes[p]!
    if (b === 0x3b) break
    if (b === 0x21) {
      const label = bytes[p + 1]!
      if (label === 0xf9) delays.push(bytes[p + 4]! | (bytes[p + 5]! << 8))
      if (label === 0xff && String.fromCharCode(...bytes.subarray(p + 3, p + 14)) === 'NETSCAPE2.0') loops = true
      p += 2
      skipSubBlocks()
    } else if (b === 0x2c) {
      frames++
      const local = bytes[p + 9]!
      p += 10 + (local & 0x80 ? 3 * 2 ** ((local & 7) + 1) : 0)
      p++ // LZW minimum code size
      skipSubBlocks()
    } else {
      throw new Error(`GIF: unexpected block 0x${b.toString(16)} at byte ${p}`)
    }
  }
  return { signature, width, height, frames, delays, loops }
}
