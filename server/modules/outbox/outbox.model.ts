import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize'
import type { OutboxState } from '../../../shared/schemas/outbox.js'
import { optionalUuid, requiredText, requiredUuid, uuidKey } from '../../db/columns.js'

/** One outgoing e-mail, kept from the change that caused it until the mail server has taken it (and after). */
export function defineOutboxModel(sequelize: Sequelize) {
  class OutboxModel extends Model<InferAttributes<OutboxModel>, InferCreationAttributes<OutboxModel>> {
    declare id: CreationOptional<string>
    declare venueId: string
    declare recipients: string[]
    declare subject: string
    declare bodyText: string
    declare state: CreationOptional<OutboxState>
    declare attempts: CreationOptional<number>
    declare nextAttemptAt: Date
    declare lastError: CreationOptional<string | null>
    declare causeKind: string | null
    declare causeId: string | null
    declare queuedBy: string | null
    declare sentAt: CreationOptional<Date | null>
    declare createdAt: Date
    declare updatedAt: Date
  }
  OutboxModel.init(
    {
      ...uuidKey(),
      venueId: requiredUuid(),
      recipients: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false },
      subject: requiredText(),
      bodyText: requiredText(),
      state: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'waiting' },
      attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      nextAttemptAt: { type: DataTypes.DATE, allowNull: false },
      lastError: { type: DataTypes.TEXT, allowNull: true },
      causeKind: { type: DataTypes.TEXT, allowNull: true },
      causeId: optionalUuid(),
      queuedBy: optionalUuid(),
      sentAt: { type: DataTypes.DATE, allowNull: true },
      // Set from the app's clock, not Sequelize's, so tests that move time see messages where they expect.
      createdAt: { type: DataTypes.DATE, allowNull: false },
      updatedAt: { type: DataTypes.DATE, allowNull: false },
    },
    { sequelize, tableName: 'mail_outbox', timestamps: false },
  )
  return OutboxModel
}
export type OutboxModel = InstanceType<ReturnType<typeof defineOutboxModel>>
