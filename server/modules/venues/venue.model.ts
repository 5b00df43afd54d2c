import {
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize'
import { uuidKey, lockVersion, timestamps, requiredDecimal, requiredText } from '../../db/columns.js'
import type { UnitSystem } from '../../../shared/units/systems.js'

export function defineVenueModel(sequelize: Sequelize) {
  class VenueModel extends Model<InferAttributes<VenueModel>, InferCreationAttributes<VenueModel>> {
    declare id: CreationOptional<string>
    declare name: string
    declare unitSystem: UnitSystem
    /** kg, SI like every stored quantity. */
    declare balanceTolerance: string
    declare ropeLockHolding: string
    declare wireRopeDesignFactor: string
    declare version: CreationOptional<number>
    declare createdAt: CreationOptional<Date>
    declare updatedAt: CreationOptional<Date>
  }
  VenueModel.init(
    {
      ...uuidKey(),
      name: requiredText(),
      unitSystem: requiredText(),
      balanceTolerance: requiredDecimal(),
      ropeLockHolding: requiredDecimal(),
      wireRopeDesignFactor: requiredDecimal(),
      ...lockVersion(),
      ...timestamps(),
    },
    { sequelize, tableName: 'venues' },
  )
  return VenueModel
}
export type VenueModel = InstanceType<ReturnType<typeof defineVenueModel>>
