import { polylineDrawing } from '../polyline'
import { massLineSpec } from './spec'

/** Placing polyline points; Enter or a second click on the last point finishes. */
export const MassLineDrawing = polylineDrawing(massLineSpec)
