import { describe, expect, it, vi } from 'vitest';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { amplifierInput, loudspeakerInput, staffUser, uniqueName } from '../../../../tests/helpers/inventory-inputs';
import { StockUnit } from '../db/models';
import { amplifiers } from './inventory-amplifiers';
import { listHistory } from './inventory-history';
import { loudspeakers } from './inventory-loudspeakers';
import { createPackage } from './inventory-packages';
import * as recheck from './recheck';

useTestDatabase();

describe('loudspeaker models', () => {
	it('creates a model with numbers coming back as numbers, and notes who created it', async () => {
		const tech = await staffUser();
		const row = await loudspeakers.create(loudspeakerInput({ sensitivityDb: 97.5 }), tech.id);
		expect(row.id).toBeGreaterThan(0);
		const fetched = await loudspeakers.get(row.id);
		expect(fetched.sensitivityDb).toBe(97.5);
		expect(fetched.heightM).toBeNull();
		const history = await listHistory('loudspeaker', row.id);
		expect(history).toMatchObject([{ field: 'created', userId: tech.id, userName: tech.name }]);
	});

	it('an update writes one history entry per changed field: who, old → new', async () => {
		const tech = await staffUser();
		const row = await loudspeakers.create(loudspeakerInput({ sensitivityDb: 96, weightKg: 20 }), tech.id);
		const { changed } = await loudspeakers.update(row.id, { sensitivityDb: 98.5, weightKg: 21.5, notes: '' }, tech.id);
		expect(changed.sort()).toEqual(['sensitivityDb', 'weightKg']);
		const history = await listHistory('loudspeaker', row.id);
		const byField = Object.fromEntries(history.map((h) => [h.field, h]));
		expect(byField.sensitivityDb).toMatchObject({ oldValue: '96', newValue: '98.5', userId: tech.id, userName: tech.name });
		expect(byField.weightKg).toMatchObject({ oldValue: '20', newValue: '21.5' });
		expect(new Date(byField.sensitivityDb.createdAt).getTime()).toBeGreaterThan(Date.now() - 60_000);
	});

	it('flags open quotes when an acoustic field changes, not when only the day rate does', async () => {
		const spy = vi.spyOn(recheck, 'flagQuotesForSpecChange');
		const row = await loudspeakers.create(loudspeakerInput(), null);
		await loudspeakers.update(row.id, { dayRateMinor: 2100 }, null);
		expect(spy).not.toHaveBeenCalled();
		await loudspeakers.update(row.id, { maxSplPeakDb: 130 }, null);
		expect(spy).toHaveBeenCalledWith('loudspeaker', row.id, expect.anything());
		spy.mockRestore();
	});

	it('re-checks the merged record: a patch that breaks lowHz < highHz is a 422 on highHz and changes nothing', async () => {
		const row = await loudspeakers.create(loudspeakerInput({ lowHz: 60, highHz: 18000 }), null);
		await expect(loudspeakers.update(row.id, { lowHz: 900, highHz: 800 }, null)).rejects.toMatchObject({
			status: 422,
			errors: { highHz: expect.any(Array) }
		});
		expect((await loudspeakers.get(row.id)).lowHz).toBe(60);
		expect(await listHistory('loudspeaker', row.id)).toHaveLength(1);
	});

	it('refuses a second model with the same name and maker (409)', async () => {
		const input = loudspeakerInput();
		await loudspeakers.create(input, null);
		await expect(loudspeakers.create(input, null)).rejects.toMatchObject({ status: 409, errors: { name: expect.any(Array) } });
	});

	it('delete is refused (409) while a package or a stock unit uses the model, then allowed', async () => {
		const speaker = await loudspeakers.create(loudspeakerInput(), null);
		const amp = await amplifiers.create(amplifierInput(), null);
		await createPackage(
			{ name: uniqueName('Pkg'), slug: uniqueName('pkg').toLowerCase().replace(/\s+/g, '-'), description: '', active: true, groups: [{ loudspeakerModelId: speaker.id, amplifierModelId: amp.id, count: 2, stacks: 1, cabinetsPerChannel: 1, flown: false }] },
			null
		);
		await expect(loudspeakers.remove(speaker.id)).rejects.toMatchObject({ status: 409 });
		await expect(amplifiers.remove(amp.id)).rejects.toMatchObject({ status: 409 });

		const lonely = await loudspeakers.create(loudspeakerInput(), null);
		const unit = await StockUnit.create({ serial: uniqueName('SN').replace(' ', '-'), modelType: 'loudspeaker', loudspeakerModelId: lonely.id, amplifierModelId: null, status: 'ready', location: '', lastTestedAt: null, notes: '' });
		await expect(loudspeakers.remove(lonely.id)).rejects.toMatchObject({ status: 409 });
		await unit.destroy();
		await loudspeakers.remove(lonely.id);
		await expect(loudspeakers.get(lonely.id)).rejects.toMatchObject({ status: 404 });
	});

	it('unknown id is 404', async () => {
		await expect(loudspeakers.update(999_999_999, { weightKg: 3 }, null)).rejects.toMatchObject({ status: 404 });
	});
});
