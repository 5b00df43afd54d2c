import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

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
  const quantity = () => ({ type: DataTypes.DECIMAL, allowNull: true })
  HangItemModel.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      hangId: { type: DataTypes.UUID, allowNull: false },
      position: { type: DataTypes.INTEGER, allowNull: false },
      label: { type: DataTypes.TEXT, allowNull: false },
      weight: quantity(),
      at: quantity(),
      fromPosition: quantity(),
      toPosition: quantity(),
      weightPerLength: quantity(),
    },
    { sequelize, tableName: 'hang_items', timestamps: false },
  )
  return HangItemModel
}
