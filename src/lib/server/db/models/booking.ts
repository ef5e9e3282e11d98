import {
	DataTypes,
	Model,
	type CreationOptional,
	type InferAttributes,
	type InferCreationAttributes,
	type Sequelize
} from 'sequelize';

/** Stock reserved for a quote's hire dates; only confirmed bookings hold units. */
export class Booking extends Model<InferAttributes<Booking>, InferCreationAttributes<Booking>> {
	declare id: CreationOptional<number>;
	declare quoteId: number;
	declare status: 'confirmed' | 'cancelled';
	declare startDate: string;
	declare endDate: string;
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		Booking.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				quoteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, unique: true },
				status: { type: DataTypes.ENUM('confirmed', 'cancelled'), allowNull: false },
				startDate: { type: DataTypes.DATEONLY, allowNull: false },
				endDate: { type: DataTypes.DATEONLY, allowNull: false },
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
	declare modelType: 'loudspeaker' | 'amplifier';
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
	declare createdAt: CreationOptional<Date>;
	declare updatedAt: CreationOptional<Date>;

	static initModel(sequelize: Sequelize) {
		BookingUnit.init(
			{
				id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
				bookingId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				stockUnitId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
				createdAt: DataTypes.DATE,
				updatedAt: DataTypes.DATE
			},
			{ sequelize, tableName: 'booking_units' }
		);
	}
}
