import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize'
import type { ItemCategory } from '../../../shared/hang/hang-items.js'
import { uuidKey, lockVersion, timestamps, requiredDecimal, requiredText, requiredUuid } from '../../db/columns.js'

/** One entry of the venue's item library; unitWeight and allowancePerUnit in kg (SI decimal strings). */
export function defineItemTypeModel(sequelize: Sequelize) {
  class ItemTypeModel extends Model<InferAttributes<ItemTypeModel>, InferCreationAttributes<ItemTypeModel>> {
    declare id: CreationOptional<string>
    declare venueId: string
    declare name: string
    declare category: ItemCategory
    declare unitWeight: string
    declare allowancePerUnit: string
    declare notes: string
    /** Set once the type leaves the library; saved hangs that name it keep it. */
    declare retiredAt: Date | null
    declare version: CreationOptional<number>
    declare createdAt: CreationOptional<Date>
    declare updatedAt: CreationOptional<Date>
  }
  ItemTypeModel.init(
    {
      ...uuidKey(),
      venueId: requiredUuid(),
      name: requiredText(),
      category: requiredText(),
      unitWeight: requiredDecimal(),
      allowancePerUnit: requiredDecimal(),
      notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      retiredAt: { type: DataTypes.DATE, allowNull: true },
      ...lockVersion(),
      ...timestamps(),
    },
    { sequelize, tableName: 'item_types' },
  )
  return ItemTypeModel
}
export type ItemTypeModel = InstanceType<ReturnType<typeof defineItemTypeModel>>
