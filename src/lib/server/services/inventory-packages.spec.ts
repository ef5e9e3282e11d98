import { describe, expect, it } from 'vitest';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { amplifierInput, loudspeakerInput, staffUser, uniqueName } from '../../../../tests/helpers/inventory-inputs';
import { amplifiers } from './inventory-amplifiers';
import { listHistory } from './inventory-history';
import { loudspeakers } from './inventory-loudspeakers';
import { createPackage, getLoadedPackage, updatePackage } from './inventory-packages';

useTestDatabase();

const slug = () => uniqueName('pkg').toLowerCase().replace(/\s+/g, '-');

async function models() {
	const top = await loudspeakers.create(loudspeakerInput({ impedanceOhm: 8 }), null);
	const amp = await amplifiers.create(amplifierInput({ channels: 2, minLoadOhm: 4, powerW2: null }), null);
	return { top, amp };
}

describe('packages', () => {
	it('creates a package with its groups in order and loads them with their models', async () => {
		const { top, amp } = await models();
		const created = await createPackage(
			{ name: uniqueName('Kit'), slug: slug(), description: '', active: true, groups: [{ loudspeakerModelId: top.id, amplifierModelId: amp.id, count: 2, stacks: 2, cabinetsPerChannel: 2, flown: false }] },
			null
		);
		expect(created.groups).toHaveLength(1);
		const loaded = await getLoadedPackage(created.id);
		expect(loaded.groups[0].loudspeaker.id).toBe(top.id);
		expect(loaded.groups[0].amplifier.minLoadOhm).toBe(4);
	});

	it('refuses a channel plan whose parallel load is below the amplifier minimum, per field', async () => {
		const { top, amp } = await models();
		const input = {
			name: uniqueName('Kit'),
			slug: slug(),
			description: '',
			active: true,
			groups: [
				{ loudspeakerModelId: top.id, amplifierModelId: amp.id, count: 2, stacks: 1, cabinetsPerChannel: 1, flown: false },
				{ loudspeakerModelId: top.id, amplifierModelId: amp.id, count: 3, stacks: 1, cabinetsPerChannel: 3, flown: false }
			]
		};
		await expect(createPackage(input, null)).rejects.toMatchObject({
			status: 422,
			errors: { 'groups.1.cabinetsPerChannel': [expect.stringMatching(/2\.67 Ω, below the 4 Ω minimum/)] }
		});
	});

	it('refuses unknown models and more cabinets per channel than the group has', async () => {
		const { top } = await models();
		const input = { name: uniqueName('Kit'), slug: slug(), description: '', active: true, groups: [{ loudspeakerModelId: top.id, amplifierModelId: 999_999_999, count: 2, stacks: 1, cabinetsPerChannel: 1, flown: false }] };
		await expect(createPackage(input, null)).rejects.toMatchObject({ status: 422, errors: { 'groups.0.amplifierModelId': expect.any(Array) } });
		const tooMany = { ...input, groups: [{ ...input.groups[0], count: 1, cabinetsPerChannel: 2 }] };
		await expect(createPackage(tooMany, null)).rejects.toMatchObject({ status: 422, errors: { 'groups.0.cabinetsPerChannel': expect.any(Array) } });
	});

	it('an update that replaces the groups records the old and new channel plan and who changed it', async () => {
		const tech = await staffUser();
		const { top, amp } = await models();
		const group = { loudspeakerModelId: top.id, amplifierModelId: amp.id, count: 2, stacks: 2, cabinetsPerChannel: 1, flown: false };
		const pkg = await createPackage({ name: uniqueName('Kit'), slug: slug(), description: '', active: true, groups: [group] }, null);
		const updated = await updatePackage(pkg.id, { groups: [{ ...group, cabinetsPerChannel: 2 }], active: false }, tech.id);
		expect(updated.groups[0].cabinetsPerChannel).toBe(2);
		const history = await listHistory('package', pkg.id);
		expect(history.find((h) => h.field === 'groups')).toMatchObject({ userId: tech.id, oldValue: expect.stringContaining('1 per channel'), newValue: expect.stringContaining('2 per channel') });
		expect(history.find((h) => h.field === 'active')).toMatchObject({ oldValue: 'true', newValue: 'false' });
	});

	it('refuses a second package with the same slug (409 on slug)', async () => {
		const { top, amp } = await models();
		const input = { name: uniqueName('Kit'), slug: slug(), description: '', active: true, groups: [{ loudspeakerModelId: top.id, amplifierModelId: amp.id, count: 1, stacks: 1, cabinetsPerChannel: 1, flown: false }] };
		await createPackage(input, null);
		await expect(createPackage(input, null)).rejects.toMatchObject({ status: 409, errors: { slug: expect.any(Array) } });
	});
});
