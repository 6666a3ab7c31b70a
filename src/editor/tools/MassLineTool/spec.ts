import { execute } from '../../store'
import type { PolylineSpec } from '../polyline'
import { contentFloor } from '../shared'

export const massLineSpec: PolylineSpec = {
  tool: 'mass-line',
  label: 'draw line mass',
  closed: false,
  min: 2,
  commit: (ctx, points) =>
    execute(
      ctx.store,
      'addLineMass',
      { floor: contentFloor(ctx), points, massPerLength: ctx.state().defaults.massPerLength },
      { select: true },
    ),
}
