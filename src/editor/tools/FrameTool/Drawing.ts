import { execute } from '../../store'
import { segmentDrawing } from '../segment'

/** First end placed; the next click, drag end or numeric entry adds the frame line. */
export const FrameDrawing = segmentDrawing('frame', (ctx, p1, p2) =>
  execute(
    ctx.store,
    'addFrameLine',
    { p1, p2, stiffness: { kind: 'direct', storyStiffness: ctx.state().defaults.frameStoryStiffness } },
    { select: true },
  ),
)
