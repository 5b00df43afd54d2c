// Loads the calculation thread's TypeScript in a worker of its own, however the main thread was started
// (`node --import tsx`, or the test runner's own transform): a worker does not inherit either.
import { tsImport } from 'tsx/esm/api'

await tsImport('./calculation.worker.ts', import.meta.url)
