import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize'
import type { HangState } from '../../../shared/schemas/workflow-states.js'
import { uuidKey, lockVersion, timestamps, requiredText, requiredUuid, optionalUuid } from '../../db/columns.js'
import type { UnitSystem } from '../../../shared/units/systems.js'

/** What hangs on one lineset for a show, with the engine's input and answer as saved by the server. */
export function defineHangModel(sequelize: Sequelize) {
  class HangModel extends Model<InferAttributes<HangModel>, InferCreationAttributes<HangModel>> {
    declare id: CreationOptional<string>
    declare venueId: string
    declare linesetId: string
    declare title: string
    declare showName: CreationOptional<string>
    declare state: CreationOptional<HangState>
    declare createdBy: string | null
    /** The unit system the stored calculation was made in. */
    declare unitSystem: UnitSystem
    declare calculationInput: Record<string, unknown> | null
    declare calculationResult: Record<string, unknown> | null
    declare version: CreationOptional<number>
    declare createdAt: CreationOptional<Date>
    declare updatedAt: CreationOptional<Date>
  }
  HangModel.init(
    {
      ...uuidKey(),
      venueId: requiredUuid(),
      linesetId: requiredUuid(),
      title: requiredText(),
      showName: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      state: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'draft' },
      createdBy: optionalUuid(),
      unitSystem: requiredText(),
      calculationInput: { type: DataTypes.JSONB, allowNull: true },
      calculationResult: { type: DataTypes.JSONB, allowNull: true },
      ...lockVersion(),
      ...timestamps(),
    },
    { sequelize, tableName: 'hangs' },
  )
  return HangModel
}
