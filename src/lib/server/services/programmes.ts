import { UniqueConstraintError } from 'sequelize';
import type { Programme } from '$lib/acoustics';
import type { ProgrammeBands, ProgrammeInput } from '$lib/schemas/programmes';
import { cached } from '../cache';
import { bumpStamp } from '../cache-stamps';
import { ProgrammeProfile } from '../db/models';
import { DomainError } from './errors';

export interface ProgrammeRow {
	id: number;
	slug: string;
	name: string;
	description: string;
	bands: ProgrammeBands;
	crestFactorDb: number;
	isTypical: boolean;
}

function toRow(p: ProgrammeProfile): ProgrammeRow {
	return {
		id: p.id,
		slug: p.slug,
		name: p.name,
		description: p.description,
		bands: p.bands,
		crestFactorDb: p.crestFactorDb,
		isTypical: p.isTypical
	};
}

export async function listProgrammes(): Promise<ProgrammeRow[]> {
	const rows = await ProgrammeProfile.findAll({ order: [['sortOrder', 'ASC'], ['name', 'ASC']] });
	return rows.map(toRow);
}

export async function findProgramme(slug: string): Promise<ProgrammeRow | null> {
	const all = await cached('programmes', listProgrammes);
	return all.find((p) => p.slug === slug) ?? null;
}

/** The acoustic model's view of a stored profile: band keys as numbers. */
export function toProgramme(row: Pick<ProgrammeRow, 'bands' | 'crestFactorDb'>): Programme {
	const bandsDb: Programme['bandsDb'] = {};
	for (const [band, level] of Object.entries(row.bands)) {
		(bandsDb as Record<number, number>)[Number(band)] = level as number;
	}
	return { bandsDb, crestFactorDb: row.crestFactorDb };
}

/** Creates or, when the slug exists, updates a profile. An admin's edit is no longer "typical". */
export async function saveProgramme(input: ProgrammeInput, id?: number): Promise<ProgrammeRow> {
	try {
		if (id === undefined) return toRow(await ProgrammeProfile.create({ ...input, isTypical: false }));
		const row = await ProgrammeProfile.findByPk(id);
		if (!row) throw new DomainError(404, 'No such programme profile.');
		await row.update({ ...input, isTypical: false });
		return toRow(row);
	} catch (err) {
		if (err instanceof UniqueConstraintError) {
			throw new DomainError(409, 'Another profile already uses that short name.', { slug: ['Already in use'] });
		}
		throw err;
	} finally {
		await bumpStamp('programmes'); // after the write: profiles grant no access, a crash between is harmless
	}
}
