import { Dec } from '../units/decimal.js'

/**
 * One cell of a CSV file: text (a string), a figure (a number), or nothing (`null`/`undefined`, an empty cell).
 * Only text is neutralised against formulas; a figure is written as the number it is, negative or not.
 */
export type CsvCell = string | number | null | undefined

/** The byte-order mark that tells spreadsheets a file is UTF-8. */
export const CSV_BOM = '\uFEFF'
/** Records end with CR LF (RFC 4180). */
export const CSV_RECORD_END = '\r\n'

// A spreadsheet reads a cell starting with one of these as a formula (or, for tab and CR, strips it and then may).
const FORMULA_STARTS = ['=', '+', '-', '@', '\t', '\r']

/**
 * A text cell as a spreadsheet should show it: a leading apostrophe when it would otherwise start a formula.
 *
 * @example
 * neutraliseFormula('=SUM(A1:A9)') // "'=SUM(A1:A9)"
 * neutraliseFormula('Wash 1') // 'Wash 1'
 */
export function neutraliseFormula(text: string): string {
  return FORMULA_STARTS.some((start) => text.startsWith(start)) ? `'${text}` : text
}

/**
 * One cell written by RFC 4180: quoted when it holds a comma, a quote, CR or LF (quotes doubled inside).
 * Numbers are written in plain decimal notation, never exponent notation.
 *
 * @example
 * csvCell('Boom, stage left') // '"Boom, stage left"'
 * csvCell(12.5) // '12.5'
 * csvCell('-3 dB') // "'-3 dB"
 */
export function csvCell(cell: CsvCell): string {
  if (cell === null || cell === undefined) return ''
  if (typeof cell === 'number') return Number.isFinite(cell) ? plainNumber(cell) : ''
  const text = neutraliseFormula(cell)
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text
}

function plainNumber(value: number): string {
  const text = String(value)
  // Tiny or huge figures: a decimal's fixed notation keeps every digit without an exponent.
  return /e/i.test(text) ? Dec(text).toFixed() : text
}

/**
 * A whole CSV document: byte-order mark, the header row, then one record per row, each ending in CR LF.
 *
 * @example
 * csvDocument(['Label', 'Weight (lb)'], [['Wash', 19.5]]) // '\uFEFFLabel,Weight (lb)\r\nWash,19.5\r\n'
 */
export function csvDocument(header: readonly string[], rows: ReadonlyArray<readonly CsvCell[]>): string {
  const records = [header, ...rows].map((row) => row.map(csvCell).join(',') + CSV_RECORD_END)
  return CSV_BOM + records.join('')
}

/**
 * A file name safe in a Content-Disposition header and on any file system: letters, digits, dots, dashes and
 * underscores only, runs of anything else turned into one dash, at most 100 characters before the extension.
 *
 * @example
 * safeFileName('Lineset 12 "Electric 1" / rail card', 'pdf') // 'Lineset-12-Electric-1-rail-card.pdf'
 */
export function safeFileName(stem: string, extension: string): string {
  const clean = stem
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '') // accents apart from their letters, dropped
    .replace(/[^A-Za-z0-9._-]+/g, '-')
    .replace(/^[-.]+|[-.]+$/g, '')
    .slice(0, 100)
  return `${clean || 'loftledger'}.${extension}`
}
