import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/**
 * One Idempotency-Key of one user: while `responseStatus` is null the first request is still
 * running; afterwards the stored 2xx answer is replayed to retries until `expiresAt`.
 */
export class IdempotencyKey extends Model<InferAttributes<IdempotencyKey>, InferCreationAttributes<IdempotencyKey>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare idemKey: string;
  declare method: string;
  declare path: string;
  declare bodyHash: string;
  declare responseStatus: CreationOptional<number | null>;
  declare responseBody: CreationOptional<string | null>;
  /** `table:id` of the first row the request created, set in its own transaction (null until it commits one). */
  declare appliedResource: CreationOptional<string | null>;
  declare expiresAt: Date;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    IdempotencyKey.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        idemKey: { type: DataTypes.STRING(255).BINARY, allowNull: false },
        method: { type: DataTypes.STRING(8), allowNull: false },
        path: { type: DataTypes.STRING(500), allowNull: false },
        bodyHash: { type: DataTypes.CHAR(64), allowNull: false },
        responseStatus: DataTypes.SMALLINT.UNSIGNED,
        responseBody: DataTypes.TEXT('long'),
        appliedResource: DataTypes.STRING(80),
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'idempotency_keys', modelName: 'IdempotencyKey', underscored: true },
    );
  }
}
