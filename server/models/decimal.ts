import { DataTypes, type Model } from 'sequelize';

/**
 * A DECIMAL column read as a JS number. The mariadb driver answers DECIMAL as a string (it keeps
 * every digit); our measurements have at most 7 significant digits, which a double holds exactly.
 */
export function decimal(name: string, precision: number, scale: number, allowNull = false) {
  return {
    type: DataTypes.DECIMAL(precision, scale),
    allowNull,
    get(this: Model) {
      const raw: unknown = this.getDataValue(name);
      return raw === null || raw === undefined ? raw : Number(raw);
    },
  };
}
