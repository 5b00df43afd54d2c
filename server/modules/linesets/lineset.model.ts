import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize'
import {
  uuidKey,
  lockVersion,
  timestamps,
  optionalDecimal,
  requiredDecimal,
  requiredText,
  requiredUuid,
} from '../../db/columns.js'
import type { LinesetKind, LinesetStatus } from '../../../shared/schemas/lineset.js'

/** Quantities are SI decimal strings (m, kg, kg/m, m^4, m^3, m/s); see lineset.mapper.ts. */
export function defineLinesetModel(sequelize: Sequelize) {
  class LinesetModel extends Model<InferAttributes<LinesetModel>, InferCreationAttributes<LinesetModel>> {
    declare id: CreationOptional<string>
    declare venueId: string
    declare number: number
    declare name: string
    declare kind: LinesetKind
    declare status: LinesetStatus
    declare distanceFromPlasterLine: string | null
    declare battenLength: string
    declare pipeSize: string
    declare pipeWeightPerLength: string
    declare pipeMomentOfInertia: string | null
    declare pipeSectionModulus: string | null
    declare pickPoints: string[]
    declare liftLineWeightPerLength: string | null
    declare liftLineBreakingStrength: string | null
    declare liftLineLengths: string[] | null
    declare liftLineRope: string | null
    declare liftLineAxialStiffness: string | null
    declare arborEmptyWeight: string | null
    declare arborCapacity: string | null
    declare arborStackLength: string | null
    declare ratedLoad: string | null
    declare pipeWeight: string | null
    declare travel: string | null
    declare sandbagWeight: string | null
    declare hoistRatedCapacity: string | null
    declare hoistSpeed: string | null
    declare notes: string
    declare retiredAt: Date | null
    declare version: CreationOptional<number>
    declare createdAt: CreationOptional<Date>
    declare updatedAt: CreationOptional<Date>
  }
  LinesetModel.init(
    {
      ...uuidKey(),
      venueId: requiredUuid(),
      number: { type: DataTypes.INTEGER, allowNull: false },
      name: requiredText(),
      kind: requiredText(),
      status: requiredText(),
      distanceFromPlasterLine: optionalDecimal(),
      battenLength: requiredDecimal(),
      pipeSize: requiredText(),
      pipeWeightPerLength: requiredDecimal(),
      pipeMomentOfInertia: optionalDecimal(),
      pipeSectionModulus: optionalDecimal(),
      pickPoints: { type: DataTypes.ARRAY(DataTypes.DECIMAL), allowNull: false },
      liftLineWeightPerLength: optionalDecimal(),
      liftLineBreakingStrength: optionalDecimal(),
      liftLineLengths: { type: DataTypes.ARRAY(DataTypes.DECIMAL), allowNull: true },
      liftLineRope: { type: DataTypes.TEXT, allowNull: true },
      liftLineAxialStiffness: optionalDecimal(),
      arborEmptyWeight: optionalDecimal(),
      arborCapacity: optionalDecimal(),
      arborStackLength: optionalDecimal(),
      ratedLoad: optionalDecimal(),
      pipeWeight: optionalDecimal(),
      travel: optionalDecimal(),
      sandbagWeight: optionalDecimal(),
      hoistRatedCapacity: optionalDecimal(),
      hoistSpeed: optionalDecimal(),
      notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      retiredAt: { type: DataTypes.DATE, allowNull: true },
      ...lockVersion(),
      ...timestamps(),
    },
    { sequelize, tableName: 'linesets' },
  )
  return LinesetModel
}
export type LinesetModel = InstanceType<ReturnType<typeof defineLinesetModel>>
