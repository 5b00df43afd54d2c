import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize'
import { uuidKey, requiredText, requiredUuid, optionalUuid } from '../../db/columns.js'

/**
 * An uploaded file (scale ticket, photo, drawing) on a lineset, optionally on one item of a hang revision;
 * the bytes live in storage under `storageKey`, an image's thumbnail under `thumbnailKey` (migration 0009).
 */
export function defineAttachmentModel(sequelize: Sequelize) {
  class AttachmentModel extends Model<InferAttributes<AttachmentModel>, InferCreationAttributes<AttachmentModel>> {
    declare id: CreationOptional<string>
    declare venueId: string
    declare linesetId: string | null
    declare hangItemId: string | null
    declare fileName: string
    declare contentType: string
    declare byteSize: string
    declare sha256: string
    declare storageKey: string
    declare thumbnailKey: string | null
    declare uploadedBy: string | null
    declare createdAt: CreationOptional<Date>
  }
  AttachmentModel.init(
    {
      ...uuidKey(),
      venueId: requiredUuid(),
      linesetId: optionalUuid(),
      hangItemId: optionalUuid(),
      fileName: requiredText(),
      contentType: requiredText(),
      byteSize: { type: DataTypes.BIGINT, allowNull: false },
      sha256: requiredText(),
      storageKey: requiredText(),
      thumbnailKey: { type: DataTypes.TEXT, allowNull: true },
      uploadedBy: optionalUuid(),
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'attachments', updatedAt: false },
  )
  return AttachmentModel
}
