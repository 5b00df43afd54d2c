import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** unitWeight in kg, thickness in m (SI decimal strings). */
export function defineBrickTypeModel(sequelize: Sequelize) {
  class BrickTypeModel extends Model<InferAttributes<BrickTypeModel>, InferCreationAttributes<BrickTypeModel>> {
    declare id: CreationOptional<string>
    declare venueId: string
    declare name: string
    declare material: string
    declare unitWeight: string
    declare thickness: string
    declare quantityOwned: number
    declare version: CreationOptional<number>
    declare createdAt: CreationOptional<Date>
    declare updatedAt: CreationOptional<Date>
  }
  BrickTypeModel.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      venueId: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.TEXT, allowNull: false },
      material: { type: DataTypes.TEXT, allowNull: false },
      unitWeight: { type: DataTypes.DECIMAL, allowNull: false },
      thickness: { type: DataTypes.DECIMAL, allowNull: false },
      quantityOwned: { type: DataTypes.INTEGER, allowNull: false },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'brick_types' },
  )
  return BrickTypeModel
}
export type BrickTypeModel = InstanceType<ReturnType<typeof defineBrickTypeModel>>
