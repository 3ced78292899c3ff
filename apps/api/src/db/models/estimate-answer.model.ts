import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/**
 * The customer's answer to an estimate (migration 0011): an acceptance, online or signed in
 * person, or a decline. `cancellationEndsAt` is when the buyer's right to cancel ends (null when
 * the sale is not covered), computed once when it is recorded.
 */
export class EstimateAnswerModel extends Model<
  InferAttributes<EstimateAnswerModel>,
  InferCreationAttributes<EstimateAnswerModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare estimateId: string;
  declare kind: 'accepted' | 'declined';
  declare name: string | null;
  declare tierId: string | null;
  declare place: 'online' | 'home' | 'office';
  declare signedAt: Date;
  declare ip: string | null;
  declare userAgent: string | null;
  declare reason: string | null;
  declare cancellationEndsAt: Date | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    EstimateAnswerModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        estimateId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(10), allowNull: false },
        name: { type: DataTypes.STRING(200), allowNull: true },
        tierId: { type: DataTypes.STRING(36), allowNull: true },
        place: { type: DataTypes.STRING(10), allowNull: false },
        signedAt: { type: DataTypes.DATE(3), allowNull: false },
        ip: { type: DataTypes.STRING(64), allowNull: true },
        userAgent: { type: DataTypes.STRING(500), allowNull: true },
        reason: { type: DataTypes.TEXT, allowNull: true },
        cancellationEndsAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'estimate_answers', underscored: true, updatedAt: false },
    );
  }
}
