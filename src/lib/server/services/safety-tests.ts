/** Electrical safety tests as the warehouse sees them: each unit's due date, and the lists of due and overdue units. */
import { Op, type Transaction } from 'sequelize';
import { DUE_SOON_DAYS, addDays, testDueDate, testStatus, type TestStatus } from '$lib/bookings/safety-tests';
import { AmplifierModel, LoudspeakerModel, ModelTestInterval, StockUnit } from '../db';
import { CATALOGUE, invalidate } from '../cache';
import { DomainError } from './errors';
import { getSettings } from './settings';
import type { ModelType } from '$lib/inventory/types';


export interface IntervalLookup {
	defaultDays: number;
	days(modelType: ModelType, modelId: number): number;
}

/** Reads the company default first (outside any transaction, see DEVELOPERS) and every model's own interval. */
export async function testIntervals(transaction?: Transaction): Promise<IntervalLookup> {
	const defaultDays = transaction ? await settingsDefault() : (await getSettings()).testIntervalDays;
	const rows = await ModelTestInterval.findAll({ transaction });
	const own = new Map(rows.map((r) => [`${r.modelType}:${r.modelId}`, r.days]));
	return { defaultDays, days: (type, id) => own.get(`${type}:${id}`) ?? defaultDays };
}

async function settingsDefault(): Promise<number> {
	return (await getSettings()).testIntervalDays;
}

export interface TestRow {
	unitId: number;
	serial: string;
	modelName: string;
	location: string;
	lastTestedAt: string | null;
	dueDate: string | null;
	status: TestStatus;
}

/** Units in service (not retired) whose test is overdue or due within DUE_SOON_DAYS, soonest first. */
export async function unitsDueForTest(today: string): Promise<TestRow[]> {
	const intervals = await testIntervals();
	const units = await StockUnit.findAll({
		where: { status: { [Op.ne]: 'retired' } },
		include: [
			{ model: LoudspeakerModel, as: 'loudspeaker', attributes: ['name'] },
			{ model: AmplifierModel, as: 'amplifier', attributes: ['name'] }
		],
		order: [['serial', 'ASC']]
	});
	const rows: TestRow[] = [];
	for (const u of units) {
		const modelId = (u.loudspeakerModelId ?? u.amplifierModelId)!;
		const days = intervals.days(u.modelType, modelId);
		const status = testStatus(u.lastTestedAt, days, today);
		if (status === 'in-date') continue;
		rows.push({
			unitId: u.id,
			serial: u.serial,
			modelName: u.loudspeaker?.name ?? u.amplifier?.name ?? '',
			location: u.location,
			lastTestedAt: u.lastTestedAt,
			dueDate: testDueDate(u.lastTestedAt, days),
			status
		});
	}
	return rows.sort((a, b) => (a.dueDate ?? '').localeCompare(b.dueDate ?? ''));
}

export interface ModelInterval {
	modelType: ModelType;
	modelId: number;
	name: string;
	days: number | null;
}

export async function modelIntervals(): Promise<{ defaultDays: number; models: ModelInterval[] }> {
	const [settings, own, speakers, amps] = await Promise.all([
		getSettings(),
		ModelTestInterval.findAll(),
		LoudspeakerModel.findAll({ attributes: ['id', 'name'], order: [['name', 'ASC']] }),
		AmplifierModel.findAll({ attributes: ['id', 'name'], order: [['name', 'ASC']] })
	]);
	const days = (type: ModelType, id: number) => own.find((r) => r.modelType === type && r.modelId === id)?.days ?? null;
	return {
		defaultDays: settings.testIntervalDays,
		models: [
			...speakers.map((m) => ({ modelType: 'loudspeaker' as const, modelId: m.id, name: m.name, days: days('loudspeaker', m.id) })),
			...amps.map((m) => ({ modelType: 'amplifier' as const, modelId: m.id, name: m.name, days: days('amplifier', m.id) }))
		]
	};
}

/** Sets a model's own interval, or clears it (null) so the company default applies. */
export async function setModelInterval(modelType: ModelType, modelId: number, days: number | null): Promise<void> {
	const model = modelType === 'loudspeaker' ? await LoudspeakerModel.findByPk(modelId) : await AmplifierModel.findByPk(modelId);
	if (!model) throw new DomainError(404, `No such ${modelType} model.`);
	if (days === null) await ModelTestInterval.destroy({ where: { modelType, modelId } });
	else await ModelTestInterval.upsert({ modelType, modelId, days });
}

/** Records a passed test today (the date a tester signs off). */
export async function recordTestPassed(unitId: number, today: string): Promise<void> {
	const [count] = await StockUnit.update({ lastTestedAt: today }, { where: { id: unitId } });
	if (count === 0) throw new DomainError(404, 'No such unit.');
	invalidate(CATALOGUE);
}

export { DUE_SOON_DAYS, addDays };
