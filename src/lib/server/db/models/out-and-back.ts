import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import type { ModelType } from '../../../inventory/types';

/** One step in a booking's life: a unit scanned out or back, or the booking moving to a new state. */
export class BookingEvent extends Model<InferAttributes<BookingEvent>, InferCreationAttributes<BookingEvent>> {
	declare id: CreationOptional<number>;
	declare bookingId: number;
	declare kind: 'dispatch' | 'return' | 'state';
	declare stockUnitId: number | null;
	declare state: string | null;
	declare userId: number | null;
	declare createdAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		BookingEvent.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				bookingId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				kind: { type: DataTypes.ENUM('dispatch', 'return', 'state'), allowNull: false },
				stockUnitId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				state: { type: DataTypes.STRING(20), allowNull: true },
				userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				createdAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'booking_events', updatedAt: false }
		);
	}
}

/** What came back broken: notes and an optional photo; filing one sends the unit to repair. */
export class DamageReport extends Model<InferAttributes<DamageReport>, InferCreationAttributes<DamageReport>> {
	declare id: CreationOptional<number>;
	declare stockUnitId: number;
	declare bookingId: number | null;
	declare notes: string;
	declare photoStoredName: string | null;
	declare photoMimeType: string | null;
	declare photoOriginalName: string | null;
	declare reportedById: number | null;
	declare createdAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		DamageReport.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				stockUnitId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				bookingId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				notes: { type: DataTypes.TEXT, allowNull: false },
				photoStoredName: { type: DataTypes.STRING(80), allowNull: true },
				photoMimeType: { type: DataTypes.STRING(60), allowNull: true },
				photoOriginalName: { type: DataTypes.STRING(200), allowNull: true },
				reportedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				createdAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'damage_reports', updatedAt: false }
		);
	}
}

/** Work done on a unit; a repair marked done puts the unit back to ready. */
export class Repair extends Model<InferAttributes<Repair>, InferCreationAttributes<Repair>> {
	declare id: CreationOptional<number>;
	declare stockUnitId: number;
	declare description: string;
	declare costMinor: number;
	declare done: boolean;
	declare recordedById: number | null;
	declare createdAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Repair.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				stockUnitId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				description: { type: DataTypes.STRING(500), allowNull: false },
				costMinor: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				done: { type: DataTypes.BOOLEAN, allowNull: false },
				recordedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				createdAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'repairs', updatedAt: false }
		);
	}
}

/** A model's own electrical safety test interval, overriding the company default. */
export class ModelTestInterval extends Model<InferAttributes<ModelTestInterval>, InferCreationAttributes<ModelTestInterval>> {
	declare id: CreationOptional<number>;
	declare modelType: ModelType;
	declare modelId: number;
	declare days: number;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		ModelTestInterval.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				modelType: { type: DataTypes.ENUM('loudspeaker', 'amplifier'), allowNull: false },
				modelId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				days: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'model_test_intervals', createdAt: false }
		);
	}
}
