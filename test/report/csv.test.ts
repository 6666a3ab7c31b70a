import { describe, expect, it } from 'vitest'
import { CAUTION } from '@/model'
import { buildResultTables, csvCell, csvField, csvFileName, csvHeader, csvTextField, fileSlug, reportFileName, toCsv } from '@/report'
import type { ResultTable } from '@/report'
import { demoCase } from './fixtures'

/**
 * Reference reader written from the RFC 4180 section 2 grammar (file = record *(CRLF record),
 * escaped = DQUOTE *(TEXTDATA / COMMA / CR / LF / 2DQUOTE) DQUOTE), independent of the writer.
 */
function parseRfc4180(text: string): string[][] {
  const records: string[][] = []
  let record: string[] = []
  let field = ''
  let i = 0
  let quoted = false
  while (i < text.length) {
    const ch = text[i]
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"'
        i += 2
        continue
      }
      if (ch === '"') {
        quoted = false
        i++
        continue
      }
      field += ch
      i++
      continue
    }
    if (ch === '"' && field === '') {
      quoted = true
      i++
    } else if (ch === ',') {
      record.push(field)
      field = ''
      i++
    } else if (ch === '\r' && text[i + 1] === '\n') {
      record.push(field)
      records.push(record)
      record = []
      field = ''
      i += 2
    } else {
      field += ch
      i++
    }
  }
  if (field !== '' || record.length > 0) {
    record.push(field)
    records.push(record)
  }
  return records
}

const tiny = (rows: ResultTable['rows']): ResultTable => ({
  id: 'tiny',
  title: 'Tiny, with a comma',
  columns: [
    { key: 'a', label: 'name', unit: '' },
    { key: 'b', label: 'drift', unit: 'mm' },
  ],
  rows,
  notes: [],
  caution: CAUTION,
})

describe('csvField', () => {
  it('leaves plain text unquoted (RFC 4180 2.5: quotes are optional)', () => {
    expect(csvField('aaa')).toBe('aaa')
  })

  it('quotes a field with a comma, CRLF or LF (RFC 4180 2.6)', () => {
    expect(csvField('a,b')).toBe('"a,b"')
    expect(csvField('b\r\nbb')).toBe('"b\r\nbb"')
    expect(csvField('line\nbreak')).toBe('"line\nbreak"')
  })

  it('doubles an inner double quote and quotes the field (RFC 4180 2.7: "b""bb")', () => {
    expect(csvField('b"bb')).toBe('"b""bb"')
    expect(csvField('"')).toBe('""""')
  })
})

describe('csvTextField', () => {
  // OWASP "CSV Injection": cells starting with = + - @ tab or CR get a leading single quote and
  // are wrapped in double quotes (inner double quotes doubled, RFC 4180 2.7).
  it.each([
    ['=', '=SUM(A1:A9)', `"'=SUM(A1:A9)"`],
    ['+', '+1+cmd', `"'+1+cmd"`],
    ['-', '-2+3', `"'-2+3"`],
    ['@', '@SUM(1)', `"'@SUM(1)"`],
    ['tab', '\t=1', `"'\t=1"`],
    ['CR', '\r=1', `"'\r=1"`],
  ])('neutralises text that starts with %s', (_c, text, expected) => {
    expect(csvTextField(text)).toBe(expected)
  })

  it('doubles inner quotes of a neutralised cell', () => {
    expect(csvTextField('=HYPERLINK("http://example.invalid")')).toBe(`"'=HYPERLINK(""http://example.invalid"")"`)
  })

  it('leaves other text as csvField writes it', () => {
    expect(csvTextField('Level 1')).toBe('Level 1')
    expect(csvTextField('a=b')).toBe('a=b')
    expect(csvTextField('a,=b')).toBe('"a,=b"')
    expect(csvTextField(' =1')).toBe(' =1')
    expect(csvTextField('-inf')).toBe('-inf')
  })
})

describe('csvCell', () => {
  it('keeps a negative number a plain number, not neutralised text', () => {
    expect(csvCell(-1.5)).toBe('-1.5')
    expect(csvCell(-0)).toBe('0')
    expect(csvCell('-1.5')).toBe(`"'-1.5"`)
  })

  it('writes numbers at full precision and null as an empty field', () => {
    // Shortest round-trip decimal of a double (ECMA-262 Number::toString).
    expect(csvCell(0.1 + 0.2)).toBe('0.30000000000000004')
    expect(Number(csvCell(14.763779527559054))).toBe(14.763779527559054)
    expect(csvCell(null)).toBe('')
    expect(csvCell(1e-7)).toBe('1e-7')
  })
})

describe('csvHeader', () => {
  it('puts the unit in brackets after the label and omits empty units', () => {
    expect(csvHeader('drift max', 'in')).toBe('drift max (in)')
    expect(csvHeader('mode', '')).toBe('mode')
  })
})

describe('toCsv', () => {
  it('ends every line with CRLF and never has a bare LF outside quotes (RFC 4180 2.1)', () => {
    const text = toCsv(tiny([['plain', 1.5], ['two\nlines', 2]]), { name: 'P' })
    expect(text.endsWith('\r\n')).toBe(true)
    const outside = text.replace(/"(?:[^"]|"")*"/g, '')
    expect(outside.replace(/\r\n/g, '')).not.toMatch(/[\r\n]/)
  })

  it('starts with a # comment holding the project name, the title and the caution', () => {
    const text = toCsv(tiny([]), { name: 'Tower\nA, "B"' })
    // The comment line is one RFC 4180 field, quoted because it holds commas and quotes.
    const first = parseRfc4180(text)[0] ?? []
    expect(first).toHaveLength(1)
    expect(first[0]?.startsWith('# ')).toBe(true)
    expect(first[0]).toContain('Tower A, "B"')
    expect(first[0]).toContain('Tiny, with a comma')
    expect(first[0]).toContain(CAUTION)
    expect(toCsv(tiny([]), { name: 'Plain' }).startsWith('"# Plain | Tiny, with a comma | ')).toBe(true)
  })

  it('keeps a formula after a comma in the project name inside the one comment field (CSV injection)', () => {
    const text = toCsv(tiny([]), { name: 'Tower,=HYPERLINK("http://example.invalid","x"),@SUM(1)' })
    const first = parseRfc4180(text)[0] ?? []
    expect(first).toHaveLength(1)
    expect(first[0]).toMatch(/^# Tower,=HYPERLINK/)
  })

  it('neutralises text cells and keeps numbers numbers in a whole table (CSV injection)', () => {
    const rows: ResultTable['rows'] = [
      ['=1+1', -1.5],
      ['-cmd', -0.25],
      ['+x', 3],
      ['@SUM(A1)', -1e-7],
      ['X-e', null],
    ]
    const records = parseRfc4180(toCsv(tiny(rows), { name: 'P' }))
    expect(records.slice(2)).toEqual([
      ["'=1+1", '-1.5'],
      ["'-cmd", '-0.25'],
      ["'+x", '3'],
      ["'@SUM(A1)", '-1e-7'],
      ['X-e', ''],
    ])
    const lines = toCsv(tiny(rows), { name: 'P' }).split('\r\n')
    expect(lines[2]).toBe(`"'=1+1",-1.5`)
    expect(lines[5]).toBe(`"'@SUM(A1)",-1e-7`)
  })

  it('round-trips the RFC 4180 examples through an independent reader', () => {
    const rows: ResultTable['rows'] = [
      ['aaa', 1],
      ['b"bb', 2.25],
      ['c,cc', null],
      ['d\r\ndd', -0.5],
    ]
    const records = parseRfc4180(toCsv(tiny(rows), { name: 'P' }))
    expect(records[1]).toEqual(['name', 'drift (mm)'])
    expect(records.slice(2)).toEqual([
      ['aaa', '1'],
      ['b"bb', '2.25'],
      ['c,cc', ''],
      ['d\r\ndd', '-0.5'],
    ])
    // Every record has the same number of fields (RFC 4180 2.4).
    for (const r of records.slice(1)) expect(r.length).toBe(2)
  })

  it('writes the demo modes table with the period of mode 1 at full precision', () => {
    const { project, result } = demoCase()
    const modes = buildResultTables(project, result, 'SI').find((t) => t.id === 'modes')
    if (!modes) throw new Error('no modes table')
    const records = parseRfc4180(toCsv(modes, project))
    expect(records[1]?.[1]).toBe('T (s)')
    expect(Number(records[2]?.[1])).toBe(result.modes?.periods[0])
    expect(records.length).toBe(2 + (result.modes?.count ?? 0))
  })
})

describe('csvFileName', () => {
  it('makes a safe name from the project and the table id', () => {
    expect(csvFileName({ name: 'Corner Block, Quarry Street' }, { id: 'modes' })).toBe(
      'corner-block-quarry-street-modes.csv',
    )
    expect(csvFileName({ name: '../../etc/<x>' }, { id: 'floors' })).toBe('etc-x-floors.csv')
    expect(csvFileName({ name: '' }, { id: 'floors' })).toBe('gyre-project-floors.csv')
  })
})

describe('fileSlug', () => {
  it('folds accents and caps the length at 60 characters', () => {
    expect(fileSlug('Café Zürich')).toBe('cafe-zurich')
    expect(fileSlug('x'.repeat(80)).length).toBe(60)
  })
})

describe('reportFileName', () => {
  it('ends in -report.html', () => {
    expect(reportFileName({ name: 'Corner Block' })).toBe('corner-block-report.html')
  })
})
