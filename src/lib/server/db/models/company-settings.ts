import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { PricingRule } from '../../../quotes/pricing';

/** The hire company's own terms; one row (id 1), edited by admins. */
export class CompanySettings extends Model<
	InferAttributes<CompanySettings>,
	InferCreationAttributes<CompanySettings>
> {
	declare id: number;
	declare companyName: string;
	declare currency: string;
	declare taxRateBp: number;
	declare depositBp: number;
	declare pricingRule: PricingRule;
	declare defaultMarginDb: number;
	declare distanceUnit: 'm' | 'ft';
	declare paymentTermsDays: number;
	/** Cancelled at least this many days before the hire starts: the deposit is refunded in full. */
	declare cancellationFullRefundDays: number;
	/** Default days between electrical safety tests, for models without their own interval. */
	declare testIntervalDays: CreationOptional<number>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		CompanySettings.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, primaryKey: true },
				companyName: { type: DataTypes.STRING(160), allowNull: false },
				currency: { type: DataTypes.CHAR(3), allowNull: false },
				taxRateBp: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				depositBp: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				pricingRule: { type: DataTypes.STRING(32), allowNull: false },
				defaultMarginDb: { type: DataTypes.DOUBLE, allowNull: false },
				distanceUnit: { type: DataTypes.ENUM('m', 'ft'), allowNull: false },
				paymentTermsDays: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				cancellationFullRefundDays: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				testIntervalDays: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 365 },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'company_settings' }
		);
	}
}
