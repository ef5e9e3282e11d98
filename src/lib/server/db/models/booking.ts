import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';
import { BOOKING_STATES, type BookingState } from '../../../bookings/states';
import type { ModelType } from '../../../inventory/types';

/** Stock reserved for a quote's hire dates; confirmed and out bookings hold units. */
export class Booking extends Model<InferAttributes<Booking>, InferCreationAttributes<Booking>> {
	declare id: CreationOptional<number>;
	declare quoteId: number;
	declare status: BookingState;
	declare startDate: string;
	declare endDate: string;
	/** Where the delivery goes; printed on the delivery note. */
	declare siteAddress: CreationOptional<string>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Booking.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				quoteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, unique: true },
				status: { type: DataTypes.ENUM(...BOOKING_STATES), allowNull: false },
				startDate: { type: DataTypes.DATEONLY, allowNull: false },
				endDate: { type: DataTypes.DATEONLY, allowNull: false },
				siteAddress: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'bookings' }
		);
	}
}

export class BookingLine extends Model<InferAttributes<BookingLine>, InferCreationAttributes<BookingLine>> {
	declare id: CreationOptional<number>;
	declare bookingId: number;
	declare modelType: ModelType;
	declare modelId: number;
	declare quantity: number;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		BookingLine.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				bookingId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				modelType: { type: DataTypes.ENUM('loudspeaker', 'amplifier'), allowNull: false },
				modelId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				quantity: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'booking_lines' }
		);
	}
}

export class BookingUnit extends Model<InferAttributes<BookingUnit>, InferCreationAttributes<BookingUnit>> {
	declare id: CreationOptional<number>;
	declare bookingId: number;
	declare stockUnitId: number;
	/** Set when the unit's label was scanned going out; null while it is only reserved for the booking. */
	declare dispatchedAt: CreationOptional<Date | null>;
	declare dispatchedById: CreationOptional<number | null>;
	declare returnedAt: CreationOptional<Date | null>;
	declare returnedById: CreationOptional<number | null>;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		BookingUnit.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				bookingId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				stockUnitId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				dispatchedAt: { type: DataTypes.DATE, allowNull: true },
				dispatchedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				returnedAt: { type: DataTypes.DATE, allowNull: true },
				returnedById: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'booking_units' }
		);
	}
}
