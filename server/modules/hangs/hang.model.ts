import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize'
import type { HangState } from '../../../shared/schemas/workflow-states.js'
import {
  uuidKey,
  lockVersion,
  timestamps,
  optionalDecimal,
  requiredText,
  requiredUuid,
  optionalUuid,
} from '../../db/columns.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import type { UserModel } from '../people/user.model.js'

/** What hangs on one lineset for a show, with the engine's input and answer as saved by the server. */
export function defineHangModel(sequelize: Sequelize) {
  class HangModel extends Model<InferAttributes<HangModel>, InferCreationAttributes<HangModel>> {
    declare id: CreationOptional<string>
    declare venueId: string
    declare linesetId: string
    /** Counts from 1 per lineset. */
    declare revision: number
    /** The revision the fly operator's form started from; null for a lineset's first. */
    declare basedOnRevision: number | null
    declare productionId: string | null
    declare title: string
    declare showName: CreationOptional<string>
    declare state: CreationOptional<HangState>
    declare createdBy: string | null
    /** The unit system the stored calculation was made in. */
    declare unitSystem: UnitSystem
    declare calculationInput: Record<string, unknown> | null
    declare calculationResult: Record<string, unknown> | null
    /** Everything the lift lines carry, kg (SI decimal string); null only for rows older than revisions. */
    declare totalLoad: string | null
    declare version: CreationOptional<number>
    declare createdAt: CreationOptional<Date>
    declare updatedAt: CreationOptional<Date>
    declare creator?: NonAttribute<UserModel>
  }
  HangModel.init(
    {
      ...uuidKey(),
      venueId: requiredUuid(),
      linesetId: requiredUuid(),
      revision: { type: DataTypes.INTEGER, allowNull: false },
      basedOnRevision: { type: DataTypes.INTEGER, allowNull: true },
      productionId: optionalUuid(),
      title: requiredText(),
      showName: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      state: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'draft' },
      createdBy: optionalUuid(),
      unitSystem: requiredText(),
      calculationInput: { type: DataTypes.JSONB, allowNull: true },
      calculationResult: { type: DataTypes.JSONB, allowNull: true },
      totalLoad: optionalDecimal(),
      ...lockVersion(),
      ...timestamps(),
    },
    { sequelize, tableName: 'hangs' },
  )
  return HangModel
}
export type HangModel = InstanceType<ReturnType<typeof defineHangModel>>
