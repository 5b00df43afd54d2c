/** Median and 95th-percentile time per calculation for the engine's three reference workloads. */
import { calculate } from '../shared/engine/index.js'
import { planBricks } from '../shared/engine/brick-plan.js'
import { calculationInputSchema } from '../shared/schemas/calculation.js'

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

function measure(name: string, run: () => unknown, rounds = 2000): void {
  for (let i = 0; i < 300; i++) run()
  const times: number[] = []
  for (let i = 0; i < rounds; i++) {
    const start = process.hrtime.bigint()
    run()
    times.push(Number(process.hrtime.bigint() - start) / 1e6)
  }
  times.sort((a, b) => a - b)
  const median = times[Math.floor(rounds / 2)]!
  const p95 = times[Math.floor(rounds * 0.95)]!
  console.log(`${name.padEnd(48)} median ${median.toFixed(3)} ms   p95 ${p95.toFixed(3)} ms`)
}

const small = batten(40, 5, 20)
const large = batten(60, 7, 200)
measure('40 ft batten, 5 lines, 20 items', () => calculate(small))
measure('60 ft batten, 7 lines, 200 items', () => calculate(large))
measure('brick plan, 4 types, 3,000 lb requirement', () => planBricks(bricks, 3000, 400))
