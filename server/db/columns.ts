import { DataTypes } from 'sequelize'

/** The columns most venue records share: a UUID key, an optimistic-lock version and timestamps. */
export const uuidKey = () => ({ id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 } })
export const lockVersion = () => ({ version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 } })
export const timestamps = () => ({ createdAt: DataTypes.DATE, updatedAt: DataTypes.DATE })

/** A fresh definition per attribute: Sequelize writes each attribute's column name into its definition. */
export const optionalDecimal = () => ({ type: DataTypes.DECIMAL, allowNull: true })
export const requiredDecimal = () => ({ type: DataTypes.DECIMAL, allowNull: false })
export const requiredText = () => ({ type: DataTypes.TEXT, allowNull: false })
export const requiredUuid = () => ({ type: DataTypes.UUID, allowNull: false })
export const optionalUuid = () => ({ type: DataTypes.UUID, allowNull: true })
