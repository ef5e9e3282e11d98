import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

/** An e-mail written before it is sent, so a mail-server outage delays it but never loses it. */
export class OutboundEmail extends Model<InferAttributes<OutboundEmail>, InferCreationAttributes<OutboundEmail>> {
	declare id: CreationOptional<number>;
	declare toAddress: string;
	declare subject: string;
	declare textBody: string;
	declare htmlBody: CreationOptional<string | null>;
	declare status: CreationOptional<'pending' | 'sending' | 'sent' | 'failed'>;
	declare attempts: CreationOptional<number>;
	declare lastError: CreationOptional<string | null>;
	declare quoteId: CreationOptional<number | null>;
	declare attachments: CreationOptional<{ filename: string; contentType: string; contentBase64: string }[] | null>;
	declare sentAt: CreationOptional<Date | null>;
	/** When and by which process the row was claimed for sending (see mail/outbox.ts). */
	declare claimedAt: CreationOptional<Date | null>;
	declare claimedBy: CreationOptional<string | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		OutboundEmail.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				toAddress: { type: DataTypes.STRING(254), allowNull: false },
				subject: { type: DataTypes.STRING(200), allowNull: false },
				textBody: { type: DataTypes.TEXT, allowNull: false },
				htmlBody: { type: DataTypes.TEXT, allowNull: true },
				status: { type: DataTypes.ENUM('pending', 'sending', 'sent', 'failed'), allowNull: false, defaultValue: 'pending' },
				attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
				lastError: { type: DataTypes.STRING(500), allowNull: true },
				quoteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				attachments: { type: DataTypes.JSON, allowNull: true },
				sentAt: { type: DataTypes.DATE, allowNull: true },
				claimedAt: { type: DataTypes.DATE, allowNull: true },
				claimedBy: { type: DataTypes.STRING(100), allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'outbound_emails' }
		);
	}
}
