import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
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
  // A fresh object per attribute: Sequelize writes each attribute's column name into its definition.
  const quantity = () => ({ type: DataTypes.DECIMAL, allowNull: true })
  LinesetModel.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      venueId: { type: DataTypes.UUID, allowNull: false },
      number: { type: DataTypes.INTEGER, allowNull: false },
      name: { type: DataTypes.TEXT, allowNull: false },
      kind: { type: DataTypes.TEXT, allowNull: false },
      status: { type: DataTypes.TEXT, allowNull: false },
      distanceFromPlasterLine: quantity(),
      battenLength: { type: DataTypes.DECIMAL, allowNull: false },
      pipeSize: { type: DataTypes.TEXT, allowNull: false },
      pipeWeightPerLength: { type: DataTypes.DECIMAL, allowNull: false },
      pipeMomentOfInertia: quantity(),
      pipeSectionModulus: quantity(),
      pickPoints: { type: DataTypes.ARRAY(DataTypes.DECIMAL), allowNull: false },
      liftLineWeightPerLength: quantity(),
      liftLineBreakingStrength: quantity(),
      arborEmptyWeight: quantity(),
      arborCapacity: quantity(),
      arborStackLength: quantity(),
      ratedLoad: quantity(),
      pipeWeight: quantity(),
      travel: quantity(),
      sandbagWeight: quantity(),
      hoistRatedCapacity: quantity(),
      hoistSpeed: quantity(),
      notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      retiredAt: { type: DataTypes.DATE, allowNull: true },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'linesets' },
  )
  return LinesetModel
}
export type LinesetModel = InstanceType<ReturnType<typeof defineLinesetModel>>
