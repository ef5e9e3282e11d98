/**
 * Damage and repair: a damage report (notes, optional photo) sends a unit to repair; a repair record
 * marked done puts it back to ready. Photos pass the same checks as every other upload and are stored
 * through the attachments' storage functions.
 */
import { AmplifierModel, BookingUnit, DamageReport, LoudspeakerModel, Repair, StockUnit, User } from '../db';
import { CATALOGUE, invalidate } from '../cache';
import type { SessionUser } from '../auth/signed-in-user';
import { DomainError } from './errors';
import { readStoredFile, removeStoredFiles, storeFile } from './inventory-attachments';
import { safeOriginalName, sniffMimeType, uploadProblem } from './upload-checks';

export interface DamageInput {
	stockUnitId: number;
	bookingId: number | null;
	notes: string;
	photo: { name: string; bytes: Uint8Array } | null;
}

export async function reportDamage(input: DamageInput, user: SessionUser): Promise<{ id: number }> {
	const unit = await StockUnit.findByPk(input.stockUnitId);
	if (!unit) throw new DomainError(404, 'No such unit.');
	if (unit.status === 'retired') throw new DomainError(409, `${unit.serial} is retired.`);
	const held = await BookingUnit.findAll({ where: { stockUnitId: unit.id, returnedAt: null } });
	if (held.some((r) => r.dispatchedAt)) throw new DomainError(409, `${unit.serial} is still out: scan it back first.`);
	let stored: { name: string; mimeType: string; original: string } | null = null;
	if (input.photo) {
		const problem = uploadProblem('photo', input.photo.bytes);
		if (problem) throw new DomainError(422, problem, { photo: [problem] });
		const mimeType = sniffMimeType(input.photo.bytes)!;
		stored = { name: await storeFile(input.photo.bytes, mimeType), mimeType, original: safeOriginalName(input.photo.name) };
	}
	try {
		const report = await StockUnit.sequelize!.transaction(async (transaction) => {
			const created = await DamageReport.create(
				{
					stockUnitId: unit.id,
					bookingId: input.bookingId,
					notes: input.notes,
					photoStoredName: stored?.name ?? null,
					photoMimeType: stored?.mimeType ?? null,
					photoOriginalName: stored?.original ?? null,
					reportedById: user.id
				},
				{ transaction }
			);
			await StockUnit.update({ status: 'in-repair' }, { where: { id: unit.id }, transaction });
			// A unit reserved ahead for later bookings must be chosen again: it cannot go out broken.
			await BookingUnit.destroy({ where: { stockUnitId: unit.id, dispatchedAt: null }, transaction });
			return created;
		});
		invalidate(CATALOGUE);
		return { id: report.id };
	} catch (err) {
		if (stored) await removeStoredFiles([stored.name]);
		throw err;
	}
}

export interface RepairInput {
	description: string;
	costMinor: number;
	done: boolean;
}

export interface RepairRow {
	id: number;
	description: string;
	costMinor: number;
	done: boolean;
	recordedBy: string;
	createdAt: string;
}

export async function recordRepair(unitId: number, input: RepairInput, user: SessionUser): Promise<{ repair: RepairRow; status: string }> {
	const unit = await StockUnit.findByPk(unitId);
	if (!unit) throw new DomainError(404, 'No such unit.');
	const status = input.done && unit.status === 'in-repair' ? 'ready' : unit.status;
	const repair = await StockUnit.sequelize!.transaction(async (transaction) => {
		const created = await Repair.create({ stockUnitId: unitId, ...input, recordedById: user.id }, { transaction });
		if (status !== unit.status) await StockUnit.update({ status }, { where: { id: unitId }, transaction });
		return created;
	});
	invalidate(CATALOGUE);
	return { repair: { id: repair.id, ...input, recordedBy: user.name, createdAt: repair.createdAt.toISOString() }, status };
}

export async function listRepairs(unitId: number): Promise<RepairRow[]> {
	if (!(await StockUnit.findByPk(unitId, { attributes: ['id'] }))) throw new DomainError(404, 'No such unit.');
	const rows = await Repair.findAll({ where: { stockUnitId: unitId }, order: [['createdAt', 'DESC'], ['id', 'DESC']] });
	const users = await User.findAll({ where: { id: rows.map((r) => r.recordedById).filter((id): id is number => id !== null) }, attributes: ['id', 'name'] });
	return rows.map((r) => ({
		id: r.id,
		description: r.description,
		costMinor: r.costMinor,
		done: r.done,
		recordedBy: users.find((u) => u.id === r.recordedById)?.name ?? '—',
		createdAt: r.createdAt.toISOString()
	}));
}

export interface UnitInRepair {
	unitId: number;
	serial: string;
	modelName: string;
	reports: { id: number; notes: string; hasPhoto: boolean; createdAt: string }[];
	repairs: RepairRow[];
}

/** Units in repair with their damage reports and repair records, for the repairs page. */
export async function unitsInRepair(): Promise<UnitInRepair[]> {
	const units = await StockUnit.findAll({
		where: { status: 'in-repair' },
		include: [
			{ model: LoudspeakerModel, as: 'loudspeaker', attributes: ['name'] },
			{ model: AmplifierModel, as: 'amplifier', attributes: ['name'] }
		],
		order: [['serial', 'ASC']]
	});
	return Promise.all(
		units.map(async (u) => {
			const reports = await DamageReport.findAll({ where: { stockUnitId: u.id }, order: [['createdAt', 'DESC']], limit: 5 });
			return {
				unitId: u.id,
				serial: u.serial,
				modelName: u.loudspeaker?.name ?? u.amplifier?.name ?? '',
				reports: reports.map((r) => ({ id: r.id, notes: r.notes, hasPhoto: r.photoStoredName !== null, createdAt: r.createdAt.toISOString() })),
				repairs: await listRepairs(u.id)
			};
		})
	);
}

export async function damagePhoto(reportId: number): Promise<{ bytes: Buffer; mimeType: string }> {
	const report = await DamageReport.findByPk(reportId);
	if (!report?.photoStoredName) throw new DomainError(404, 'No such photo.');
	return { bytes: await readStoredFile(report.photoStoredName), mimeType: report.photoMimeType! };
}
