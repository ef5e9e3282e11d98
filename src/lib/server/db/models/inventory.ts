import type { Sequelize } from 'sequelize';
import { AmplifierModel } from './amplifier-model';
import { LoudspeakerModel } from './loudspeaker-model';
import { ModelAttachment } from './model-attachment';
import { Package } from './package';
import { PackageGroup } from './package-group';
import { HistoryEntry } from './history-entry';
import { StockUnit } from './stock-unit';
import { User } from './user';

export { AmplifierModel, LoudspeakerModel, ModelAttachment, Package, PackageGroup, HistoryEntry, StockUnit };

/** Registers the inventory's models and associations (after User, which the history refers to). */
export function initInventoryModels(sequelize: Sequelize): void {
	LoudspeakerModel.initModel(sequelize);
	AmplifierModel.initModel(sequelize);
	Package.initModel(sequelize);
	PackageGroup.initModel(sequelize);
	StockUnit.initModel(sequelize);
	HistoryEntry.initModel(sequelize);
	ModelAttachment.initModel(sequelize);

	Package.hasMany(PackageGroup, { foreignKey: 'packageId', as: 'groups', onDelete: 'CASCADE' });
	PackageGroup.belongsTo(Package, { foreignKey: 'packageId', as: 'package' });
	PackageGroup.belongsTo(LoudspeakerModel, { foreignKey: 'loudspeakerModelId', as: 'loudspeaker' });
	PackageGroup.belongsTo(AmplifierModel, { foreignKey: 'amplifierModelId', as: 'amplifier' });
	StockUnit.belongsTo(LoudspeakerModel, { foreignKey: 'loudspeakerModelId', as: 'loudspeaker' });
	StockUnit.belongsTo(AmplifierModel, { foreignKey: 'amplifierModelId', as: 'amplifier' });
	HistoryEntry.belongsTo(User, { foreignKey: 'userId', as: 'user' });
}
