import { DataTypes } from 'sequelize';

/** Every table: InnoDB, utf8mb4 with the Unicode collation. */
export const tableOptions = { engine: 'InnoDB', charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' } as const;

export const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true, allowNull: false };

export const timestamps = {
  created_at: { type: DataTypes.DATE(3), allowNull: false },
  updated_at: { type: DataTypes.DATE(3), allowNull: false },
};

export const userReference = (allowNull: boolean, onDelete: 'CASCADE' | 'SET NULL') => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull,
  references: { model: 'users', key: 'id' },
  onDelete,
});
