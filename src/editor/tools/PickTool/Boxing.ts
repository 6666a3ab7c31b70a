import { boxSelect, normalizeBox } from '../../geometry/hitTest'
import { EMPTY_EPHEMERAL, setSelection } from '../../store'
import type { ToolStateNode } from '../types'

/**
 * Dragging a selection box from empty space (or from inside an unselected slab, where a plain click
 * selects the slab); Shift adds to the selection; Escape restores it.
 */
export const PickBoxing: ToolStateNode = {
  id: 'boxing',
  onPointerMove(ctx, e) {
    const { origin } = ctx.memory()
    if (!origin) return
    const { min, max } = normalizeBox(origin, e.point)
    ctx.setEphemeral({ draft: { kind: 'box', min, max } })
  },
  onPointerUp(ctx, e) {
    const { origin, baseSelection, shift, pressedId } = ctx.memory()
    const base = shift ? (baseSelection ?? []) : []
    if (origin && Math.hypot(e.point.x - origin.x, e.point.y - origin.y) > ctx.tolerance(e)) {
      const { doc, currentFloor } = ctx.state()
      setSelection(ctx.store, [...base, ...boxSelect(doc, currentFloor, origin, e.point)])
    } else if (pressedId !== undefined) {
      // A click (no drag) inside a slab selects it.
      setSelection(ctx.store, [...base, pressedId])
    }
    ctx.setEphemeral({ ...EMPTY_EPHEMERAL, pointer: e.point })
    ctx.transition('idle', {})
  },
  onCancel(ctx) {
    setSelection(ctx.store, ctx.memory().baseSelection ?? [])
    ctx.setEphemeral({ ...EMPTY_EPHEMERAL, pointer: ctx.state().ephemeral.pointer })
    ctx.transition('idle', {})
  },
}
