import { Dec, UNIT_SYSTEMS, convert, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import { PIPE_SIZES, pipeSection } from './pipes.js'

/** Stiffness and strength of the batten pipe, in the input's units (in⁴, in³, ksi or mm⁴, mm³, MPa). */
export interface PipeProperties {
  momentOfInertia: Decimal
  sectionModulus: Decimal
  elasticModulus: Decimal
  yieldStrength: Decimal
  /** Weight per length from the pipe table, when a standard size was chosen. */
  weightPerLength?: Decimal
}

/** Steel defaults: E = 29,000 ksi; Fy = 35 ksi (ASTM A53 Grade B). */
const ELASTIC_MODULUS_KSI = 29000
const YIELD_STRENGTH_KSI = 35

interface PipeInput {
  pipeSize?: string
  pipe?: { momentOfInertia: number; sectionModulus: number; elasticModulus?: number; yieldStrength?: number }
}

/** Steel defaults in each unit system, converted once. */
const STEEL = Object.fromEntries(
  UNIT_SYSTEMS.map((units) => [
    units,
    {
      elasticModulus: convert(ELASTIC_MODULUS_KSI, 'stress', 'imperial', units),
      yieldStrength: convert(YIELD_STRENGTH_KSI, 'stress', 'imperial', units),
    },
  ]),
) as Record<UnitSystem, { elasticModulus: Decimal; yieldStrength: Decimal }>

/** Every standard pipe's properties in each unit system, worked out once (section powers and conversions are costly). */
const STANDARD = new Map(
  PIPE_SIZES.flatMap((size) => {
    const section = pipeSection(size.outsideDiameter, size.wall)
    return UNIT_SYSTEMS.map((units): [string, PipeProperties] => [
      `${size.key} ${units}`,
      {
        momentOfInertia: convert(section.momentOfInertia, 'momentOfInertia', 'imperial', units),
        sectionModulus: convert(section.sectionModulus, 'sectionModulus', 'imperial', units),
        ...STEEL[units],
        weightPerLength: convert(size.weightPerFoot, 'weightPerLength', 'imperial', units),
      },
    ])
  }),
)

/**
 * The batten's section properties from a standard size or from figures entered, else undefined.
 *
 * @example
 * resolvePipe({ pipeSize: 'nps-1-1/2-sch40' }, 'imperial')?.sectionModulus.toFixed(3) // '0.326'
 */
export function resolvePipe(batten: PipeInput, units: UnitSystem): PipeProperties | undefined {
  if (batten.pipe) {
    const { momentOfInertia, sectionModulus, elasticModulus, yieldStrength } = batten.pipe
    return {
      momentOfInertia: Dec(momentOfInertia),
      sectionModulus: Dec(sectionModulus),
      elasticModulus: elasticModulus === undefined ? STEEL[units].elasticModulus : Dec(elasticModulus),
      yieldStrength: yieldStrength === undefined ? STEEL[units].yieldStrength : Dec(yieldStrength),
    }
  }
  const standard = batten.pipeSize === undefined ? undefined : STANDARD.get(`${batten.pipeSize} ${units}`)
  return standard && { ...standard }
}
