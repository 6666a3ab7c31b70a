import { numericOffset } from '../../events'
import { hitHandle, selectionHandles } from '../../geometry/handles'
import { hitTest } from '../../geometry/hitTest'
import { EMPTY_EPHEMERAL, bail, execute, mark, setSelection } from '../../store'
import type { ToolStateNode } from '../types'

/** Rotation handle distance above the selection, in pick tolerances (the UI draws it there too). */
export const ROTATE_HANDLE_OFFSET = 4

/** Nothing pressed: hover highlights; a press picks a handle, an element or starts a box. */
export const PickIdle: ToolStateNode = {
  id: 'idle',
  onPointerMove(ctx, e) {
    const { doc, currentFloor } = ctx.state()
    const hit = hitTest(doc, currentFloor, e.point, ctx.tolerance(e))
    ctx.setEphemeral({ hover: hit ? hit.id : null })
  },
  onPointerDown(ctx, e) {
    const { doc, currentFloor, selection } = ctx.state()
    const tol = ctx.tolerance(e)
    const handle = hitHandle(selectionHandles(doc, currentFloor, selection, ROTATE_HANDLE_OFFSET * tol), e.point, tol)
    if (handle?.kind === 'endpoint') {
      const markId = mark(ctx.store, 'stretch')
      ctx.transition('stretching', { handle: { id: handle.id, end: handle.end }, markId, origin: e.point })
      return
    }
    if (handle?.kind === 'vertex') {
      const markId = mark(ctx.store, 'reshape slab')
      ctx.transition('reshaping', { vertex: { slab: handle.id, index: handle.index }, markId, origin: e.point })
      return
    }
    if (handle?.kind === 'rotate') {
      const markId = mark(ctx.store, 'rotate')
      const startAngle = Math.atan2(e.point.y - handle.pivot.y, e.point.x - handle.pivot.x)
      ctx.transition('turning', { pivot: handle.pivot, startAngle, markId, applied: { dx: 0, dy: 0, angle: 0 } })
      return
    }
    const hit = hitTest(doc, currentFloor, e.point, tol)
    // Inside an unselected slab a drag draws a box (slabs cover the plan); a click still picks the slab.
    if (hit && hit.kind === 'slabs' && hit.distance === 0 && !selection.includes(hit.id)) {
      if (!e.shift) setSelection(ctx.store, [])
      ctx.transition('boxing', { origin: e.point, baseSelection: selection, shift: e.shift === true, pressedId: hit.id })
      return
    }
    if (hit) {
      const selected = selection.includes(hit.id)
      if (e.shift) {
        if (selected) {
          setSelection(ctx.store, selection.filter((id) => id !== hit.id))
          return
        }
        setSelection(ctx.store, [...selection, hit.id])
      } else if (!selected) {
        setSelection(ctx.store, [hit.id])
      }
      ctx.transition('pressing', { origin: e.point, pressedId: hit.id })
      return
    }
    if (!e.shift) setSelection(ctx.store, [])
    ctx.transition('boxing', { origin: e.point, baseSelection: selection, shift: e.shift === true })
  },
  onKey(ctx, e) {
    const { selection } = ctx.state()
    if ((e.key === 'Delete' || e.key === 'Backspace') && selection.length > 0) {
      const markId = mark(ctx.store, 'delete')
      if (!execute(ctx.store, 'deleteElements', { ids: selection }).ok) bail(ctx.store, markId)
    }
  },
  onNumeric(ctx, e) {
    const { selection } = ctx.state()
    if (selection.length === 0) return
    const d = numericOffset(e)
    const markId = mark(ctx.store, 'move by value')
    if (!execute(ctx.store, 'moveElements', { ids: selection, dx: d.x, dy: d.y }).ok) bail(ctx.store, markId)
  },
  onCancel(ctx) {
    setSelection(ctx.store, [])
    ctx.setEphemeral({ ...EMPTY_EPHEMERAL, pointer: ctx.state().ephemeral.pointer })
  },
}
