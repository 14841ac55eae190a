import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { RepairPhotoType } from '../../shared/schemas/repairs';

/** A photo of a ticket; its files are named by the row's id in the photo store. */
export class RepairPhoto extends Model<InferAttributes<RepairPhoto>, InferCreationAttributes<RepairPhoto>> {
  declare id: string;
  declare repairId: string;
  declare uploadedById: string;
  /** The type read from the file's content, never the one the upload declared. */
  declare contentType: RepairPhotoType;
  declare byteSize: number;
  declare width: number | null;
  declare height: number | null;
  declare hasThumb: boolean;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    RepairPhoto.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        repairId: { type: DataTypes.UUID, allowNull: false },
        uploadedById: { type: DataTypes.UUID, allowNull: false },
        contentType: { type: DataTypes.STRING(16), allowNull: false },
        byteSize: { type: DataTypes.INTEGER, allowNull: false },
        width: { type: DataTypes.INTEGER, allowNull: true },
        height: { type: DataTypes.INTEGER, allowNull: true },
        hasThumb: { type: DataTypes.BOOLEAN, allowNull: false },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'repair_photos', updatedAt: false },
    );
  }
}
