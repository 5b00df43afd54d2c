import Papa from 'papaparse'

/**
 * How much a hang import reads: a hang holds at most a few hundred items, so these leave room for a long
 * lighting schedule (with notes) and refuse a file that could only be a mistake before it costs memory.
 */
export const IMPORT_LIMITS: Readonly<ImportLimits> = Object.freeze({ bytes: 5 * 1024 * 1024, rows: 20_000 })

/** The most bytes and records an import reads. */
export interface ImportLimits {
  bytes: number
  rows: number
}

// Progress is told every this many records: often enough to move a bar, rarely enough to cost nothing.
const PROGRESS_EVERY = 500

/** A CSV file read into text cells: its header and its records (blank records kept, so row numbers hold). */
export interface CsvReading {
  header: string[]
  rows: string[][]
}

/** Why a file was not read, in words: a refusal, not a crash. */
export class CsvRefusal extends Error {}

const megabytes = (bytes: number) =>
  `${(bytes / (1024 * 1024)).toLocaleString('en-US', { maximumFractionDigits: 1 })} MB`

/**
 * Refuses a file larger than the limit by its size alone, before anything reads it.
 *
 * @example
 * refuseOversizeFile(80_000_000) // throws: 'The file is 76.3 MB; a hang import reads at most 5 MB'
 */
export function refuseOversizeFile(byteSize: number, limits: ImportLimits = IMPORT_LIMITS) {
  if (byteSize > limits.bytes)
    throw new CsvRefusal(`The file is ${megabytes(byteSize)}; a hang import reads at most ${megabytes(limits.bytes)}`)
}

/**
 * Reads CSV text as a spreadsheet wrote it: a byte-order mark dropped, CR LF, CR and LF alike as record ends
 * (even mixed in one file), quoted cells with commas, quotes and line breaks, blank records kept. `onProgress`
 * hears the share read so far (0 to 1). More records than `limits.rows` stop the reading with a refusal.
 *
 * @example
 * readCsvText('\uFEFFLabel,Weight\r\n"Boom, left",40\n').rows // [['Boom, left', '40']]
 */
export function readCsvText(
  text: string,
  onProgress: (share: number) => void = () => {},
  limits: ImportLimits = IMPORT_LIMITS,
): CsvReading {
  refuseOversizeFile(text.length, limits)
  const normalised = text.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n')
  const records: string[][] = []
  let tooMany = false
  Papa.parse<string[]>(normalised, {
    newline: '\n',
    skipEmptyLines: false,
    step: (results, parser) => {
      records.push(results.data)
      if (records.length > limits.rows + 1) {
        tooMany = true
        parser.abort()
      } else if (records.length % PROGRESS_EVERY === 0) onProgress(results.meta.cursor / normalised.length)
    },
  })
  onProgress(1)
  if (tooMany)
    throw new CsvRefusal(
      `The file has more than ${limits.rows.toLocaleString('en-US')} rows; a hang import reads at most that many`,
    )
  // A file ending in a line break leaves one empty record behind it.
  if (records.length && records.at(-1)!.every((cell) => cell === '')) records.pop()
  const [header = [], ...rows] = records
  if (!header.some((cell) => cell.trim()))
    throw new CsvRefusal('The file is empty: the first row should name the columns')
  return { header: header.map((cell) => cell.trim()), rows }
}
