import { polylineIdle } from '../polyline'
import { openingSpec } from './spec'

/** Waiting for the first vertex of an opening. */
export const OpeningIdle = polylineIdle(openingSpec)
