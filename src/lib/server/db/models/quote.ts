import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import { CLIENT_RESPONSES, QUOTE_STATUSES, type ClientResponse, type QuoteStatus } from '../../../quotes/states';

export class Quote extends Model<InferAttributes<Quote>, InferCreationAttributes<Quote>> {
	declare id: CreationOptional<number>;
	declare clientId: number;
	declare eventName: string;
	declare status: CreationOptional<QuoteStatus>;
	declare currentVersion: CreationOptional<number>;
	/** Set when a spec change touched a model this quote's package uses. */
	declare needsRecheck: CreationOptional<boolean>;
	declare recheckReason: CreationOptional<string | null>;
	/** Set when a paid deposit could not become a booking (the stock went to another hire). */
	declare bookingIssue: CreationOptional<string | null>;
	declare createdById: number;
	declare sentAt: CreationOptional<Date | null>;
	declare acceptedAt: CreationOptional<Date | null>;
	declare cancelledAt: CreationOptional<Date | null>;
	/** The last day the sent quote may be accepted (stamped when sent, from the validity setting). */
	declare validUntil: CreationOptional<string | null>;
	declare acceptedById: CreationOptional<number | null>;
	/** The terms exactly as the person accepting saw them. */
	declare acceptedTerms: CreationOptional<string | null>;
	/** The client's last answer other than acceptance: back with the desk until sent again. */
	declare clientResponse: CreationOptional<ClientResponse | null>;
	declare clientMessage: CreationOptional<string | null>;
	declare respondedAt: CreationOptional<Date | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Quote.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				clientId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				eventName: { type: DataTypes.STRING(160), allowNull: false },
				status: { type: DataTypes.ENUM(...QUOTE_STATUSES), allowNull: false, defaultValue: 'draft' },
				currentVersion: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
				needsRecheck: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
				recheckReason: { type: DataTypes.STRING(500), allowNull: true },
				bookingIssue: { type: DataTypes.STRING(500), allowNull: true },
				createdById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				sentAt: { type: DataTypes.DATE, allowNull: true },
				acceptedAt: { type: DataTypes.DATE, allowNull: true },
				cancelledAt: { type: DataTypes.DATE, allowNull: true },
				validUntil: { type: DataTypes.DATEONLY, allowNull: true },
				acceptedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				acceptedTerms: { type: DataTypes.TEXT, allowNull: true },
				clientResponse: { type: DataTypes.ENUM(...CLIENT_RESPONSES), allowNull: true },
				clientMessage: { type: DataTypes.TEXT, allowNull: true },
				respondedAt: { type: DataTypes.DATE, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'quotes' }
		);
	}
}
