/**
 * Median and 95th-percentile time per calculation: the engine's reference workloads, then the worst accepted
 * input known, on the server's path (the calculation thread) and on the browser's hang editor path (building the
 * input from a stored lineset and the typed rows, then the same engine). Target: the worst case well under 100 ms.
 */
import { pathToFileURL } from 'node:url'
import { join } from 'node:path'
import { ref, type Ref } from 'vue'
import { calculate, runCalculation } from '../shared/engine/index.js'
import { planBricks } from '../shared/engine/brick-plan.js'
import { calculationInputSchema } from '../shared/schemas/calculation.js'
import { createCalculationPool } from '../server/modules/calculations/calculation-pool.js'
import { awkwardBricks, heaviestCalculation, worstCalculation } from './lib/worst-calculations.js'
import { worstLinesetScene, type TypedRow } from './lib/worst-lineset-scene.js'
import { projectRoot } from './lib/paths.js'

/** Figures as a crew types them: two decimal places at most. */
const round2 = (value: number) => Math.round(value * 100) / 100

function batten(length: number, lines: number, items: number) {
  const pickPoints = Array.from({ length: lines }, (_, k) => (k * length) / (lines - 1))
  const hung = Array.from({ length: items }, (_, k) =>
    k % 5 === 4
      ? {
          label: `cable ${k}`,
          weightPerLength: 0.5 + (k % 3),
          from: round2((k * 0.37) % (length / 2)),
          to: round2(length / 2 + ((k * 0.41) % (length / 2))),
        }
      : { label: `fixture ${k}`, weight: 12 + (k % 7) * 3.5, at: Math.round(((k * 7.3) % length) * 100) / 100 },
  )
  return calculationInputSchema.parse({
    units: 'imperial',
    kind: 'counterweight-single',
    batten: { length, pickPoints, pipeSize: 'nps-1-1/2-sch40' },
    items: hung,
    arbor: { emptyWeight: 90, capacity: 2000, stackLength: 60 },
    bricks: [
      { name: 'full', weight: 20, thickness: 2, available: 80 },
      { name: 'half', weight: 10, thickness: 1, available: 10 },
    ],
    liftLine: { weightPerLength: 0.11, breakingStrength: 7000, designFactor: 8 },
    tolerance: 10,
    trims: { in: 4, out: 50 },
  })
}

const bricks = [
  { name: 'full', weight: 20, thickness: 2, available: 200 },
  { name: 'half', weight: 10, thickness: 1, available: 40 },
  { name: 'quarter', weight: 5, thickness: 0.5, available: 40 },
  { name: 'lead', weight: 37.5, thickness: 1.25, available: 30 },
]

const TARGET_MS = 100
const slowest: Array<{ name: string; median: number; p95: number }> = []

function report(name: string, times: number[]) {
  times.sort((a, b) => a - b)
  const median = times[Math.floor(times.length / 2)]!
  const p95 = times[Math.floor(times.length * 0.95)]!
  slowest.push({ name, median, p95 })
  console.log(`${name.padEnd(64)} median ${median.toFixed(3)} ms   p95 ${p95.toFixed(3)} ms`)
}

function measure(name: string, run: () => unknown, rounds = 2000, warmUp = 300): void {
  for (let i = 0; i < warmUp; i++) run()
  const times: number[] = []
  for (let i = 0; i < rounds; i++) {
    const start = process.hrtime.bigint()
    run()
    times.push(Number(process.hrtime.bigint() - start) / 1e6)
  }
  report(name, times)
}

async function measureAsync(name: string, run: () => Promise<unknown>, rounds: number, warmUp: number) {
  for (let i = 0; i < warmUp; i++) await run()
  const times: number[] = []
  for (let i = 0; i < rounds; i++) {
    const start = process.hrtime.bigint()
    await run()
    times.push(Number(process.hrtime.bigint() - start) / 1e6)
  }
  report(name, times)
}

/** The same items crowded into the first 12 ft, so the line at 20 ft would push and goes slack. */
function slackBatten() {
  const input = batten(60, 7, 200)
  const crowd = (x: number) => round2((x * 12) / 60)
  const items = input.items.map((item) =>
    item.at !== undefined
      ? { ...item, at: crowd(item.at) }
      : { ...item, from: crowd(item.from ?? 0), to: Math.max(crowd(item.to ?? 60), crowd(item.from ?? 0) + 0.5) },
  )
  const crowded = calculationInputSchema.parse({ ...input, items })
  const tension = calculate(crowded).tensionOnly
  if (!tension?.stable || tension.slackLines.length === 0) throw new Error('the slack case has no slack line')
  return crowded
}

const small = batten(40, 5, 20)
const large = batten(60, 7, 200)
const slack = slackBatten()
measure('40 ft batten, 5 lines, 20 items', () => calculate(small))
measure('60 ft batten, 7 lines, 200 items', () => calculate(large))
measure('60 ft batten, 7 lines, 200 items, a line slack (target < 2 ms)', () => calculate(slack))
measure('brick plan, 4 types, 3,000 lb requirement', () => planBricks(bricks, 3000, 400))

console.log('\nThe worst accepted inputs known (scripts/lib/worst-calculations.ts):')
measure(
  'brick plan at its work limit, 20 awkward types',
  () => planBricks(awkwardBricks('imperial'), 10050, 393),
  60,
  10,
)
for (const [name, raw] of [
  ['worst (24 lines, 250 long-digit items, 2 plans at limit)', worstCalculation('imperial')],
  ['heaviest (250 items of 44,000 lb, double purchase)', heaviestCalculation('imperial')],
] as const) {
  // The server's path: the JSON body validated and calculated on the calculation thread, and the answer back.
  const body = JSON.stringify(raw)
  measure(`engine, ${name}`, () => JSON.stringify(runCalculation(JSON.parse(body))), 60, 10)
  const pool = createCalculationPool()
  await measureAsync(`server, ${name}`, () => pool.run(JSON.parse(body)), 60, 10)
  await pool.close()
}

// The browser's path: the hang editor's composable (Vue's reactivity runs in Node as in the browser), one keystroke
// in one row read by the shared schema, expanded as on the server and recomputed with everything the editor shows.
// Loaded by path: the client is typechecked on its own.
const live = (await import(pathToFileURL(join(projectRoot, 'src/composables/useHangEditor.ts')).href)) as {
  useHangEditor(sources: { lineset: Ref<unknown>; venue: Ref<unknown>; brickTypes: Ref<unknown> }): {
    rows: Ref<TypedRow[]>
    balance: { result: Ref<unknown>; otherProblems: Ref<unknown> }
    rowMessages: Ref<unknown>
  }
}
const scene = worstLinesetScene('imperial')
const editor = live.useHangEditor({
  lineset: ref(scene.lineset),
  venue: ref(scene.venue),
  brickTypes: ref(scene.brickTypes),
})
editor.rows.value = scene.rows
const balance = {
  result: editor.balance.result,
  rowMessages: editor.rowMessages,
  otherProblems: editor.balance.otherProblems,
}
let keystroke = 0
// A point row's weight: a figure the sum reads, so every keystroke recomputes it.
const typedRow = editor.rows.value.findIndex((row) => row.kind === 'point')
const type = (text: (n: number) => string) => () => {
  editor.rows.value[typedRow]!.weight = text(keystroke++)
  const shown = [balance.result.value, balance.rowMessages.value, balance.otherProblems.value]
  if (!shown[0] && !Object.keys(shown[1] as object).length) throw new Error('the hang editor worked nothing out')
  return shown
}
measure(
  'hang editor, worst lineset and 250 rows, a keystroke',
  type((n) => String(100 + (n % 50))),
  60,
  10,
)
measure(
  'hang editor, the same with one row refused',
  type((n) => `1${n % 10}x`),
  60,
  10,
)

// "Well under" the target: the median at most half of it. The p95 also carries whatever else the machine runs.
const worst = slowest.reduce((a, b) => (b.median > a.median ? b : a))
console.log(
  `\nWorst case: ${worst.name}, median ${worst.median.toFixed(1)} ms, p95 ${worst.p95.toFixed(1)} ms ` +
    `(target: well under ${TARGET_MS} ms)` +
    (worst.median <= TARGET_MS / 2 ? '' : '  ** OVER TARGET **'),
)
