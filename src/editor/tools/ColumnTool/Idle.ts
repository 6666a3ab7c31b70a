import { execute } from '../../store'
import { placeIdle } from '../place'

/** Each click adds a column (default section and material) and selects it. */
export const ColumnIdle = placeIdle('column', 'place column', (ctx, at) => {
  const { defaults, doc } = ctx.state()
  return execute(
    ctx.store,
    'addColumn',
    {
      at,
      Ix: defaults.columnI,
      Iy: defaults.columnI,
      ...(defaults.material === undefined || !doc.materials[defaults.material] ? {} : { material: defaults.material }),
    },
    { select: true },
  )
})
