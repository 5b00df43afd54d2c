import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize'
import type { TicketState } from '../../../shared/schemas/workflow-states.js'
import { uuidKey, lockVersion, timestamps, optionalDecimal, requiredUuid, optionalUuid } from '../../db/columns.js'

/** A request to move weight on one lineset, decided by a technical director. Weights in kg (SI strings). */
export function defineWeightChangeTicketModel(sequelize: Sequelize) {
  class WeightChangeTicketModel extends Model<
    InferAttributes<WeightChangeTicketModel>,
    InferCreationAttributes<WeightChangeTicketModel>
  > {
    declare id: CreationOptional<string>
    declare venueId: string
    declare linesetId: string
    declare hangId: string | null
    declare state: CreationOptional<TicketState>
    declare requestedBy: string | null
    declare decidedBy: string | null
    declare decidedAt: Date | null
    declare requiredWeight: string | null
    declare loadedWeight: string | null
    declare note: CreationOptional<string>
    declare version: CreationOptional<number>
    declare createdAt: CreationOptional<Date>
    declare updatedAt: CreationOptional<Date>
  }
  WeightChangeTicketModel.init(
    {
      ...uuidKey(),
      venueId: requiredUuid(),
      linesetId: requiredUuid(),
      hangId: optionalUuid(),
      state: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'requested' },
      requestedBy: optionalUuid(),
      decidedBy: optionalUuid(),
      decidedAt: { type: DataTypes.DATE, allowNull: true },
      requiredWeight: optionalDecimal(),
      loadedWeight: optionalDecimal(),
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      ...lockVersion(),
      ...timestamps(),
    },
    { sequelize, tableName: 'weight_change_tickets' },
  )
  return WeightChangeTicketModel
}
