import { Dec, convert, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import { findPipeSize, pipeSection } from './pipes.js'

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

/**
 * The batten's section properties from a standard size or from figures entered, else undefined.
 *
 * @example
 * resolvePipe({ pipeSize: 'nps-1-1/2-sch40' }, 'imperial')?.sectionModulus.toFixed(3) // '0.326'
 */
export function resolvePipe(batten: PipeInput, units: UnitSystem): PipeProperties | undefined {
  const steel = (ksi: number) => convert(ksi, 'stress', 'imperial', units)
  if (batten.pipe) {
    const { momentOfInertia, sectionModulus, elasticModulus, yieldStrength } = batten.pipe
    return {
      momentOfInertia: Dec(momentOfInertia),
      sectionModulus: Dec(sectionModulus),
      elasticModulus: elasticModulus === undefined ? steel(ELASTIC_MODULUS_KSI) : Dec(elasticModulus),
      yieldStrength: yieldStrength === undefined ? steel(YIELD_STRENGTH_KSI) : Dec(yieldStrength),
    }
  }
  const size = batten.pipeSize === undefined ? undefined : findPipeSize(batten.pipeSize)
  if (!size) return undefined
  const section = pipeSection(size.outsideDiameter, size.wall)
  return {
    momentOfInertia: convert(section.momentOfInertia, 'momentOfInertia', 'imperial', units),
    sectionModulus: convert(section.sectionModulus, 'sectionModulus', 'imperial', units),
    elasticModulus: steel(ELASTIC_MODULUS_KSI),
    yieldStrength: steel(YIELD_STRENGTH_KSI),
    weightPerLength: convert(size.weightPerFoot, 'weightPerLength', 'imperial', units),
  }
}
