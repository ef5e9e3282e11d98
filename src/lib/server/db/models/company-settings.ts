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
	/** Letterhead for the quote document. */
	declare companyAddress: CreationOptional<string | null>;
	declare companyTaxNumber: CreationOptional<string | null>;
	declare companyContact: CreationOptional<string | null>;
	/** Where the desk is told when a client accepts, declines, asks for a change or pays. */
	declare salesDeskEmail: CreationOptional<string | null>;
	declare quoteValidityDays: CreationOptional<number>;
	/** The stored logo's file name under the upload directory (never under static/). */
	declare logoFile: CreationOptional<string | null>;
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
				companyAddress: { type: DataTypes.TEXT, allowNull: true },
				companyTaxNumber: { type: DataTypes.STRING(60), allowNull: true },
				companyContact: { type: DataTypes.STRING(200), allowNull: true },
				salesDeskEmail: { type: DataTypes.STRING(254), allowNull: true },
				quoteValidityDays: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 30 },
				logoFile: { type: DataTypes.STRING(100), allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'company_settings' }
		);
	}
}
