import type { Sequelize } from 'sequelize';
import { Client } from './client';
import { ClientChange, DeskNotice, PasswordReset } from './client-records';
import { SignInLink } from './sign-in-link';
import { User } from './user';
import { initQuotingModels, Quote } from './quoting';
import { initInventoryModels } from './inventory';
import { initSiteModels, Site, SiteReceiver } from './site';

export { Client, ClientChange, DeskNotice, PasswordReset, SignInLink, Site, SiteReceiver, User };
export * from './quoting';
export * from './inventory';

/** Registers every model and association on one Sequelize instance. */
export function initModels(sequelize: Sequelize): void {
	Client.initModel(sequelize);
	User.initModel(sequelize);
	SignInLink.initModel(sequelize);
	ClientChange.initModel(sequelize);
	PasswordReset.initModel(sequelize);

	Client.hasMany(User, { foreignKey: 'clientId', as: 'users' });
	User.belongsTo(Client, { foreignKey: 'clientId', as: 'client' });

	initInventoryModels(sequelize);
	initQuotingModels(sequelize);
	DeskNotice.initModel(sequelize);
	DeskNotice.belongsTo(Quote, { foreignKey: 'quoteId', as: 'quote' });
	initSiteModels(sequelize);
}
