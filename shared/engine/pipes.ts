import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'

/** One standard batten pipe, imperial figures as published (ASME B36.10M). */
export interface PipeSize {
  readonly key: string
  readonly label: string
  /** Outside diameter, in. */
  readonly outsideDiameter: number
  /** Nominal wall thickness, in. */
  readonly wall: number
  /** Plain-end weight, lb/ft. */
  readonly weightPerFoot: number
}

/** Section properties computed from the outside diameter and wall. */
export interface PipeSection {
  /** Second moment of area, in^4. */
  readonly momentOfInertia: Decimal
  /** Elastic section modulus, in^3. */
  readonly sectionModulus: Decimal
}

/**
 * Standard batten pipes. Section properties are computed on the NOMINAL wall
 * (not the 0.93 x nominal design wall some steel tables use), so they match the
 * catalogue figures for the pipe as sold.
 */
export const PIPE_SIZES: readonly PipeSize[] = [
  {
    key: 'nps-1-1/4-sch40',
    label: '1-1/4 in pipe, Schedule 40',
    outsideDiameter: 1.66,
    wall: 0.14,
    weightPerFoot: 2.27,
  },
  {
    key: 'nps-1-1/4-sch80',
    label: '1-1/4 in pipe, Schedule 80',
    outsideDiameter: 1.66,
    wall: 0.191,
    weightPerFoot: 3.0,
  },
  {
    key: 'nps-1-1/2-sch40',
    label: '1-1/2 in pipe, Schedule 40',
    outsideDiameter: 1.9,
    wall: 0.145,
    weightPerFoot: 2.72,
  },
  { key: 'nps-1-1/2-sch80', label: '1-1/2 in pipe, Schedule 80', outsideDiameter: 1.9, wall: 0.2, weightPerFoot: 3.63 },
]

/** The keys the lineset editor may offer, in table order. */
export const PIPE_SIZE_KEYS = PIPE_SIZES.map((pipe) => pipe.key)

const PI = Dec.acos(-1)

/**
 * Finds a standard pipe by its key.
 *
 * @example
 * findPipeSize('nps-1-1/2-sch40')?.weightPerFoot // 2.72
 */
export function findPipeSize(key: string): PipeSize | undefined {
  return PIPE_SIZES.find((pipe) => pipe.key === key)
}

/**
 * Second moment of area and section modulus of a round tube:
 * I = pi/64 (D^4 - d^4), S = I / (D/2), with d = D - 2t.
 *
 * @example
 * pipeSection(1.9, 0.145).momentOfInertia.toFixed(3) // '0.310'
 */
export function pipeSection(outsideDiameter: Decimal.Value, wall: Decimal.Value): PipeSection {
  const outside = Dec(outsideDiameter)
  const inside = outside.minus(Dec(wall).times(2))
  const momentOfInertia = PI.div(64).times(outside.pow(4).minus(inside.pow(4)))
  return { momentOfInertia, sectionModulus: momentOfInertia.div(outside.div(2)) }
}
