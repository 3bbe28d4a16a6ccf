// Limits a user to some sites (only read when the user's allSites is false).
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class UserSite extends Model<InferAttributes<UserSite>, InferCreationAttributes<UserSite>> {
  declare userId: number;
  declare siteId: number;

  static initModel(sequelize: Sequelize): void {
    UserSite.init(
      {
        userId: { type: DataTypes.INTEGER, primaryKey: true },
        siteId: { type: DataTypes.INTEGER, primaryKey: true },
      },
      { sequelize, tableName: 'user_sites', underscored: true, timestamps: false },
    );
  }
}
