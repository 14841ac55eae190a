import { DataTypes, type Model } from 'sequelize';

/**
 * A TEXT column that holds JSON, read and written as the value. `empty` is what a partial
 * instance (a static update builds one from the fields it sets) reads before it has the column.
 */
export function jsonText<T>(name: string, empty: T, { allowNull = false, medium = false } = {}) {
  return {
    type: medium ? DataTypes.TEXT('medium') : DataTypes.TEXT,
    allowNull,
    get(this: Model) {
      const stored: unknown = this.getDataValue(name);
      if (stored === undefined) return empty;
      return stored === null ? null : (JSON.parse(stored as string) as T);
    },
    set(this: Model, value: T | null) {
      this.setDataValue(name, value === null ? null : JSON.stringify(value));
    },
  };
}
