/**
 * Kestrel Yard Audio's letterhead and sales desk address (invented), and the demo client accounts
 * marked as having chosen their (demo) password. Only fills what is empty, so it is safe to rerun.
 */
import { Op } from 'sequelize';
import type { StepContext } from '../scripts/migrate';
import { CompanySettings, User } from '../src/lib/server/db/models';

const DEMO_CLIENTS = ['organiser@millbrook-riverside.test', 'events@st-aldric.test'];

export async function up({ context }: { context: StepContext }) {
	await context.sequelize.transaction(async (transaction) => {
		const settings = await CompanySettings.findByPk(1, { transaction });
		if (settings && !settings.companyAddress) {
			await settings.update(
				{
					companyAddress: 'Unit 4, Kestrel Yard\nWharf Lane\nMillbrook MB4 2QT',
					companyContact: '+44 1632 960 300 · desk@kestrel-yard.test',
					companyTaxNumber: 'GB 000 0000 00',
					salesDeskEmail: settings.salesDeskEmail ?? 'desk@kestrel-yard.test'
				},
				{ transaction }
			);
		}
		await User.update({ passwordSetAt: new Date() }, { where: { email: { [Op.in]: DEMO_CLIENTS }, passwordSetAt: null }, transaction });
	});
}
