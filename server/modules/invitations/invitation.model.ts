import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize'
import type { InvitationState } from '../../../shared/schemas/invitation.js'
import type { Role } from '../../../shared/schemas/role.js'
import { uuidKey, lockVersion, timestamps, requiredText, requiredUuid, optionalUuid } from '../../db/columns.js'

/** An invitation to hold a role in a venue; the token's hash only, never the token. */
export function defineInvitationModel(sequelize: Sequelize) {
  class InvitationModel extends Model<InferAttributes<InvitationModel>, InferCreationAttributes<InvitationModel>> {
    declare id: CreationOptional<string>
    declare venueId: string
    declare email: string
    declare name: string
    declare role: Role
    declare tokenHash: string
    declare state: CreationOptional<InvitationState>
    declare invitedBy: string | null
    declare expiresAt: Date
    declare acceptedBy: CreationOptional<string | null>
    declare decidedAt: CreationOptional<Date | null>
    declare version: CreationOptional<number>
    declare createdAt: CreationOptional<Date>
    declare updatedAt: CreationOptional<Date>
  }
  InvitationModel.init(
    {
      ...uuidKey(),
      venueId: requiredUuid(),
      email: requiredText(),
      name: requiredText(),
      role: requiredText(),
      tokenHash: requiredText(),
      state: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'pending' },
      invitedBy: optionalUuid(),
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      acceptedBy: optionalUuid(),
      decidedAt: { type: DataTypes.DATE, allowNull: true },
      ...lockVersion(),
      ...timestamps(),
    },
    { sequelize, tableName: 'invitations' },
  )
  return InvitationModel
}
export type InvitationModel = InstanceType<ReturnType<typeof defineInvitationModel>>
