import { PIPE_SIZES, pipeSection } from '../../shared/engine/pipes.js'
import { convert, roundTo, type UnitSystem } from '../../shared/units/index.js'

export const CUSTOM_PIPE = 'custom'

export interface PipeFigures {
  pipeWeightPerLength: number
  pipeMomentOfInertia: number
  pipeSectionModulus: number
}

export interface PipeOption {
  value: string
  title: string
  /** The table's figures in the venue's units; null for a pipe whose figures are entered by hand. */
  figures: PipeFigures | null
}

/** The standard pipe table as select options, figures converted from the table's imperial units. */
export function pipeOptions(system: UnitSystem): PipeOption[] {
  const standard = PIPE_SIZES.map((pipe) => {
    const section = pipeSection(pipe.outsideDiameter, pipe.wall)
    return {
      value: pipe.key,
      title: pipe.label,
      figures: {
        pipeWeightPerLength: roundTo(convert(pipe.weightPerFoot, 'weightPerLength', 'imperial', system), 4),
        pipeMomentOfInertia: roundTo(convert(section.momentOfInertia, 'momentOfInertia', 'imperial', system), 4),
        pipeSectionModulus: roundTo(convert(section.sectionModulus, 'sectionModulus', 'imperial', system), 4),
      },
    }
  })
  return [...standard, { value: CUSTOM_PIPE, title: 'Other pipe (enter its figures)', figures: null }]
}
