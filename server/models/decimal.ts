import { DataTypes, type Model } from 'sequelize';

/**
 * A DECIMAL column read as a JS number. The mariadb driver answers DECIMAL as a string (it keeps
 * every digit); our measurements have at most 7 significant digits, which a double holds exactly.
 * Written values are rounded to the column's scale (halves away from zero, as MariaDB does), so
 * that the record a create answers with is the one a later read finds.
 */
export function decimal(name: string, precision: number, scale: number, allowNull = false) {
  const factor = 10 ** scale;
  return {
    type: DataTypes.DECIMAL(precision, scale),
    allowNull,
    get(this: Model) {
      const raw: unknown = this.getDataValue(name);
      return raw === null || raw === undefined ? raw : Number(raw);
    },
    set(this: Model, value: unknown) {
      const rounded = typeof value === 'number' ? (Math.sign(value) * Math.round(Math.abs(value) * factor)) / factor : value;
      this.setDataValue(name, rounded);
    },
  };
}
