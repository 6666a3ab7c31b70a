import { execute } from '../../store'
import type { PolylineSpec } from '../polyline'
import { contentFloor } from '../shared'

export const slabSpec: PolylineSpec = {
  tool: 'slab',
  label: 'draw slab',
  closed: true,
  min: 3,
  commit: (ctx, points) =>
    execute(
      ctx.store,
      'addSlab',
      { floor: contentFloor(ctx), outline: points, areaMass: ctx.state().defaults.areaMass },
      { select: true },
    ),
}
