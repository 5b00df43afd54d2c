import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
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
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      name: { type: DataTypes.TEXT, allowNull: false },
      unitSystem: { type: DataTypes.TEXT, allowNull: false },
      balanceTolerance: { type: DataTypes.DECIMAL, allowNull: false },
      ropeLockHolding: { type: DataTypes.DECIMAL, allowNull: false },
      wireRopeDesignFactor: { type: DataTypes.DECIMAL, allowNull: false },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'venues' },
  )
  return VenueModel
}
export type VenueModel = InstanceType<ReturnType<typeof defineVenueModel>>
