import {
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize'
import { uuidKey, lockVersion, timestamps, requiredText, requiredUuid } from '../../db/columns.js'
import type { Role } from '../../../shared/schemas/role.js'
import type { UserModel } from './user.model.js'

/** A person's role in one venue; the same account may hold roles in several venues. */
export function defineMembershipModel(sequelize: Sequelize) {
  class MembershipModel extends Model<InferAttributes<MembershipModel>, InferCreationAttributes<MembershipModel>> {
    declare id: CreationOptional<string>
    declare userId: string
    declare venueId: string
    declare role: Role
    declare version: CreationOptional<number>
    declare createdAt: CreationOptional<Date>
    declare updatedAt: CreationOptional<Date>
    declare user?: NonAttribute<UserModel>
  }
  MembershipModel.init(
    {
      ...uuidKey(),
      userId: requiredUuid(),
      venueId: requiredUuid(),
      role: requiredText(),
      ...lockVersion(),
      ...timestamps(),
    },
    { sequelize, tableName: 'memberships' },
  )
  return MembershipModel
}
export type MembershipModel = InstanceType<ReturnType<typeof defineMembershipModel>>
