import { execute } from '../../store'
import { placeIdle } from '../place'
import { contentFloor } from '../shared'

/** Each click adds a point mass on the current floor (its typical floor when linked). */
export const MassPointIdle = placeIdle('mass-point', 'place point mass', (ctx, at) =>
  execute(ctx.store, 'addPointMass', { floor: contentFloor(ctx), at, mass: ctx.state().defaults.pointMass }, { select: true }),
)
