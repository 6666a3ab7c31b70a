import { polylineDrawing } from '../polyline'
import { slabSpec } from './spec'

/** Placing outline vertices; closes on the first vertex or Enter. */
export const SlabDrawing = polylineDrawing(slabSpec)
