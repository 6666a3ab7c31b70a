import { segmentIdle } from '../segment'

/** Waiting for the first click of a wall. */
export const WallIdle = segmentIdle('wall', 'draw wall')
