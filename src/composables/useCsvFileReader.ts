import { ref } from 'vue'
import { CsvRefusal, refuseOversizeFile, type CsvReading } from '../../shared/paperwork/csv-read.js'
import type { CsvWorkerAnswer } from './csvWorkerAnswer'

/** Reads a chosen file into CSV cells; `onProgress` hears the share read. Refusals throw `CsvRefusal`. */
export type CsvFileReader = (file: File, onProgress: (share: number) => void) => Promise<CsvReading>

/** Reads in a web worker, so a long file never holds the page; a file over the size limit is never read. */
export const readCsvInWorker: CsvFileReader = async (file, onProgress) => {
  refuseOversizeFile(file.size)
  const text = await file.text()
  const worker = new Worker(new URL('../workers/hangCsv.worker.ts', import.meta.url), { type: 'module' })
  try {
    return await new Promise<CsvReading>((resolve, reject) => {
      worker.onmessage = ({ data }: MessageEvent<CsvWorkerAnswer>) => {
        if (data.kind === 'progress') onProgress(data.share)
        else if (data.kind === 'read') resolve({ header: data.header, rows: data.rows })
        else reject(new CsvRefusal(data.message))
      }
      worker.onerror = () => reject(new CsvRefusal('The file could not be read as CSV'))
      worker.postMessage({ text })
    })
  } finally {
    worker.terminate()
  }
}

/** A file's reading with its progress and any refusal, for a dialog to show. */
export function useCsvFileReader(reader: CsvFileReader = readCsvInWorker) {
  const progress = ref<number | null>(null)
  const refusal = ref<string | null>(null)
  const reading = ref<CsvReading | null>(null)
  async function read(file: File) {
    refusal.value = null
    reading.value = null
    progress.value = 0
    try {
      reading.value = await reader(file, (share) => (progress.value = share))
    } catch (error) {
      refusal.value = error instanceof CsvRefusal ? error.message : 'The file could not be read as CSV'
    } finally {
      progress.value = null
    }
  }
  return { progress, refusal, reading, read }
}
