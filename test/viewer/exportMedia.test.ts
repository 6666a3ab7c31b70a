import { describe, expect, it } from 'vitest'
import { exportFileName, PNG_SIGNATURE, slugify } from '@/viewer/exportMedia'

describe('slugify', () => {
  it('turns a project name into a lower-case dashed stem', () => {
    expect(slugify('Corner Block, Quarry Street')).toBe('corner-block-quarry-street')
    expect(slugify('  École  Nord #2 ')).toBe('ecole-nord-2')
    expect(slugify('***')).toBe('gyre-project')
  })
})

describe('exportFileName', () => {
  it('names exports after project and mode', () => {
    expect(exportFileName('Corner Block', 1, 'png')).toBe('corner-block_mode-1.png')
    expect(exportFileName('Corner Block', 3, 'webm')).toBe('corner-block_mode-3.webm')
    expect(exportFileName('Corner Block', 'Response', 'webm')).toBe('corner-block_response.webm')
  })
})

describe('PNG_SIGNATURE', () => {
  it('is the eight-byte PNG file signature', () => {
    // PNG specification (ISO/IEC 15948:2004) §5.2: 137 80 78 71 13 10 26 10
    expect([...PNG_SIGNATURE]).toEqual([137, 80, 78, 71, 13, 10, 26, 10])
  })
})
