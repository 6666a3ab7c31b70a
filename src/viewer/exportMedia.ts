/**
 * Export of the 3D view for meetings: a PNG snapshot, a short looping WebM and a GIF, at a chosen
 * size independent of the pane, with the mode title, its meaning and the preliminary-results
 * caution in a band below the picture, named after project and mode.
 */

/** Lower-case, dash-separated file stem: "Corner Block, Quarry Street" -> "corner-block-quarry-street". */
export function slugify(name: string): string {
  const slug = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
  return slug || 'gyre-project'
}

/** File name of an export: "<project>_mode-<n>.<ext>" or "<project>_<label>.<ext>". */
export function exportFileName(projectName: string, what: number | string, ext: 'png' | 'webm' | 'gif'): string {
  const tail = typeof what === 'number' ? `mode-${what}` : slugify(what)
  return `${slugify(projectName)}_${tail}.${ext}`
}

/** Caption lines burnt into an export. */
export interface Caption {
  readonly title: string
  readonly meaning: string
  readonly caution: string
}

/** Output size choices of the PNG, WebM and GIF exports. */
export type ExportSizeChoice = '1920x1080' | '1280x720' | 'pane'

/** The choices in menu order with their labels. */
export const EXPORT_SIZE_CHOICES: readonly { readonly value: ExportSizeChoice; readonly label: string }[] = [
  { value: '1920x1080', label: '1920 × 1080' },
  { value: '1280x720', label: '1280 × 720' },
  { value: 'pane', label: 'pane size' },
]

/** Largest GIF frame (the GIF is meant for slides and stays small). */
export const GIF_MAX = { width: 960, height: 540 } as const

/** A pixel rectangle of the output picture. */
export interface PixelRect {
  readonly x: number
  readonly y: number
  readonly width: number
  readonly height: number
}

/**
 * Output size in pixels of an export: the preset, or the 3D canvas's own pixel size for 'pane'.
 * Both sides are rounded down to even numbers (VP8 and most video players want even sizes) and
 * kept at least 2.
 */
export function exportPixels(choice: ExportSizeChoice, paneWidth: number, paneHeight: number): { width: number; height: number } {
  const raw =
    choice === '1920x1080'
      ? { width: 1920, height: 1080 }
      : choice === '1280x720'
        ? { width: 1280, height: 720 }
        : { width: Math.floor(paneWidth), height: Math.floor(paneHeight) }
  const even = (v: number) => Math.max(2, v - (v % 2))
  return { width: even(raw.width), height: even(raw.height) }
}

/** GIF size: the export size scaled down (aspect kept) to fit inside GIF_MAX; never scaled up. */
export function gifPixels(choice: ExportSizeChoice, paneWidth: number, paneHeight: number): { width: number; height: number } {
  const full = exportPixels(choice, paneWidth, paneHeight)
  const k = Math.min(1, GIF_MAX.width / full.width, GIF_MAX.height / full.height)
  return { width: Math.max(2, Math.floor(full.width * k)), height: Math.max(2, Math.floor(full.height * k)) }
}

/**
 * Where the 3D picture and the caption band go in an export of `width` × `height` pixels: the band
 * is a strip along the bottom (15 % of the height, at least 64 px, at most half), the 3D frame fills
 * the rest above it, so the caption never covers the building.
 */
export function captionLayout(width: number, height: number): { scene: PixelRect; band: PixelRect } {
  const band = Math.min(Math.floor(height / 2), Math.max(64, Math.round(height * 0.15)))
  return {
    scene: { x: 0, y: 0, width, height: height - band },
    band: { x: 0, y: height - band, width, height: band },
  }
}

/**
 * Vertical field of view (degrees) for rendering at `exportAspect` what the pane shows at
 * `paneAspect` (width / height) with vertical field `fovDeg`: unchanged when the export is wider
 * (a perspective camera keeps its vertical field, so the picture only gains width); when it is
 * narrower, widened so the horizontal field is kept and nothing framed in the pane is cut off.
 * From tan(h/2) = aspect · tan(v/2) for a pinhole camera.
 * @see three.js PerspectiveCamera (fov is the vertical field of view)
 */
export function exportFov(fovDeg: number, paneAspect: number, exportAspect: number): number {
  if (!(exportAspect > 0) || !(paneAspect > 0) || exportAspect >= paneAspect) return fovDeg
  const half = (fovDeg * Math.PI) / 360
  return (360 / Math.PI) * Math.atan((Math.tan(half) * paneAspect) / exportAspect)
}

/** Background of the output picture outside the 3D frame (matches the 3D scene's background). */
export const EXPORT_BACKGROUND = '#ebe8e1'
/** Colour of the caption band. */
export const BAND_COLOUR = '#181e29'

/**
 * Compose one export frame: `source` (the 3D frame, rendered at the scene rectangle's size) in the
 * upper part and the caption band (title, meaning, caution) along the bottom, per captionLayout.
 */
export function drawCaptioned(
  ctx: CanvasRenderingContext2D,
  source: CanvasImageSource,
  width: number,
  height: number,
  caption: Caption,
): void {
  const { scene, band } = captionLayout(width, height)
  ctx.fillStyle = EXPORT_BACKGROUND
  ctx.fillRect(0, 0, width, height)
  ctx.drawImage(source, scene.x, scene.y, scene.width, scene.height)
  ctx.fillStyle = BAND_COLOUR
  ctx.fillRect(band.x, band.y, band.width, band.height)
  const h = band.height
  const pad = Math.round(h * 0.12)
  const text = (line: string, size: number, y: number, colour: string, weight = '') => {
    ctx.fillStyle = colour
    ctx.font = `${weight}${Math.max(9, Math.round(size))}px system-ui, sans-serif`
    ctx.fillText(line, pad, band.y + y, width - 2 * pad)
  }
  ctx.textBaseline = 'top'
  text(caption.title, h * 0.26, h * 0.08, '#f7f3e8', '600 ')
  text(caption.meaning, h * 0.17, h * 0.42, '#d9dee6')
  text(caption.caution, h * 0.15, h * 0.7, '#f2d58c')
}

/** Save a blob through a temporary link (the browser's download). */
export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob)
  const a = document.createElement('a')
  a.href = url
  a.download = fileName
  a.style.display = 'none'
  document.body.appendChild(a)
  a.click()
  a.remove()
  setTimeout(() => URL.revokeObjectURL(url), 10000)
}

/** First WebM codec string the browser's MediaRecorder supports, or null. */
export function pickWebmType(): string | null {
  if (typeof MediaRecorder === 'undefined') return null
  for (const t of ['video/webm;codecs=vp9', 'video/webm;codecs=vp8', 'video/webm']) {
    if (MediaRecorder.isTypeSupported(t)) return t
  }
  return null
}

/** PNG signature bytes (ISO/IEC 15948 §5.2 / RFC 2083 §3.1). */
export const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] as const

/** Whether WebCodecs can encode VP8 at this size (frame-exact WebM export). */
export async function canEncodeVp8(width: number, height: number): Promise<boolean> {
  if (typeof VideoEncoder === 'undefined' || typeof VideoFrame === 'undefined') return false
  try {
    const r = await VideoEncoder.isConfigSupported({ codec: 'vp8', width, height, bitrate: 4_000_000 })
    return Boolean(r.supported)
  } catch (_e) {
    return false
  }
}

/**
 * Encode `frameCount` frames to a WebM (VP8) with mediabunny (WebCodecs encoder, Matroska muxer).
 * `drawFrame(k)` must leave frame k drawn on `canvas` (even width and height). Frames are timed
 * exactly at `fps`, so the file plays smoothly however slowly this machine renders, and a whole
 * number of cycles loops cleanly. One key frame per second, 4 Mbit/s.
 * @see https://mediabunny.dev (Output, WebMOutputFormat, BufferTarget, CanvasSource)
 */
export async function encodeWebm(
  canvas: HTMLCanvasElement,
  frameCount: number,
  fps: number,
  drawFrame: (k: number) => void,
): Promise<Blob> {
  const { BufferTarget, CanvasSource, Output, Quality, WebMOutputFormat } = await import('mediabunny')
  const target = new BufferTarget()
  const output = new Output({ format: new WebMOutputFormat(), target })
  const source = new CanvasSource(canvas, { codec: 'vp8', quality: new Quality({ bitrate: 4_000_000 }), keyFrameInterval: 1 })
  output.addVideoTrack(source, { frameRate: fps })
  await output.start()
  try {
    for (let k = 0; k < frameCount; k++) {
      drawFrame(k)
      // Awaiting each frame keeps the encoder queue short: memory stays flat, the page responsive.
      await source.add(k / fps, 1 / fps)
    }
    await output.finalize()
  } catch (error) {
    await output.cancel().catch(() => undefined)
    throw error
  }
  if (!target.buffer) throw new Error('[viewer] WebM export produced no data')
  return new Blob([target.buffer], { type: 'video/webm' })
}

/** Incremental GIF writer: add RGBA frames of one size, then take the file's bytes. */
export interface GifWriter {
  /** Add one frame (RGBA, width × height × 4 bytes, row by row from the top). */
  add(rgba: Uint8Array | Uint8ClampedArray): void
  /** Finish the file (trailer) and return its bytes. */
  finish(): Uint8Array
}

/**
 * A looping GIF89a (Netscape loop extension, forever) of `width` × `height` pixels, each frame
 * shown `delayMs` (stored in hundredths of a second), each with its own 256-colour palette
 * (gifenc quantize + applyPalette, rgb565).
 * @see https://github.com/mattdesl/gifenc ; GIF89a specification (W3C/CompuServe 1990)
 */
export async function createGifWriter(width: number, height: number, delayMs: number): Promise<GifWriter> {
  const { GIFEncoder, applyPalette, quantize } = await import('gifenc')
  const gif = GIFEncoder()
  let frames = 0
  return {
    add(rgba) {
      if (rgba.length !== width * height * 4) {
        throw new Error(`[viewer] GIF frame has ${rgba.length} bytes, expected ${width * height * 4} (${width} × ${height} RGBA)`)
      }
      const palette = quantize(rgba, 256)
      const index = applyPalette(rgba, palette)
      gif.writeFrame(index, width, height, { palette, delay: delayMs, repeat: 0 })
      frames++
    },
    finish() {
      if (frames === 0) throw new Error('[viewer] GIF export has no frames')
      gif.finish()
      return gif.bytes()
    },
  }
}
