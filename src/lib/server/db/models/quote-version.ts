import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { PackageResult } from '../../../quotes/evaluate-packages';
import type { Price } from '../../../quotes/pricing';
import type { QuoteRequestInput } from '../../../schemas/evaluation';
import type { SiteSnapshot } from '../../../schemas/sites';
import type { SystemInput } from '../../../schemas/systems';

/** One saved state of a quote: the request, the chosen package and the snapshot it was priced on. */
export class QuoteVersion extends Model<InferAttributes<QuoteVersion>, InferCreationAttributes<QuoteVersion>> {
	declare id: CreationOptional<number>;
	declare quoteId: number;
	declare version: number;
	/** Null when the version offers a composed or suggested system instead of a package. */
	declare packageId: number | null;
	/** The system's groups, when the version offers one. */
	declare system: CreationOptional<SystemInput | null>;
	declare startDate: string;
	declare endDate: string;
	declare request: QuoteRequestInput;
	/** The chosen package's full result at the time: verdict, bands, boundary, stock, curve. */
	declare evaluation: PackageResult;
	declare price: Price;
	/** The saved site it was evaluated with, if any (it may since have been edited or deleted). */
	declare siteId: CreationOptional<number | null>;
	/** The copy of the site evaluated: later edits to the site never change this version. */
	declare site: CreationOptional<SiteSnapshot | null>;
	declare notes: CreationOptional<string | null>;
	declare createdById: number;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		QuoteVersion.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				quoteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				packageId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				system: { type: DataTypes.JSON, allowNull: true },
				startDate: { type: DataTypes.DATEONLY, allowNull: false },
				endDate: { type: DataTypes.DATEONLY, allowNull: false },
				request: { type: DataTypes.JSON, allowNull: false },
				evaluation: { type: DataTypes.JSON, allowNull: false },
				price: { type: DataTypes.JSON, allowNull: false },
				siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				site: { type: DataTypes.JSON, allowNull: true },
				notes: { type: DataTypes.TEXT, allowNull: true },
				createdById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'quote_versions' }
		);
	}
}
