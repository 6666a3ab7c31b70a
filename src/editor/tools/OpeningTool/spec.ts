import { pointInPolygon } from '../../geometry/hitTest'
import { execute, setMessage } from '../../store'
import type { PolylineSpec } from '../polyline'
import { contentFloor } from '../shared'

export const openingSpec: PolylineSpec = {
  tool: 'opening',
  label: 'draw opening',
  closed: true,
  min: 3,
  commit: (ctx, points) => {
    const floor = contentFloor(ctx)
    const first = points[0]
    const slab = Object.values(ctx.state().doc.slabs).find(
      (s) => s.floor === floor && first !== undefined && pointInPolygon(first, s.outline),
    )
    if (!slab) {
      const message = 'opening: start the opening inside a slab of this floor'
      setMessage(ctx.store, message)
      return { ok: false }
    }
    return execute(ctx.store, 'addOpening', { slab: slab.id, points })
  },
}
