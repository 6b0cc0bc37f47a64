import { DataTypes, type Model, type ModelAttributeColumnOptions } from 'sequelize';

/**
 * A JSON value kept in a MEDIUMTEXT column. MariaDB's JSON type is LONGTEXT with a check, and
 * the mariadb connector hands it back as a string on some paths: parsing here keeps every read
 * the same.
 */
export function jsonText<M extends Model>(field: string, allowNull = false): ModelAttributeColumnOptions<M> {
  return {
    type: DataTypes.TEXT('medium'),
    allowNull,
    get(this: M) {
      const raw = this.getDataValue(field as never) as unknown;
      if (raw === null || raw === undefined) return raw;
      return typeof raw === 'string' ? (JSON.parse(raw) as unknown) : raw;
    },
    set(this: M, value: unknown) {
      this.setDataValue(field as never, (value === null || value === undefined ? value : JSON.stringify(value)) as never);
    },
  };
}

/** A DECIMAL column read back as a number (mariadb returns DECIMAL as a string). */
export function decimalNumber<M extends Model>(field: string, precision: number, scale: number, allowNull = false): ModelAttributeColumnOptions<M> {
  return {
    type: DataTypes.DECIMAL(precision, scale),
    allowNull,
    get(this: M) {
      const raw = this.getDataValue(field as never) as unknown;
      return raw === null || raw === undefined ? raw : Number(raw);
    },
  };
}
