import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

export const TICKET_STATES = ['requested', 'approved', 'declined', 'loaded', 'withdrawn'] as const
export type TicketState = (typeof TICKET_STATES)[number]

/** A request to move weight on one lineset, decided by a technical director. Weights in kg (SI strings). */
export function defineWeightChangeTicketModel(sequelize: Sequelize) {
  class WeightChangeTicketModel extends Model<InferAttributes<WeightChangeTicketModel>, InferCreationAttributes<WeightChangeTicketModel>> {
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
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      venueId: { type: DataTypes.UUID, allowNull: false },
      linesetId: { type: DataTypes.UUID, allowNull: false },
      hangId: { type: DataTypes.UUID, allowNull: true },
      state: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'requested' },
      requestedBy: { type: DataTypes.UUID, allowNull: true },
      decidedBy: { type: DataTypes.UUID, allowNull: true },
      decidedAt: { type: DataTypes.DATE, allowNull: true },
      requiredWeight: { type: DataTypes.DECIMAL, allowNull: true },
      loadedWeight: { type: DataTypes.DECIMAL, allowNull: true },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'weight_change_tickets' },
  )
  return WeightChangeTicketModel
}
