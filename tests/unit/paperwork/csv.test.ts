import { describe, expect, it } from 'vitest'
import { csvCell, csvDocument, neutraliseFormula, safeFileName } from '../../../shared/paperwork/csv.js'
import { CsvRefusal, readCsvText, refuseOversizeFile } from '../../../shared/paperwork/csv-read.js'

// Quoting follows RFC 4180 §2; the formula starts are the ones spreadsheets act on (common practice).
describe('the CSV writer', () => {
  it('when a cell holds a comma, a quote or a line break, then it is quoted with its quotes doubled', () => {
    expect(csvCell('Boom, left')).toBe('"Boom, left"')
    expect(csvCell('6" pipe')).toBe('"6"" pipe"')
    expect(csvCell('two\nlines')).toBe('"two\nlines"')
    expect(csvCell('plain')).toBe('plain')
  })

  it('when a text cell starts with =, +, -, @, tab or CR, then it gets a leading apostrophe', () => {
    for (const start of ['=', '+', '-', '@', '\t', '\r']) expect(neutraliseFormula(`${start}1`)).toBe(`'${start}1`)
    expect(csvCell('=1+1')).toBe("'=1+1")
    expect(csvCell('\rX')).toBe(`"'\rX"`)
    expect(csvCell('Wash = 12 lb')).toBe('Wash = 12 lb')
  })

  it('when a cell is a figure, then it is written as the number, negative ones too, never in exponent notation', () => {
    expect(csvCell(-12.5)).toBe('-12.5')
    expect(csvCell(0.0000001)).toBe('0.0000001')
    expect(csvCell(1e21)).toBe('1000000000000000000000')
    expect(csvCell(null)).toBe('')
    expect(csvCell(undefined)).toBe('')
    expect(csvCell(Number.NaN)).toBe('')
  })

  it('when a document is written, then it has the byte-order mark, the header and CR LF after every record', () => {
    expect(
      csvDocument(
        ['Label', 'Weight (lb)'],
        [
          ['Wash', 19.5],
          ['=A1', null],
        ],
      ),
    ).toBe("\uFEFFLabel,Weight (lb)\r\nWash,19.5\r\n'=A1,\r\n")
  })

  it('when a file name is made, then only safe characters remain and an empty stem gets a name', () => {
    expect(safeFileName('Lineset 12 "Electric 1" / rail card', 'pdf')).toBe('Lineset-12-Electric-1-rail-card.pdf')
    expect(safeFileName('../../etc/passwd\r\n', 'csv')).toBe('etc-passwd.csv')
    expect(safeFileName('Théâtre', 'csv')).toBe('Theatre.csv')
    expect(safeFileName('"""', 'csv')).toBe('loftledger.csv')
  })
})

describe('reading CSV text', () => {
  it('when the file has a byte-order mark, mixed line endings, quoted commas and blank rows, then each row reads right', () => {
    const text = '\uFEFFLabel,Weight\r\n"Boom, left",40\n\r\nScrim,"1,5"\rLast,2'
    expect(readCsvText(text)).toEqual({
      header: ['Label', 'Weight'],
      rows: [['Boom, left', '40'], [''], ['Scrim', '1,5'], ['Last', '2']],
    })
  })

  it('when the file is read, then progress reaches the whole file', () => {
    const shares: number[] = []
    readCsvText('a,b\n' + '1,2\n'.repeat(50_000), (share) => shares.push(share), { bytes: 1e7, rows: 60_000 })
    expect(shares.length).toBeGreaterThan(1)
    expect(shares.at(-1)).toBe(1)
  })

  it('when a file has more rows than the limit, then it is refused in words naming the limit', () => {
    expect(() => readCsvText('a\n' + '1\n'.repeat(30_000))).toThrow(
      new CsvRefusal('The file has more than 20,000 rows; a hang import reads at most that many'),
    )
  })

  it('when a file is larger than the limit, then it is refused by its size before it is read', () => {
    expect(() => refuseOversizeFile(80_000_000)).toThrow('The file is 76.3 MB; a hang import reads at most 5 MB')
    expect(() => readCsvText('')).toThrow('The file is empty')
  })
})
