import { polylineIdle } from '../polyline'
import { massLineSpec } from './spec'

/** Waiting for the first point of a line mass. */
export const MassLineIdle = polylineIdle(massLineSpec)
