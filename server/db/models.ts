import type { Sequelize } from 'sequelize'
import { defineAttachmentModel } from '../modules/attachments/attachment.model.js'
import { defineHangItemModel } from '../modules/hangs/hang-item.model.js'
import { defineHangModel } from '../modules/hangs/hang.model.js'
import { defineItemTypeModel } from '../modules/item-types/item-type.model.js'
import { defineInvitationModel } from '../modules/invitations/invitation.model.js'
import { defineProductionModel } from '../modules/productions/production.model.js'
import { defineWeightChangeTicketModel } from '../modules/tickets/weight-change-ticket.model.js'
import { defineBrickTypeModel } from '../modules/brick-types/brick-type.model.js'
import { defineLinesetEventModel } from '../modules/ledger/lineset-event.model.js'
import { defineLinesetModel } from '../modules/linesets/lineset.model.js'
import { defineOutboxModel } from '../modules/outbox/outbox.model.js'
import { defineMembershipModel } from '../modules/people/membership.model.js'
import { defineUserModel } from '../modules/people/user.model.js'
import { defineVenueModel } from '../modules/venues/venue.model.js'

/** Defines every model on one Sequelize instance (no globals, so tests can run several apps in one process). */
export function defineModels(sequelize: Sequelize) {
  const models = {
    Venue: defineVenueModel(sequelize),
    User: defineUserModel(sequelize),
    Membership: defineMembershipModel(sequelize),
    Lineset: defineLinesetModel(sequelize),
    BrickType: defineBrickTypeModel(sequelize),
    LinesetEvent: defineLinesetEventModel(sequelize),
    Hang: defineHangModel(sequelize),
    HangItem: defineHangItemModel(sequelize),
    WeightChangeTicket: defineWeightChangeTicketModel(sequelize),
    Attachment: defineAttachmentModel(sequelize),
    Invitation: defineInvitationModel(sequelize),
    ItemType: defineItemTypeModel(sequelize),
    Production: defineProductionModel(sequelize),
    Outbox: defineOutboxModel(sequelize),
  }
  models.Membership.belongsTo(models.User, { foreignKey: 'userId', as: 'user' })
  models.User.hasMany(models.Membership, { foreignKey: 'userId', as: 'memberships' })
  models.LinesetEvent.belongsTo(models.User, { foreignKey: 'actorId', as: 'actor' })
  models.Hang.hasMany(models.HangItem, { foreignKey: 'hangId', as: 'items' })
  models.Hang.belongsTo(models.User, { foreignKey: 'createdBy', as: 'creator' })
  models.Lineset.hasMany(models.Hang, { foreignKey: 'linesetId', as: 'hangs' })
  return models
}

export type Models = ReturnType<typeof defineModels>

/** The ORM and its models; services reach it through their context (see server/context.ts). */
export interface Database {
  sequelize: Sequelize
  models: Models
}
