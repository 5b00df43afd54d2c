import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize'
import type { ProductionState } from '../../../shared/schemas/production.js'
import { uuidKey, lockVersion, timestamps, requiredText, requiredUuid } from '../../db/columns.js'

/** A show; performance days are calendar days (`YYYY-MM-DD`), with no time or zone. */
export function defineProductionModel(sequelize: Sequelize) {
  class ProductionModel extends Model<InferAttributes<ProductionModel>, InferCreationAttributes<ProductionModel>> {
    declare id: CreationOptional<string>
    declare venueId: string
    declare name: string
    declare firstPerformance: string
    declare lastPerformance: string
    declare state: ProductionState
    declare version: CreationOptional<number>
    declare createdAt: CreationOptional<Date>
    declare updatedAt: CreationOptional<Date>
  }
  ProductionModel.init(
    {
      ...uuidKey(),
      venueId: requiredUuid(),
      name: requiredText(),
      firstPerformance: { type: DataTypes.DATEONLY, allowNull: false },
      lastPerformance: { type: DataTypes.DATEONLY, allowNull: false },
      state: requiredText(),
      ...lockVersion(),
      ...timestamps(),
    },
    { sequelize, tableName: 'productions' },
  )
  return ProductionModel
}
export type ProductionModel = InstanceType<ReturnType<typeof defineProductionModel>>
