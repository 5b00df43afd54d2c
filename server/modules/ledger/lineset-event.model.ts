import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** One entry in a lineset's append-only ledger (the database refuses updates and deletes). */
export function defineLinesetEventModel(sequelize: Sequelize) {
  class LinesetEventModel extends Model<InferAttributes<LinesetEventModel>, InferCreationAttributes<LinesetEventModel>> {
    declare id: CreationOptional<string>
    declare venueId: string
    declare linesetId: string
    declare occurredAt: CreationOptional<Date>
    declare actorId: string | null
    declare eventType: string
    declare payload: Record<string, unknown>
  }
  LinesetEventModel.init(
    {
      id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
      venueId: { type: DataTypes.UUID, allowNull: false },
      linesetId: { type: DataTypes.UUID, allowNull: false },
      occurredAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      actorId: { type: DataTypes.UUID, allowNull: true },
      eventType: { type: DataTypes.TEXT, allowNull: false },
      payload: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    },
    { sequelize, tableName: 'lineset_events', timestamps: false },
  )
  return LinesetEventModel
}
