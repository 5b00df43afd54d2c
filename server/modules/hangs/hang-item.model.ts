import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize'
import type { ItemCategory } from '../../../shared/hang/hang-items.js'
import { uuidKey, optionalDecimal, optionalUuid, requiredText, requiredUuid } from '../../db/columns.js'

/** Which of the entry shapes a row holds (the database checks that its fields fit the shape). */
export type HangEntryKind = 'point' | 'stretch' | 'fabric' | 'library' | 'shared'

/**
 * One entry of a hang as the fly operator typed it. Figures are SI decimal strings: weight kg, positions m,
 * weightPerLength kg/m, fabricWeightPerArea kg/m², fabricHeight m; fabricGrade stays oz per linear yard of
 * 54 in goods, how fabric is sold in either system.
 */
export function defineHangItemModel(sequelize: Sequelize) {
  class HangItemModel extends Model<InferAttributes<HangItemModel>, InferCreationAttributes<HangItemModel>> {
    declare id: CreationOptional<string>
    declare venueId: string
    declare hangId: string
    declare position: number
    declare entryKind: HangEntryKind
    declare label: string
    declare category: CreationOptional<ItemCategory>
    declare itemTypeId: CreationOptional<string | null>
    declare quantity: CreationOptional<number | null>
    declare weight: string | null
    declare at: string | null
    declare fromPosition: string | null
    declare toPosition: string | null
    declare weightPerLength: string | null
    declare points: CreationOptional<string[] | null>
    declare fabricGrade: CreationOptional<string | null>
    declare fabricWeightPerArea: CreationOptional<string | null>
    declare fabricHeight: CreationOptional<string | null>
    declare fabricFullnessPercent: CreationOptional<string | null>
  }
  HangItemModel.init(
    {
      ...uuidKey(),
      venueId: requiredUuid(),
      hangId: requiredUuid(),
      position: { type: DataTypes.INTEGER, allowNull: false },
      entryKind: requiredText(),
      label: requiredText(),
      category: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'other' },
      itemTypeId: optionalUuid(),
      quantity: { type: DataTypes.INTEGER, allowNull: true },
      weight: optionalDecimal(),
      at: optionalDecimal(),
      fromPosition: optionalDecimal(),
      toPosition: optionalDecimal(),
      weightPerLength: optionalDecimal(),
      points: { type: DataTypes.ARRAY(DataTypes.DECIMAL), allowNull: true },
      fabricGrade: optionalDecimal(),
      fabricWeightPerArea: optionalDecimal(),
      fabricHeight: optionalDecimal(),
      fabricFullnessPercent: optionalDecimal(),
    },
    { sequelize, tableName: 'hang_items', timestamps: false },
  )
  return HangItemModel
}
export type HangItemModel = InstanceType<ReturnType<typeof defineHangItemModel>>
