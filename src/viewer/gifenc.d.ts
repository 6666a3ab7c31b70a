/**
 * Type declarations for the parts of gifenc 1.0.3 the GIF export uses (the package ships none).
 * @see https://github.com/mattdesl/gifenc (README: GIFEncoder, quantize, applyPalette)
 */
declare module 'gifenc' {
  /** RGB (or RGBA) palette entries, 0..255 each. */
  export type Palette = number[][]
  export interface WriteFrameOptions {
    palette?: Palette
    /** Frame delay in milliseconds (stored in hundredths of a second). */
    delay?: number
    /** 0 = loop forever, -1 = play once; read on the first frame only. */
    repeat?: number
    transparent?: boolean
    transparentIndex?: number
    first?: boolean
    dispose?: number
  }
  export interface Encoder {
    writeFrame(index: Uint8Array, width: number, height: number, options?: WriteFrameOptions): void
    finish(): void
    bytes(): Uint8Array
    bytesView(): Uint8Array
    reset(): void
  }
  export function GIFEncoder(options?: { auto?: boolean; initialCapacity?: number }): Encoder
  export function quantize(
    rgba: Uint8Array | Uint8ClampedArray,
    maxColors: number,
    options?: { format?: 'rgb565' | 'rgb444' | 'rgba4444'; oneBitAlpha?: boolean | number; clearAlpha?: boolean },
  ): Palette
  export function applyPalette(
    rgba: Uint8Array | Uint8ClampedArray,
    palette: Palette,
    format?: 'rgb565' | 'rgb444' | 'rgba4444',
  ): Uint8Array
}
