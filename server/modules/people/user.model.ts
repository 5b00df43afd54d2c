import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize'
import { uuidKey, timestamps, requiredText } from '../../db/columns.js'

export function defineUserModel(sequelize: Sequelize) {
  class UserModel extends Model<InferAttributes<UserModel>, InferCreationAttributes<UserModel>> {
    declare id: CreationOptional<string>
    declare email: string
    declare name: string
    declare passwordHash: string
    declare createdAt: CreationOptional<Date>
    declare updatedAt: CreationOptional<Date>
  }
  UserModel.init(
    {
      ...uuidKey(),
      email: { type: DataTypes.TEXT, allowNull: false, unique: true },
      name: requiredText(),
      passwordHash: requiredText(),
      ...timestamps(),
    },
    { sequelize, tableName: 'users' },
  )
  return UserModel
}
export type UserModel = InstanceType<ReturnType<typeof defineUserModel>>
