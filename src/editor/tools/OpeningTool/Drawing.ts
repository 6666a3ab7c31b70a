import { polylineDrawing } from '../polyline'
import { openingSpec } from './spec'

/** Placing opening vertices; closes on the first vertex or Enter, into the slab holding the first. */
export const OpeningDrawing = polylineDrawing(openingSpec)
