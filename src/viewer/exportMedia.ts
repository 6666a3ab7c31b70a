/**
 * Export of the 3D view for meetings: a PNG snapshot and a short looping WebM, both with the mode
 * title, its meaning and the preliminary-results caution burnt in, named after project and mode.
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
export function exportFileName(projectName: string, what: number | string, ext: 'png' | 'webm'): string {
  const tail = typeof what === 'number' ? `mode-${what}` : slugify(what)
  return `${slugify(projectName)}_${tail}.${ext}`
}

/** Caption lines burnt into an export. */
export interface Caption {
  readonly title: string
  readonly meaning: string
  readonly caution: string
}

/** Draw the 3D canvas and the caption band into a 2D context of the same pixel size. */
export function drawCaptioned(
  ctx: CanvasRenderingContext2D,
  source: CanvasImageSource,
  width: number,
  height: number,
  caption: Caption,
): void {
  ctx.fillStyle = '#f1efe9'
  ctx.fillRect(0, 0, width, height)
  ctx.drawImage(source, 0, 0, width, height)
  const scale = Math.max(1, width / 1200)
  const band = Math.round(74 * scale)
  ctx.fillStyle = 'rgba(24, 30, 41, 0.82)'
  ctx.fillRect(0, 0, width, band)
  ctx.fillStyle = '#f7f3e8'
  ctx.textBaseline = 'top'
  ctx.font = `600 ${Math.round(24 * scale)}px system-ui, sans-serif`
  ctx.fillText(caption.title, 16 * scale, 10 * scale, width - 32 * scale)
  ctx.font = `${Math.round(16 * scale)}px system-ui, sans-serif`
  ctx.fillText(caption.meaning, 16 * scale, 44 * scale, width - 32 * scale)
  const foot = Math.round(28 * scale)
  ctx.fillStyle = 'rgba(24, 30, 41, 0.82)'
  ctx.fillRect(0, height - foot, width, foot)
  ctx.fillStyle = '#f2d58c'
  ctx.font = `${Math.round(13 * scale)}px system-ui, sans-serif`
  ctx.fillText(caption.caution, 16 * scale, height - foot + 7 * scale, width - 32 * scale)
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
