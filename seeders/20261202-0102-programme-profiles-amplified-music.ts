/**
 * Brings the four stock programme profiles to the shapes in data/programmes.ts, whose C-minus-A gap at
 * the mix position is that of amplified music. Idempotent: it finds each stock profile by slug and
 * writes the bands only while the profile is still marked typical (an edited profile is the company's own).
 */
import type { StepContext } from '../scripts/migrate';
import { ProgrammeProfile } from '../src/lib/server/db/models';
import { programmes } from './data/programmes';

export async function up({ context }: { context: StepContext }) {
	await context.sequelize.transaction(async (transaction) => {
		for (const p of programmes) {
			const [profile] = await ProgrammeProfile.findOrCreate({ where: { slug: p.slug }, defaults: { ...p, isTypical: true }, transaction });
			if (profile.isTypical) await profile.update({ bands: p.bands, crestFactorDb: p.crestFactorDb }, { transaction });
		}
	});
}
