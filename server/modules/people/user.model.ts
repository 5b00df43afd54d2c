import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

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
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      email: { type: DataTypes.TEXT, allowNull: false, unique: true },
      name: { type: DataTypes.TEXT, allowNull: false },
      passwordHash: { type: DataTypes.TEXT, allowNull: false },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    },
    { sequelize, tableName: 'users' },
  )
  return UserModel
}
export type UserModel = InstanceType<ReturnType<typeof defineUserModel>>
