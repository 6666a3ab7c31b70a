import { execute } from '../../store'
import { segmentDrawing } from '../segment'

/** First end placed; the next click, drag end or numeric entry places the second and adds the wall. */
export const WallDrawing = segmentDrawing('wall', (ctx, p1, p2) => {
  const { defaults } = ctx.state()
  return execute(
    ctx.store,
    'addWall',
    {
      p1,
      p2,
      thickness: defaults.wallThickness,
      flexureFactor: defaults.flexureFactor,
      shearFactor: defaults.shearFactor,
      ...(defaults.material === undefined || !ctx.state().doc.materials[defaults.material]
        ? {}
        : { material: defaults.material }),
    },
    { select: true },
  )
})
