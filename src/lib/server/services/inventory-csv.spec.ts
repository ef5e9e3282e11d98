import { describe, expect, it, vi } from 'vitest';
import { LOUDSPEAKER_CSV_COLUMNS, serialiseCsv } from '$lib/inventory/csv';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { loudspeakerInput, staffUser, uniqueName } from '../../../../tests/helpers/inventory-inputs';
import { LoudspeakerModel } from '../db/models';
import { DomainError } from './errors';
import { applyImport, previewImport } from './inventory-csv';
import { listHistory } from './inventory-history';
import { loudspeakers } from './inventory-loudspeakers';

useTestDatabase();

describe('CSV import of loudspeaker models', () => {
	it('previews per row: new, update (with the fields it changes), unchanged, invalid', async () => {
		const existing = await loudspeakers.create(loudspeakerInput(), null);
		const same = await loudspeakers.create(loudspeakerInput(), null);
		const text = serialiseCsv(
			[loudspeakerInput(), { ...existing, sensitivityDb: 99 }, same, loudspeakerInput({ lowHz: 5 })],
			LOUDSPEAKER_CSV_COLUMNS,
			'GBP'
		);
		const preview = await previewImport('loudspeakers', text);
		expect(preview.valid).toBe(false);
		expect(preview.rows.map((r) => [r.row, r.action, r.changes])).toEqual([
			[2, 'create', []],
			[3, 'update', [{ field: 'sensitivityDb', from: String(existing.sensitivityDb), to: '99' }]],
			[4, 'unchanged', []],
			[5, 'invalid', []]
		]);
		expect(preview.rows[3].errors).toHaveProperty('lowHz');
	});

	it('applies all rows in one transaction: creates new ones, updates matches with spec history', async () => {
		const tech = await staffUser();
		const existing = await loudspeakers.create(loudspeakerInput({ sensitivityDb: 95 }), null);
		const fresh = loudspeakerInput();
		const text = serialiseCsv([fresh, { ...existing, sensitivityDb: 96.5 }], LOUDSPEAKER_CSV_COLUMNS, 'GBP');
		expect(await applyImport('loudspeakers', text, tech.id)).toEqual({ created: 1, updated: 1, unchanged: 0 });
		expect((await loudspeakers.get(existing.id)).sensitivityDb).toBe(96.5);
		expect(await loudspeakers.findByNameAndMaker(fresh.name, fresh.maker)).not.toBeNull();
		const change = (await listHistory('loudspeaker', existing.id)).find((h) => h.field === 'sensitivityDb');
		expect(change).toMatchObject({ oldValue: '95', newValue: '96.5', userId: tech.id });
	});

	it('one bad row leaves the database exactly as it was', async () => {
		const existing = await loudspeakers.create(loudspeakerInput({ weightKg: 20 }), null);
		const newName = uniqueName('Never');
		const before = await LoudspeakerModel.count();
		const text = serialiseCsv(
			[{ ...existing, weightKg: 22 }, loudspeakerInput({ name: newName }), loudspeakerInput({ kind: 'line-array-element', heightM: null })],
			LOUDSPEAKER_CSV_COLUMNS,
			'GBP'
		);
		await expect(applyImport('loudspeakers', text, null)).rejects.toMatchObject({ status: 422, errors: { '4.heightM': expect.any(Array) } });
		expect(await LoudspeakerModel.count()).toBe(before);
		expect((await loudspeakers.get(existing.id)).weightKg).toBe(20);
		expect(await loudspeakers.findByNameAndMaker(newName, 'Test Maker')).toBeNull();
		expect(await listHistory('loudspeaker', existing.id)).toHaveLength(1);
	});

	it('a row refused while writing rolls back the rows already written', async () => {
		const a = await loudspeakers.create(loudspeakerInput({ weightKg: 20 }), null);
		const create = vi.spyOn(loudspeakers, 'create').mockRejectedValueOnce(new DomainError(409, 'Refused for the test.'));
		const text = serialiseCsv([{ ...a, weightKg: 30 }, loudspeakerInput()], LOUDSPEAKER_CSV_COLUMNS, 'GBP');
		await expect(applyImport('loudspeakers', text, null)).rejects.toMatchObject({ status: 422, errors: { '3._': ['Refused for the test.'] } });
		create.mockRestore();
		expect((await loudspeakers.get(a.id)).weightKg).toBe(20);
	});
});
