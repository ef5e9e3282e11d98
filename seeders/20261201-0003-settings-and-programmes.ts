/**
 * Kestrel Yard Audio's terms (invented) and the four stock programme profiles. The profiles are
 * typical approximations of each kind of show, not measurements, and the UI labels them so.
 * Crest factors follow the usual ranges (speech about 12 dB, music 12–20 dB, heavily compressed
 * pop 6–9 dB; common practice).
 */
import type { StepContext } from '../scripts/migrate';
import { CompanySettings, ProgrammeProfile } from '../src/lib/server/db/models';

const programmes = [
	{
		slug: 'speech',
		name: 'Speech',
		description: 'Announcements, talks and ceremonies. Little below 125 Hz matters.',
		bands: { '125': -6, '250': -2, '500': 0, '1000': -2, '2000': -6, '4000': -11, '8000': -18 },
		crestFactorDb: 12,
		sortOrder: 1
	},
	{
		slug: 'acoustic',
		name: 'Acoustic music',
		description: 'Folk, jazz and acoustic sets: a gentle low end and wide dynamics.',
		bands: { '63': -8, '125': -4, '250': -2, '500': 0, '1000': -2, '2000': -5, '4000': -9, '8000': -14 },
		crestFactorDb: 15,
		sortOrder: 2
	},
	{
		slug: 'pop-rock',
		name: 'Pop / rock',
		description: 'Live bands: a strong kick and bass, mixed with moderate compression.',
		bands: { '63': 0, '125': 0, '250': -2, '500': -4, '1000': -6, '2000': -8, '4000': -11, '8000': -15 },
		crestFactorDb: 10,
		sortOrder: 3
	},
	{
		slug: 'dance',
		name: 'Dance / electronic',
		description: 'DJ sets: sub-bass heavy and tightly compressed.',
		bands: { '31.5': -2, '63': 4, '125': 2, '250': -3, '500': -6, '1000': -8, '2000': -10, '4000': -12, '8000': -15 },
		crestFactorDb: 8,
		sortOrder: 4
	}
];

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
