import { afterEach, describe, expect, it } from 'vitest'
import type { VueWrapper } from '@vue/test-utils'
import { calculate } from '../../shared/engine/calculate.js'
import { calculationInputSchema, type CalculationInput } from '../../shared/schemas/calculation.js'
import BattenDiagram from '../../src/components/BattenDiagram.vue'
import { DIAGRAM } from '../../src/composables/battenDiagram'
import { mountWithApp } from './mount'

let wrapper: VueWrapper | undefined
afterEach(() => wrapper?.unmount())

/** A hemp set (no arbor needed) with a known pipe, so the engine gives moment, stress and shape. */
function engine(options: { length: number; pickPoints: number[]; items: CalculationInput['items']; extra?: object }) {
  const input = calculationInputSchema.parse({
    units: 'imperial',
    kind: 'hemp-multi',
    batten: { length: options.length, pickPoints: options.pickPoints, pipeSize: 'nps-1-1/2-sch40' },
    items: options.items,
    liftLine: { designFactor: 8, breakingStrength: 4000 },
    ...options.extra,
  })
  return { input, result: calculate(input) }
}

const even = engine({
  length: 40,
  pickPoints: [0, 10, 20, 30, 40],
  items: [
    { label: 'Border', weightPerLength: 5, from: 0, to: 40 },
    { label: 'Special', weight: 60, at: 25 },
  ],
})
const MOMENT_ZERO = 250
const SHAPE_ZERO = 340
/** The drawn points of an SVG path made of M/L commands. */
const pathPoints = (d: string) =>
  [...d.matchAll(/[ML] (-?[\d.]+) (-?[\d.]+)/g)].map((m) => ({ x: Number(m[1]), y: Number(m[2]) }))
const arrowXs = (w: VueWrapper) => w.findAll('[data-diagram-arrow]').map((arrow) => Number(arrow.attributes('data-x')))

describe('BattenDiagram', () => {
  it('when a batten hangs on five lines, then five arrows are drawn, each labelled with its load', () => {
    wrapper = mountWithApp(BattenDiagram, { props: even })
    const arrows = wrapper.findAll('[data-diagram-arrow]')
    expect(arrows).toHaveLength(5)
    even.result.lineLoads.forEach((line, k) =>
      expect(arrows[k]!.text()).toContain(`${line.load.toLocaleString('en-US', { maximumFractionDigits: 2 })} lb`),
    )
    expect(wrapper.findAll('[data-testid="diagram-item-stretch"]')).toHaveLength(1)
    expect(wrapper.findAll('[data-testid="diagram-item-point"]')).toHaveLength(1)
    expect(wrapper.find('[data-testid="diagram-dangers"]').exists()).toBe(false)
  })

  it('when the diagram is an image, then its aria-label states every line load and the table repeats them', () => {
    wrapper = mountWithApp(BattenDiagram, { props: even })
    const svg = wrapper.get('svg')
    expect(svg.attributes('role')).toBe('img')
    const label = svg.attributes('aria-label')!
    expect(label).toContain('40 ft batten on 5 lift lines')
    for (const line of even.result.lineLoads) expect(label).toContain(`at ${line.at} ft`)
    const rows = wrapper.get('[data-testid="diagram-table"]').findAll('tbody tr')
    expect(rows.slice(0, 5).map((row) => row.get('th').text())).toEqual(['1', '2', '3', '4', '5'])
  })

  it('when a load lifts the far line, then that line is drawn slack in the danger colour and says so in text', () => {
    // One of two equal spans loaded at its centre: the far line takes -3/32 P (AISC beam diagrams, continuous beam, two equal spans, concentrated load at centre of one span).
    const lifted = engine({ length: 20, pickPoints: [0, 10, 20], items: [{ label: 'Truss', weight: 320, at: 5 }] })
    expect(lifted.result.lineLoads[2]!.load).toBeLessThan(0)
    wrapper = mountWithApp(BattenDiagram, { props: lifted })
    const far = wrapper.get('[data-testid="diagram-line-2"]')
    expect(far.classes()).toContain('batten-diagram--danger')
    expect(far.text()).toContain('SLACK')
    expect(wrapper.get('[data-testid="diagram-dangers"]').text()).toContain('Line 3 is slack')
    expect(wrapper.get('svg').attributes('aria-label')).toContain('(slack)')
    expect(wrapper.get('[data-testid="diagram-line-0"]').classes()).not.toContain('batten-diagram--danger')
    // The engine's own tension-only loads are drawn without being passed separately.
    const middle = lifted.result.tensionOnly!.lineLoads[1]!.load
    expect(wrapper.get('[data-testid="diagram-line-1"]').text()).toContain(
      `${middle.toLocaleString('en-US', { maximumFractionDigits: 2 })} lb`,
    )
  })

  it('when a line goes slack, then the moment and the shape follow the batten on the lines still holding', () => {
    // The same lifted batten: without its far line it hangs from two lines with the last 10 ft overhanging, so the
    // shape rises at the slack line instead of being pinned to it, and the moment over the middle line is only
    // the overhang's own weight (wL²/2, common practice) rather than the three-line beam's -3/32 PL.
    const lifted = engine({ length: 20, pickPoints: [0, 10, 20], items: [{ label: 'Truss', weight: 320, at: 5 }] })
    wrapper = mountWithApp(BattenDiagram, { props: lifted })
    const xs = [0, 10, 20].map((at) => DIAGRAM.left + ((DIAGRAM.right - DIAGRAM.left) * at) / 20)
    const shape = pathPoints(wrapper.get('[data-testid="diagram-shape"]').attributes('d')!)
    const shapeAt = (x: number) => shape.find((p) => Math.abs(p.x - x) < 0.01)!.y
    expect(shapeAt(xs[0]!)).toBeCloseTo(SHAPE_ZERO, 1)
    expect(shapeAt(xs[1]!)).toBeCloseTo(SHAPE_ZERO, 1)
    // Up is smaller y: the batten lifts off the slack line.
    expect(shapeAt(xs[2]!)).toBeLessThan(SHAPE_ZERO - 5)
    const moment = pathPoints(wrapper.get('[data-testid="diagram-moment"]').attributes('d')!)
    const depth = (p: { y: number }) => Math.abs(p.y - MOMENT_ZERO)
    const deepest = Math.max(...moment.map(depth))
    const overMiddle = depth(moment.find((p) => Math.abs(p.x - xs[1]!) < 0.01)!)
    // Held on two lines: 2.72 lb/ft × 10² / 2 = 136 lb·ft hogging against 766 sagging (ratio ~0.18); the
    // rigid three-line beam would have 300 against 650 (~0.46). NPS 1½ schedule 40 weighs 2.72 lb/ft (source: ASME B36.10M).
    expect(overMiddle / deepest).toBeLessThan(0.3)
    expect(lifted.result.moment.max).toBeGreaterThan(700)
  })

  it('when the tension-only figures name a slack line, then that line is drawn slack with their load', () => {
    wrapper = mountWithApp(BattenDiagram, {
      props: { ...even, tensionOnly: { lineLoads: [50, 120, 0, 120, 50], slackLines: [2], stable: false } },
    })
    expect(wrapper.get('[data-testid="diagram-line-2"]').text()).toContain('SLACK')
    expect(wrapper.get('[data-testid="diagram-line-1"]').text()).toContain('120 lb')
    expect(wrapper.get('[data-testid="diagram-dangers"]').text()).toContain('does not hang steady')
  })

  it('when a line carries more than its working load limit or the pipe is overstressed, then both are said in words', () => {
    const heavy = engine({
      length: 20,
      pickPoints: [0, 20],
      items: [{ label: 'Truss', weight: 1400, at: 10 }],
    })
    expect(heavy.result.bending!.utilisation).toBeGreaterThan(1)
    wrapper = mountWithApp(BattenDiagram, { props: heavy })
    const dangers = wrapper.get('[data-testid="diagram-dangers"]').text()
    expect(dangers).toContain('over its working load limit')
    expect(dangers).toContain('bending stress in the batten is beyond the allowable')
    expect(wrapper.get('[data-testid="diagram-moment"]').classes()).toContain('batten-diagram--danger')
    expect(wrapper.get('[data-testid="diagram-moment-caption"]').text()).toContain('BEYOND IT')
  })

  it('when the lineset gives its line lengths and rope, then each line also shows its load with the lines stretching', () => {
    const lengths = { lengths: [150, 5, 150], rope: '7x19-galvanized-1/8' }
    const probe = engine({
      length: 40,
      pickPoints: [0, 20, 40],
      items: [{ label: 'Border', weightPerLength: 5, from: 0, to: 40 }],
      extra: { liftLine: { designFactor: 8, breakingStrength: 40000, ...lengths } },
    })
    const stretched = probe.result.elasticLines!.lineLoads.map((line) => line.load)
    const rigid = probe.result.lineLoads.map((line) => line.load)
    // Long end lines stretch more than the short middle one, so the middle takes more than its rigid share.
    expect(stretched[1]).toBeGreaterThan(Math.max(...rigid))
    // A limit between the heaviest rigid load and that line's stretching load: over only once the lines stretch.
    const limit = (Math.max(...rigid) + stretched[1]!) / 2
    const stretching = engine({
      length: 40,
      pickPoints: [0, 20, 40],
      items: [{ label: 'Border', weightPerLength: 5, from: 0, to: 40 }],
      extra: { liftLine: { designFactor: 8, breakingStrength: limit * 8, ...lengths } },
    })
    wrapper = mountWithApp(BattenDiagram, { props: stretching })
    const shown = (load: number) => `${load.toLocaleString('en-US', { maximumFractionDigits: 2 })} lb`
    stretched.forEach((load, k) => {
      expect(wrapper!.get(`[data-testid="diagram-line-stretch-${k}"]`).text()).toBe(`~${shown(load)}`)
      expect(wrapper!.get(`[data-testid="diagram-table-stretch-${k}"]`).text()).toContain(shown(load))
    })
    expect(wrapper.get('[data-testid="diagram-table-stretch-1"]').classes()).toContain('batten-diagram--danger')
    expect(wrapper.get('[data-testid="diagram-table-stretch-0"]').classes()).not.toContain('batten-diagram--danger')
    expect(wrapper.get('svg').attributes('aria-label')).toContain(
      `${shown(stretched[1]!)} with the lines stretching (over limit)`,
    )
    expect(wrapper.get('[data-testid="diagram-dangers"]').text()).toContain(
      `With the lines stretching, line 2 carries ${shown(stretched[1]!)}, over its working load limit.`,
    )
    expect(wrapper.get('[data-testid="diagram-stretch-note"]').text()).toContain(probe.result.elasticLines!.basis)
  })

  it('when the lines are rigid, then no stretching figures or column appear', () => {
    wrapper = mountWithApp(BattenDiagram, { props: even })
    expect(wrapper.find('[data-testid="diagram-line-stretch-0"]').exists()).toBe(false)
    expect(wrapper.get('[data-testid="diagram-table"]').findAll('thead th')).toHaveLength(3)
    expect(wrapper.find('[data-testid="diagram-stretch-note"]').exists()).toBe(false)
  })

  it('when the same lines hang on a batten twice as long, then every line sits at half the distance along the drawing', () => {
    const short = engine({ length: 20, pickPoints: [0, 5, 10], items: [] })
    const long = engine({ length: 40, pickPoints: [0, 5, 10], items: [] })
    wrapper = mountWithApp(BattenDiagram, { props: short })
    const shortXs = arrowXs(wrapper).map((x) => x - DIAGRAM.left)
    wrapper.unmount()
    wrapper = mountWithApp(BattenDiagram, { props: long })
    const longXs = arrowXs(wrapper).map((x) => x - DIAGRAM.left)
    longXs.forEach((x, k) => expect(x).toBeCloseTo(shortXs[k]! / 2, 6))
    expect(shortXs[2]).toBeCloseTo((DIAGRAM.right - DIAGRAM.left) / 2, 6)
  })

  it('when the figures change, then the same SVG stays mounted and only its attributes move', async () => {
    wrapper = mountWithApp(BattenDiagram, { props: even })
    const svg = wrapper.get('svg').element
    const before = wrapper.get('[data-testid="diagram-moment"]').attributes('d')
    const moved = engine({
      length: 40,
      pickPoints: [0, 10, 20, 30, 40],
      items: [{ label: 'Special', weight: 200, at: 5 }],
    })
    await wrapper.setProps(moved)
    expect(wrapper.get('svg').element).toBe(svg)
    expect(wrapper.get('[data-testid="diagram-moment"]').attributes('d')).not.toBe(before)
  })

  it('when only a saved result is given, then the lines and loads are drawn to the batten length given', () => {
    wrapper = mountWithApp(BattenDiagram, { props: { result: even.result, battenLength: 80 } })
    expect(wrapper.findAll('[data-diagram-arrow]')).toHaveLength(5)
    expect(arrowXs(wrapper)[4]).toBeCloseTo(DIAGRAM.left + (DIAGRAM.right - DIAGRAM.left) / 2, 6)
    expect(wrapper.find('[data-testid="diagram-moment"]').exists()).toBe(false)
  })

  it('when the venue is metric, then lengths and loads are in metres and kilograms', () => {
    const input = calculationInputSchema.parse({
      units: 'metric',
      kind: 'hemp-multi',
      batten: { length: 12, pickPoints: [0, 6, 12], weightPerLength: 4 },
      items: [],
    })
    wrapper = mountWithApp(BattenDiagram, { props: { input, result: calculate(input) } })
    const label = wrapper.get('svg').attributes('aria-label')!
    expect(label).toContain('12 m batten')
    expect(label).toMatch(/line 2 at 6 m: [\d.,]+ kg/)
  })
})
