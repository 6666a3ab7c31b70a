import { segmentIdle } from '../segment'

/** Waiting for the first click of a frame line. */
export const FrameIdle = segmentIdle('frame', 'draw frame line')
