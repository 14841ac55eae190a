import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { RepairPhotoType } from '../../shared/schemas/repairs';

/** A photo of an incident; its files are named by the row's id in the photo store. */
export class IncidentPhoto extends Model<InferAttributes<IncidentPhoto>, InferCreationAttributes<IncidentPhoto>> {
  declare id: string;
  declare incidentId: string;
  declare uploadedById: string;
  /** The type read from the file's content, never the one the upload declared. */
  declare contentType: RepairPhotoType; // the same types as a ticket's photos
  declare byteSize: number;
  declare width: number | null;
  declare height: number | null;
  declare hasThumb: boolean;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    IncidentPhoto.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        incidentId: { type: DataTypes.UUID, allowNull: false },
        uploadedById: { type: DataTypes.UUID, allowNull: false },
        contentType: { type: DataTypes.STRING(16), allowNull: false },
        byteSize: { type: DataTypes.INTEGER, allowNull: false },
        width: { type: DataTypes.INTEGER, allowNull: true },
        height: { type: DataTypes.INTEGER, allowNull: true },
        hasThumb: { type: DataTypes.BOOLEAN, allowNull: false },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'incident_photos', updatedAt: false },
    );
  }
}
