// An in-app notification for one user (a hold opened or decided); its e-mail copy goes out after the commit.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Notification extends Model<InferAttributes<Notification>, InferCreationAttributes<Notification>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare kind: 'hold_opened' | 'hold_decided';
  declare eventKey: string;
  declare title: string;
  declare body: string;
  declare link: string;
  declare mailState: CreationOptional<'pending' | 'sending' | 'sent' | 'failed' | 'none'>;
  declare createdAt: CreationOptional<Date>;
  declare readAt: Date | null;

  static initModel(sequelize: Sequelize): void {
    Notification.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.TEXT, allowNull: false },
        eventKey: { type: DataTypes.TEXT, allowNull: false },
        title: { type: DataTypes.TEXT, allowNull: false },
        body: { type: DataTypes.TEXT, allowNull: false },
        link: { type: DataTypes.TEXT, allowNull: false },
        mailState: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'pending' },
        createdAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        readAt: { type: DataTypes.DATE, allowNull: true },
      },
      { sequelize, tableName: 'notifications', underscored: true, timestamps: false },
    );
  }
}
