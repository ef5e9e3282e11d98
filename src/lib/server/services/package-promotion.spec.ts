import { describe, expect, it } from 'vitest';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { makeContactUser, makeStaffUser, makeStockedPackage } from '../../../../tests/helpers/inventory';
import { getLoadedPackage } from './inventory-packages';
import { promoteSystem } from './package-promotion';
import { createQuote } from './quotes';

useTestDatabase();

const request = {
	targetDb: 85, weighting: 'A' as const, distance: 10, distanceUnit: 'm' as const, programme: 'speech',
	temperatureC: 20, humidityPct: 50, startDate: '2031-11-10', endDate: '2031-11-11'
};

// A round-figure rear-rejecting group pattern, not a product's data.
const rearRejecting = { anglesDeg: [0, 90, 180], bandsDb: { '63': [0, 6, 20] } };

async function quoteWith(offer: 'system' | 'package', directivity?: typeof rearRejecting) {
	const desk = await makeStaffUser();
	const { client } = await makeContactUser();
	const stock = await makeStockedPackage({ cabinets: 4, units: 4, amplifierUnits: 2 });
	const system = { groups: [{ loudspeakerModelId: stock.loudspeaker.id, count: 2, stacks: 2, amplifierModelId: stock.amplifier.id, cabinetsPerChannel: 2, spacingM: 8, ...(directivity ? { directivity } : {}) }] };
	const quote = await createQuote(
		{ clientId: client.id, eventName: 'Promotion fixture', request, ...(offer === 'system' ? { system } : { packageId: stock.pkg.id }) },
		desk
	);
	return { quote, desk, stock };
}

describe('promoting a quote’s system to a package', () => {
	it('creates a package with the same groups, placement filled in as the quote evaluated them', async () => {
		const { quote, desk, stock } = await quoteWith('system');
		const name = `Promoted ${stock.tag}`;
		const row = await promoteSystem(quote.id, { name, description: '' }, desk.id);
		expect(row.name).toBe(name);
		expect(row.slug).toBe(`promoted-${stock.tag}`);
		const pkg = await getLoadedPackage(row.id);
		expect(pkg.groups).toEqual([
			expect.objectContaining({ loudspeakerModelId: stock.loudspeaker.id, count: 2, stacks: 2, cabinetsPerChannel: 2, spacingM: 8, heightM: 2.5, flown: false })
		]);
	});

	it('keeps a suggested group’s pattern on the package’s group', async () => {
		const { quote, desk, stock } = await quoteWith('system', rearRejecting);
		const row = await promoteSystem(quote.id, { name: `Patterned ${stock.tag}`, description: '' }, desk.id);
		const pkg = await getLoadedPackage(row.id);
		expect(pkg.groups[0].directivity).toEqual(rearRejecting);
	});

	it('refuses a name already in use, whatever its case, with a field error (409)', async () => {
		const { quote, desk, stock } = await quoteWith('system');
		await expect(promoteSystem(quote.id, { name: stock.pkg.name.toUpperCase(), description: '' }, desk.id)).rejects.toMatchObject({
			status: 409,
			errors: { name: ['Another package already has this name'] }
		});
	});

	it('refuses a quote that offers a package (409) and an unknown quote (404)', async () => {
		const { quote, desk, stock } = await quoteWith('package');
		await expect(promoteSystem(quote.id, { name: `Nope ${stock.tag}`, description: '' }, desk.id)).rejects.toMatchObject({ status: 409 });
		await expect(promoteSystem(99_999_999, { name: `Nope ${stock.tag}`, description: '' }, desk.id)).rejects.toMatchObject({ status: 404 });
	});

	it('refuses an empty name (422 on name)', async () => {
		const { quote, desk } = await quoteWith('system');
		await expect(promoteSystem(quote.id, { name: '  ', description: '' }, desk.id)).rejects.toMatchObject({ status: 422, errors: { name: expect.any(Array) } });
	});
});
