import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** One price-book row; `priceMillicents` is 1/1000 of a cent (see shared price-book.ts). */
export class PriceBookItemModel extends Model<
  InferAttributes<PriceBookItemModel>,
  InferCreationAttributes<PriceBookItemModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare kind: string;
  declare key: string;
  declare name: string;
  declare unit: string;
  declare packSize: number | null;
  declare priceMillicents: number;
  declare attributes: unknown;
  declare isStarter: boolean;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    PriceBookItemModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        // `key` is a reserved word in MariaDB, hence the column name.
        key: { type: DataTypes.STRING(60), allowNull: false, field: 'item_key' },
        name: { type: DataTypes.STRING(120), allowNull: false },
        unit: { type: DataTypes.STRING(20), allowNull: false },
        packSize: { type: DataTypes.DOUBLE, allowNull: true },
        priceMillicents: { type: DataTypes.BIGINT, allowNull: false },
        attributes: { type: DataTypes.JSON, allowNull: false },
        isStarter: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'price_book_items', underscored: true },
    );
  }
}
