import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize'
import { uuidKey, optionalDecimal, requiredText, requiredUuid } from '../../db/columns.js'

/** One thing on a hang: a point load (`weight` at `at`) or a spread load (`weightPerLength` from..to). SI strings. */
export function defineHangItemModel(sequelize: Sequelize) {
  class HangItemModel extends Model<InferAttributes<HangItemModel>, InferCreationAttributes<HangItemModel>> {
    declare id: CreationOptional<string>
    declare hangId: string
    declare position: number
    declare label: string
    declare weight: string | null
    declare at: string | null
    declare fromPosition: string | null
    declare toPosition: string | null
    declare weightPerLength: string | null
  }
  HangItemModel.init(
    {
      ...uuidKey(),
      hangId: requiredUuid(),
      position: { type: DataTypes.INTEGER, allowNull: false },
      label: requiredText(),
      weight: optionalDecimal(),
      at: optionalDecimal(),
      fromPosition: optionalDecimal(),
      toPosition: optionalDecimal(),
      weightPerLength: optionalDecimal(),
    },
    { sequelize, tableName: 'hang_items', timestamps: false },
  )
  return HangItemModel
}
