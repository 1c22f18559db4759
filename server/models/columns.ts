// Column definitions shared by the models. MariaDB stores JSON as LONGTEXT and DECIMAL and
// BIGINT come back as strings from the driver, so these columns parse on read.
import { DataTypes, type Model } from 'sequelize';

export function parseJson<T>(value: T | string): T {
  return typeof value === 'string' ? (JSON.parse(value) as T) : value;
}

export function jsonColumn(name: string, allowNull = false) {
  return {
    type: DataTypes.JSON,
    allowNull,
    get(this: Model) {
      const value = this.getDataValue(name as never) as unknown;
      return value === null || value === undefined ? null : parseJson(value);
    },
  };
}

export function numericColumn(
  type: typeof DataTypes.DECIMAL | ReturnType<typeof DataTypes.DECIMAL> | typeof DataTypes.BIGINT.UNSIGNED,
  name: string,
  options: { allowNull?: boolean; defaultValue?: number } = {},
) {
  return {
    type,
    allowNull: options.allowNull ?? false,
    ...(options.defaultValue !== undefined && { defaultValue: options.defaultValue }),
    get(this: Model) {
      const value = this.getDataValue(name as never) as unknown;
      return value === null || value === undefined ? null : Number(value);
    },
  };
}
