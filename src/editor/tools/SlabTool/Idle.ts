import { polylineIdle } from '../polyline'
import { slabSpec } from './spec'

/** Waiting for the first outline vertex. */
export const SlabIdle = polylineIdle(slabSpec)
