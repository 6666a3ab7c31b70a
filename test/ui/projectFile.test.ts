import { describe, expect, it } from 'vitest'
import { INPUT_BUDGET } from '@/model'
import { readProjectFile } from '@/ui/projectFile'

describe('readProjectFile', () => {
  it('refuses a file over the byte budget without reading it', async () => {
    let read = false
    const file = {
      name: 'huge.json',
      size: INPUT_BUDGET.fileBytes + 1,
      text: (): Promise<string> => {
        read = true
        return Promise.resolve('{}')
      },
    }
    const r = await readProjectFile(file)
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.errors[0]).toMatch(/^\[file\] huge\.json: \(file\): 67108865 bytes is more than the budget of 67108864 bytes/)
    expect(read).toBe(false)
  })

  it('reads a file within the budget and passes it to the loader', async () => {
    const file = { name: 'x.json', size: 10, text: () => Promise.resolve('{"format":"other"}') }
    const r = await readProjectFile(file)
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.errors[0]).toMatch(/^format: must be "gyre-project"/)
  })
})
