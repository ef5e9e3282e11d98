import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const timestamps = {
	createdAt: { type: DataTypes.DATE, allowNull: false },
	updatedAt: { type: DataTypes.DATE, allowNull: false }
};
const measure = { type: DataTypes.DOUBLE, allowNull: false };
const optional = { type: DataTypes.DOUBLE, allowNull: true };
const money = { type: DataTypes.INTEGER.UNSIGNED, allowNull: false };
const ref = (table: string, allowNull = false, onDelete = 'RESTRICT') => ({
	type: DataTypes.INTEGER.UNSIGNED,
	allowNull,
	references: { model: table, key: 'id' },
	onDelete
});

/** Inventory: loudspeaker and amplifier models, packages and their groups, stock units, spec history, attachments. */
export async function up({ context: qi }: { context: QueryInterface }) {
	await qi.createTable('loudspeaker_models', {
		id,
		name: { type: DataTypes.STRING(120), allowNull: false },
		maker: { type: DataTypes.STRING(120), allowNull: false },
		kind: { type: DataTypes.ENUM('full-range', 'subwoofer', 'line-array-element', 'monitor'), allowNull: false },
		sensitivityDb: measure,
		sensitivityRef: { type: DataTypes.ENUM('1W', '2.83V'), allowNull: false },
		impedanceOhm: measure,
		powerContinuousW: measure,
		powerPeakW: optional,
		maxSplContinuousDb: optional,
		maxSplPeakDb: optional,
		dispersionHDeg: measure,
		dispersionVDeg: measure,
		lowHz: measure,
		highHz: measure,
		heightM: optional,
		weightKg: measure,
		dayRateMinor: money,
		replacementValueMinor: money,
		notes: { type: DataTypes.TEXT, allowNull: false },
		...timestamps
	});
	await qi.addIndex('loudspeaker_models', ['name', 'maker'], { unique: true, name: 'loudspeaker_models_name_maker' });

	await qi.createTable('amplifier_models', {
		id,
		name: { type: DataTypes.STRING(120), allowNull: false },
		maker: { type: DataTypes.STRING(120), allowNull: false },
		channels: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		powerW8: optional,
		powerW4: optional,
		powerW2: optional,
		minLoadOhm: measure,
		rackUnits: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		weightKg: measure,
		dayRateMinor: money,
		replacementValueMinor: money,
		mainsCurrentAmps: measure,
		notes: { type: DataTypes.TEXT, allowNull: false },
		...timestamps
	});
	await qi.addIndex('amplifier_models', ['name', 'maker'], { unique: true, name: 'amplifier_models_name_maker' });

	await qi.createTable('packages', {
		id,
		name: { type: DataTypes.STRING(120), allowNull: false },
		slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
		description: { type: DataTypes.TEXT, allowNull: false },
		active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
		...timestamps
	});

	await qi.createTable('package_groups', {
		id,
		packageId: ref('packages', false, 'CASCADE'),
		position: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		loudspeakerModelId: ref('loudspeaker_models'),
		count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		stacks: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
		amplifierModelId: ref('amplifier_models'),
		cabinetsPerChannel: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		flown: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false }
	});

	await qi.createTable('stock_units', {
		id,
		serial: { type: DataTypes.STRING(60), allowNull: false, unique: true },
		modelType: { type: DataTypes.ENUM('loudspeaker', 'amplifier'), allowNull: false },
		loudspeakerModelId: ref('loudspeaker_models', true),
		amplifierModelId: ref('amplifier_models', true),
		status: { type: DataTypes.ENUM('ready', 'in-repair', 'retired'), allowNull: false },
		location: { type: DataTypes.STRING(120), allowNull: false },
		lastTestedAt: { type: DataTypes.DATEONLY, allowNull: true },
		notes: { type: DataTypes.TEXT, allowNull: false },
		...timestamps
	});

	await qi.createTable('spec_changes', {
		id,
		modelType: { type: DataTypes.ENUM('loudspeaker', 'amplifier', 'package', 'unit'), allowNull: false },
		modelId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		field: { type: DataTypes.STRING(60), allowNull: false },
		oldValue: { type: DataTypes.TEXT, allowNull: true },
		newValue: { type: DataTypes.TEXT, allowNull: true },
		userId: ref('users', true, 'SET NULL'),
		createdAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('spec_changes', ['modelType', 'modelId', 'createdAt'], { name: 'spec_changes_model' });

	await qi.createTable('model_attachments', {
		id,
		modelType: { type: DataTypes.ENUM('loudspeaker', 'amplifier'), allowNull: false },
		modelId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		kind: { type: DataTypes.ENUM('spec-sheet', 'photo'), allowNull: false },
		originalName: { type: DataTypes.STRING(200), allowNull: false },
		storedName: { type: DataTypes.STRING(80), allowNull: false, unique: true },
		mimeType: { type: DataTypes.STRING(60), allowNull: false },
		sizeBytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
		uploadedBy: ref('users', true, 'SET NULL'),
		createdAt: { type: DataTypes.DATE, allowNull: false }
	});
	await qi.addIndex('model_attachments', ['modelType', 'modelId'], { name: 'model_attachments_model' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
	for (const table of ['model_attachments', 'spec_changes', 'stock_units', 'package_groups', 'packages', 'amplifier_models', 'loudspeaker_models']) {
		await qi.dropTable(table);
	}
}
