import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { TOKEN_SCOPES, type TokenScope } from '@shared/schemas/api-token.ts';

/** A personal API token; `tokenHash` is the SHA-256 of the secret, which itself is never stored. */
export class ApiToken extends Model<InferAttributes<ApiToken>, InferCreationAttributes<ApiToken>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare name: string;
  declare scopes: TokenScope[];
  declare tokenHash: string;
  declare lastUsedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ApiToken.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        // Stored as "read,runs:write"; read back as the known scopes only.
        scopes: {
          type: DataTypes.STRING(100),
          allowNull: false,
          get(this: ApiToken) {
            const raw = (this.getDataValue('scopes') as unknown as string) ?? '';
            return TOKEN_SCOPES.filter((s) => raw.split(',').includes(s));
          },
          set(this: ApiToken, value: TokenScope[]) {
            this.setDataValue('scopes', value.join(',') as unknown as TokenScope[]);
          },
        },
        tokenHash: { type: DataTypes.CHAR(64).BINARY, allowNull: false, unique: true },
        lastUsedAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'api_tokens', modelName: 'ApiToken', underscored: true },
    );
  }
}
