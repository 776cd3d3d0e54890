import { DataType } from 'sequelize-typescript';
import type { ModelAttributeColumnOptions, Model } from 'sequelize';

/**
 * A JSON column read back as a value. MariaDB stores JSON as LONGTEXT, so the mysql2 driver hands
 * it over as a string; this parses it on the way out.
 */
export function jsonColumn(attribute: string, allowNull = false): Partial<ModelAttributeColumnOptions<Model>> {
  return {
    type: DataType.JSON,
    allowNull,
    get(this: Model) {
      const raw: unknown = this.getDataValue(attribute as never);
      return typeof raw === 'string' ? (JSON.parse(raw) as unknown) : raw;
    },
  };
}
