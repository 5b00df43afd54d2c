import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize'
import { uuidKey, lockVersion, timestamps, requiredDecimal, requiredText, requiredUuid } from '../../db/columns.js'

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
    /** Where the owned bricks are; the database holds quantityOwned = onArbors + reserved + inStorage. */
    declare onArbors: CreationOptional<number>
    declare reserved: CreationOptional<number>
    declare inStorage: number
    /** Set once the type is taken out of the lists; a type something refers to is retired, never deleted. */
    declare retiredAt: Date | null
    declare version: CreationOptional<number>
    declare createdAt: CreationOptional<Date>
    declare updatedAt: CreationOptional<Date>
  }
  BrickTypeModel.init(
    {
      ...uuidKey(),
      venueId: requiredUuid(),
      name: requiredText(),
      material: requiredText(),
      unitWeight: requiredDecimal(),
      thickness: requiredDecimal(),
      quantityOwned: { type: DataTypes.INTEGER, allowNull: false },
      onArbors: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      reserved: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      inStorage: { type: DataTypes.INTEGER, allowNull: false },
      retiredAt: { type: DataTypes.DATE, allowNull: true },
      ...lockVersion(),
      ...timestamps(),
    },
    { sequelize, tableName: 'brick_types' },
  )
  return BrickTypeModel
}
export type BrickTypeModel = InstanceType<ReturnType<typeof defineBrickTypeModel>>
