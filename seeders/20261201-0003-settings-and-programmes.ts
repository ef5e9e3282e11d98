/**
 * Kestrel Yard Audio's terms (invented) and the four stock programme profiles. The profiles are
 * typical approximations of each kind of show, not measurements, and the UI labels them so.
 * The profiles themselves live in data/programmes.ts, shared with the seeder that updates them.
 */
import type { StepContext } from '../scripts/migrate';
import { CompanySettings, ProgrammeProfile } from '../src/lib/server/db/models';
import { programmes } from './data/programmes';

export async function up({ context }: { context: StepContext }) {
	await context.sequelize.transaction(async (transaction) => {
		await CompanySettings.findOrCreate({
			where: { id: 1 },
			defaults: {
				id: 1,
				companyName: 'Kestrel Yard Audio',
				currency: 'GBP',
				taxRateBp: 2000,
				depositBp: 3000,
				pricingRule: 'extra-days-half',
				defaultMarginDb: 3,
				distanceUnit: 'm',
				paymentTermsDays: 14,
				cancellationFullRefundDays: 28
			},
			transaction
		});
		for (const p of programmes) {
			await ProgrammeProfile.findOrCreate({ where: { slug: p.slug }, defaults: { ...p, isTypical: true }, transaction });
		}
	});
}
