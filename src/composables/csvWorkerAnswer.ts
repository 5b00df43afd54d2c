import type { CsvReading } from '../../shared/paperwork/csv-read.js'

/** What the CSV worker posts back: progress (0 to 1), the reading, or a refusal in words. */
export type CsvWorkerAnswer =
  { kind: 'progress'; share: number } | ({ kind: 'read' } & CsvReading) | { kind: 'refused'; message: string }
