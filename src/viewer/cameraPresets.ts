/** Pure camera presets of the 3D view (z up): top, front (looking along +y), side (along -x), three-quarter. */
import type { CameraPreset } from './viewerStore'

/** Camera position and target of a preset for a box of plan extent and height. */
export function presetView(
  preset: CameraPreset,
  box: { minX: number; maxX: number; minY: number; maxY: number },
  height: number,
  fovDeg: number,
  aspect: number,
): { position: [number, number, number]; target: [number, number, number] } {
  const cx = (box.minX + box.maxX) / 2
  const cy = (box.minY + box.maxY) / 2
  const cz = height / 2
  const w = box.maxX - box.minX
  const d = box.maxY - box.minY
  const radius = 0.5 * Math.hypot(w, d, height) || 10
  const halfV = (fovDeg * Math.PI) / 360
  const halfH = Math.atan(Math.tan(halfV) * Math.max(aspect, 0.2))
  const dist = (radius / Math.sin(Math.min(halfV, halfH))) * 1.05
  switch (preset) {
    case 'top':
      // A hair off the vertical: orbit controls cannot look exactly along their up axis.
      return { position: [cx, cy - dist * 1e-3, height + dist], target: [cx, cy, height] }
    case 'front':
      return { position: [cx, cy - dist, cz], target: [cx, cy, cz] }
    case 'side':
      return { position: [cx + dist, cy, cz], target: [cx, cy, cz] }
    case 'three-quarter':
      return {
        position: [cx + dist * 0.62, cy - dist * 0.68, cz + dist * 0.42],
        target: [cx, cy, cz],
      }
    default: {
      const never: never = preset
      throw new TypeError(`[viewer] unknown camera preset ${String(never)}`)
    }
  }
}
