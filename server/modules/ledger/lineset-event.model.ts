import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize'
import { requiredText, requiredUuid, optionalUuid } from '../../db/columns.js'
import type { UserModel } from '../people/user.model.js'

/** One entry in a lineset's append-only ledger (the database refuses updates and deletes). */
export function defineLinesetEventModel(sequelize: Sequelize) {
  class LinesetEventModel extends Model<
    InferAttributes<LinesetEventModel>,
    InferCreationAttributes<LinesetEventModel>
  > {
    declare id: CreationOptional<string>
    declare venueId: string
    declare linesetId: string
    declare occurredAt: CreationOptional<Date>
    declare actorId: string | null
    declare eventType: string
    declare payload: Record<string, unknown>
    declare actor?: NonAttribute<UserModel>
  }
  LinesetEventModel.init(
    {
      id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
      venueId: requiredUuid(),
      linesetId: requiredUuid(),
      occurredAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      actorId: optionalUuid(),
      eventType: requiredText(),
      payload: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    },
    { sequelize, tableName: 'lineset_events', timestamps: false },
  )
  return LinesetEventModel
}
