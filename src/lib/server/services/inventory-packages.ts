import type { Transaction } from 'sequelize';
import { channelPlanErrors } from '$lib/inventory/channel-plan';
import { directivityText } from '$lib/inventory/gear-text';
import type { LoadedPackage, PackageRow } from '$lib/inventory/types';
import { packageSchema, type PackageInput, type PackagePatch } from '$lib/schemas/inventory-packages';
import { AmplifierModel, LoudspeakerModel, Package, PackageGroup } from '../db/models';
import { DomainError } from './errors';
import { plainRow, translateDbError, validOrThrow, withTransaction } from './inventory-common';
import { deleteHistory, recordChanges, recordCreation } from './inventory-history';
import { flagQuotesForPackageChange } from './recheck';

const DUPLICATE = { field: 'slug', message: 'Another package already uses this slug' };
const FIELDS = ['name', 'slug', 'description', 'active', 'groups'] as const;
const groupOrder = [[{ model: PackageGroup, as: 'groups' }, 'position', 'ASC']] as [object, string, string][];

function toRow(pkg: Package): PackageRow {
	const row = plainRow<PackageRow>(pkg);
	row.groups = (pkg.groups ?? []).map((g) => {
		const { packageId: _p, loudspeaker: _l, amplifier: _a, ...group } = g.get({ plain: true }) as PackageGroup & Record<string, unknown>;
		return group;
	});
	return row;
}

async function find(id: number, transaction?: Transaction): Promise<Package> {
	const found = await Package.findByPk(id, { include: [{ model: PackageGroup, as: 'groups' }], order: groupOrder as never, transaction });
	if (!found) throw new DomainError(404, 'No such package.');
	return found;
}

export async function listPackages(): Promise<PackageRow[]> {
	const rows = await Package.findAll({ include: [{ model: PackageGroup, as: 'groups' }], order: [['name', 'ASC'], ...groupOrder] as never });
	return rows.map(toRow);
}

export async function getPackage(id: number): Promise<PackageRow> {
	return toRow(await find(id));
}

const loadedInclude = [
	{ model: PackageGroup, as: 'groups', include: [{ model: LoudspeakerModel, as: 'loudspeaker' }, { model: AmplifierModel, as: 'amplifier' }] }
];

function toLoaded(pkg: Package): LoadedPackage {
	return {
		...plainRow<Omit<LoadedPackage, 'groups'>>(pkg),
		groups: (pkg.groups ?? []).map((g) => {
			const { packageId: _p, ...group } = g.get({ plain: true }) as PackageGroup & Record<string, unknown>;
			return { ...group, loudspeaker: plainRow(g.loudspeaker!), amplifier: plainRow(g.amplifier!) };
		})
	} as LoadedPackage;
}

/** A package with every group's loudspeaker and amplifier model: input for the spec mapping and bill of materials. */
export async function getLoadedPackage(id: number): Promise<LoadedPackage> {
	const found = await Package.findByPk(id, { include: loadedInclude, order: groupOrder as never });
	if (!found) throw new DomainError(404, 'No such package.');
	return toLoaded(found);
}

/** Every package with its models loaded, in name order (the list page and the quoting engine). */
export async function listLoadedPackages(): Promise<LoadedPackage[]> {
	// Four flat queries put together here: one nested include took 1 s at 600 packages, nearly all of
	// it Sequelize folding the joined rows back into objects.
	const [packages, groups] = await Promise.all([
		Package.findAll({ order: [['name', 'ASC']] }),
		PackageGroup.findAll({ order: [['packageId', 'ASC'], ['position', 'ASC']] })
	]);
	const [loudspeakers, amplifiers] = await Promise.all([
		LoudspeakerModel.findAll({ where: { id: [...new Set(groups.map((g) => g.loudspeakerModelId))] } }),
		AmplifierModel.findAll({ where: { id: [...new Set(groups.map((g) => g.amplifierModelId))] } })
	]);
	const loudspeakerById = new Map(loudspeakers.map((m) => [m.id, plainRow<LoadedPackage['groups'][number]['loudspeaker']>(m)]));
	const amplifierById = new Map(amplifiers.map((m) => [m.id, plainRow<LoadedPackage['groups'][number]['amplifier']>(m)]));
	const groupsOf = new Map<number, LoadedPackage['groups']>();
	for (const g of groups) {
		const { packageId, ...group } = g.get({ plain: true }) as PackageGroup & Record<string, unknown>;
		const list = groupsOf.get(packageId) ?? [];
		list.push({ ...group, loudspeaker: loudspeakerById.get(g.loudspeakerModelId)!, amplifier: amplifierById.get(g.amplifierModelId)! } as LoadedPackage['groups'][number]);
		groupsOf.set(packageId, list);
	}
	return packages.map((p) => ({ ...plainRow<Omit<LoadedPackage, 'groups'>>(p), groups: groupsOf.get(p.id) ?? [] }) as LoadedPackage);
}

/** Loads each group's models and refuses (422, per field) unknown models or an unsafe channel plan. */
async function checkGroups(groups: PackageInput['groups'], transaction: Transaction): Promise<void> {
	const errors: Record<string, string[]> = {};
	const planned = [];
	for (const [i, g] of groups.entries()) {
		const [loudspeaker, amplifier] = await Promise.all([
			LoudspeakerModel.findByPk(g.loudspeakerModelId, { transaction }),
			AmplifierModel.findByPk(g.amplifierModelId, { transaction })
		]);
		if (!loudspeaker) errors[`groups.${i}.loudspeakerModelId`] = ['No such loudspeaker model'];
		if (!amplifier) errors[`groups.${i}.amplifierModelId`] = ['No such amplifier model'];
		if (loudspeaker && amplifier) planned.push({ ...g, loudspeaker, amplifier, index: i });
	}
	for (const p of planned) {
		for (const [key, messages] of Object.entries(channelPlanErrors([p]))) {
			errors[key.replace('groups.0.', `groups.${p.index}.`)] = messages;
		}
	}
	if (Object.keys(errors).length) throw new DomainError(422, 'The channel plan needs attention.', errors);
}

async function writeGroups(packageId: number, groups: PackageInput['groups'], transaction: Transaction): Promise<void> {
	await PackageGroup.destroy({ where: { packageId }, transaction });
	await PackageGroup.bulkCreate(groups.map((g, position) => ({ ...g, packageId, position })), { transaction });
}

type GroupValues = Omit<PackageInput['groups'][number], 'heightM' | 'spacingM' | 'directivity'> & Partial<Pick<PackageInput['groups'][number], 'heightM' | 'spacingM' | 'directivity'>>;

/** What the acoustic model reads of a group; the 'flown' flag is rigging, not acoustics. */
function acousticText(g: GroupValues): string {
	const placement = [
		g.heightM != null ? `${g.heightM} m high` : '',
		g.spacingM != null ? `outer stacks ${g.spacingM} m apart` : '',
		g.directivity ? `own pattern ${directivityText(g.directivity)}` : ''
	].filter(Boolean);
	return [`${g.stacks}×${g.count} of loudspeaker #${g.loudspeakerModelId} on amplifier #${g.amplifierModelId}, ${g.cabinetsPerChannel} per channel`, ...placement].join(', ');
}

/** A one-line summary of the groups, so the history can show old → new for the whole channel plan. */
function groupsText(groups: readonly GroupValues[]): string {
	return groups.map((g) => acousticText(g) + (g.flown ? ', flown' : '')).join('; ');
}

export async function createPackage(input: PackageInput, actorId: number | null, transaction?: Transaction): Promise<PackageRow> {
	const values = validOrThrow(packageSchema, input);
	return withTransaction(transaction, async (t) => {
		await checkGroups(values.groups, t);
		const { groups, ...fields } = values;
		const created = await Package.create(fields, { transaction: t }).catch((err) => translateDbError(err, DUPLICATE));
		await writeGroups(created.id, groups, t);
		await recordCreation({ modelType: 'package', modelId: created.id }, values.name, actorId, t);
		return toRow(await find(created.id, t));
	});
}

export async function updatePackage(id: number, changes: PackagePatch, actorId: number | null, transaction?: Transaction): Promise<PackageRow> {
	return withTransaction(transaction, async (t) => {
		const current = await find(id, t);
		const before = toRow(current);
		const merged = validOrThrow(packageSchema, { name: before.name, slug: before.slug, description: before.description, active: before.active, groups: before.groups, ...changes });
		await checkGroups(merged.groups, t);
		const changed = await recordChanges(
			{ modelType: 'package', modelId: id },
			{ ...before, groups: groupsText(before.groups) },
			{ ...merged, groups: groupsText(merged.groups) },
			FIELDS,
			actorId,
			t
		);
		const { groups, ...fields } = merged;
		await current.update(fields, { transaction: t }).catch((err) => translateDbError(err, DUPLICATE));
		if (changed.includes('groups')) {
			await writeGroups(id, groups, t);
			if (before.groups.map(acousticText).join('; ') !== merged.groups.map(acousticText).join('; ')) await flagQuotesForPackageChange(id, t);
		}
		return toRow(await find(id, t));
	});
}

export async function deletePackage(id: number, transaction?: Transaction): Promise<void> {
	await withTransaction(transaction, async (t) => {
		const current = await find(id, t);
		await deleteHistory('package', id, t);
		await current.destroy({ transaction: t }).catch((err) => translateDbError(err, DUPLICATE));
	});
}
