import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One limiter's count for one client in the current window (RATE_LIMIT_STORE=mariadb; see middleware/rate-limit-store.ts). */
export class RateLimitCounter extends Model<InferAttributes<RateLimitCounter>, InferCreationAttributes<RateLimitCounter>> {
  declare counterKey: string;
  declare hits: number;
  declare resetAt: Date;

  static initModel(sequelize: Sequelize) {
    RateLimitCounter.init(
      {
        counterKey: { type: DataTypes.CHAR(64), primaryKey: true },
        hits: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        resetAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'rate_limit_counters', modelName: 'RateLimitCounter', underscored: true, timestamps: false },
    );
  }
}
