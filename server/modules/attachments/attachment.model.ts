import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** An uploaded file (photo, drawing, inspection report); the bytes live in storage under `storageKey`. */
export function defineAttachmentModel(sequelize: Sequelize) {
  class AttachmentModel extends Model<InferAttributes<AttachmentModel>, InferCreationAttributes<AttachmentModel>> {
    declare id: CreationOptional<string>
    declare venueId: string
    declare linesetId: string | null
    declare fileName: string
    declare contentType: string
    declare byteSize: string
    declare sha256: string
    declare storageKey: string
    declare uploadedBy: string | null
    declare createdAt: CreationOptional<Date>
  }
  AttachmentModel.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      venueId: { type: DataTypes.UUID, allowNull: false },
      linesetId: { type: DataTypes.UUID, allowNull: true },
      fileName: { type: DataTypes.TEXT, allowNull: false },
      contentType: { type: DataTypes.TEXT, allowNull: false },
      byteSize: { type: DataTypes.BIGINT, allowNull: false },
      sha256: { type: DataTypes.TEXT, allowNull: false },
      storageKey: { type: DataTypes.TEXT, allowNull: false },
      uploadedBy: { type: DataTypes.UUID, allowNull: true },
      createdAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'attachments', updatedAt: false },
  )
  return AttachmentModel
}
