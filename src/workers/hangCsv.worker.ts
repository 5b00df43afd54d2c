/// <reference lib="webworker" />
import { CsvRefusal, readCsvText } from '../../shared/paperwork/csv-read.js'
import type { CsvWorkerAnswer } from '../composables/csvWorkerAnswer'

// Reads a hang's CSV off the page's thread, telling progress as it goes; thin on purpose: the rules are shared.
self.onmessage = (event: MessageEvent<{ text: string }>) => {
  const post = (answer: CsvWorkerAnswer) => self.postMessage(answer)
  try {
    const reading = readCsvText(event.data.text, (share) => post({ kind: 'progress', share }))
    post({ kind: 'read', ...reading })
  } catch (error) {
    const message = error instanceof CsvRefusal ? error.message : 'The file could not be read as CSV'
    post({ kind: 'refused', message })
  }
}
