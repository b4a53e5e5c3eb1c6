import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class MessageThread extends Model<InferAttributes<MessageThread>, InferCreationAttributes<MessageThread>> {
  declare id: CreationOptional<number>;
  declare listingId: number;
  declare starterId: number;
  declare ownerId: number;
  declare lastMessageAt: Date;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    MessageThread.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        listingId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        starterId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        lastMessageAt: { type: DataTypes.DATE, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'message_threads', modelName: 'MessageThread', underscored: true },
    );
  }
}

export class Message extends Model<InferAttributes<Message>, InferCreationAttributes<Message>> {
  declare id: CreationOptional<number>;
  declare threadId: number;
  declare senderId: number;
  declare body: string;
  declare readAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Message.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        threadId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        senderId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        body: { type: DataTypes.TEXT, allowNull: false },
        readAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'messages', modelName: 'Message', underscored: true, updatedAt: false },
    );
  }
}
