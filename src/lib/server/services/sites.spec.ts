import { describe, expect, it } from 'vitest';
import { useTestDatabase } from '../../../../tests/helpers/db';
import { makeContactUser, makeStaffUser, makeStockedPackage } from '../../../../tests/helpers/inventory';
import { siteSchema } from '$lib/schemas/sites';
import { DomainError } from './errors';
import { evaluateForDesk } from './evaluations';
import { createQuote, getQuote } from './quotes';
import { createSite, deleteSite, findSite, getSite, listSites, updateSite } from './sites';

useTestDatabase();

// Round test figures, not the demo sites.
const fixture = (name: string) =>
	siteSchema.parse({
		name,
		ground: 'porous',
		aimDeg: 90,
		receivers: [
			{ name: 'North house', x: 0, y: 200, limitDb: 55, weighting: 'A', period: '15 min Leq' },
			{ name: 'East flats', x: 300, y: 0, heightM: 6, limitDb: 70, weighting: 'Z', bandHz: 63 }
		]
	});

const request = {
	targetDb: 90, weighting: 'A' as const, distance: 20, distanceUnit: 'm' as const, programme: 'speech',
	temperatureC: 20, humidityPct: 50, startDate: '2031-07-10', endDate: '2031-07-11'
};

describe('sites', () => {
	it('creates, reads, lists, updates and deletes a site with its receivers in order', async () => {
		const created = await createSite(fixture('Test field A'));
		expect(created.receivers.map((r) => r.name)).toEqual(['North house', 'East flats']);
		expect(created.receivers[1]).toMatchObject({ bandHz: 63, heightM: 6, period: '' });
		expect(created.receivers[0].period).toBe('15 min Leq');
		expect((await getSite(created.id)).ground).toBe('porous');
		expect((await listSites()).find((s) => s.id === created.id)).toMatchObject({ name: 'Test field A', receiverCount: 2 });

		const updated = await updateSite(created.id, { allowanceDb: 3, ground: 'custom', groundFactor: 0.3, receivers: fixture('Test field X').receivers.slice(0, 1) });
		expect(updated).toMatchObject({ allowanceDb: 3, ground: 'custom', groundFactor: 0.3 });
		expect(updated.receivers).toHaveLength(1);

		const hard = await updateSite(created.id, { ground: 'hard' });
		expect(hard.groundFactor).toBeNull();

		await deleteSite(created.id);
		expect(await findSite(created.id)).toBeNull();
		await expect(deleteSite(created.id)).rejects.toBeInstanceOf(DomainError);
	});

	it('refuses a custom ground with no G on update', async () => {
		const site = await createSite(fixture('Test field B'));
		await expect(updateSite(site.id, { ground: 'custom' })).rejects.toMatchObject({ status: 422 });
	});

	it('answers an unknown site in a request as a field error on siteId', async () => {
		await expect(evaluateForDesk({ ...request, siteId: 999_999_999 })).rejects.toMatchObject({ status: 422, errors: { siteId: expect.any(Array) } });
	});

	it('evaluates with the site and gives every result an outcome, limits and receivers', async () => {
		const { pkg } = await makeStockedPackage();
		const site = await createSite(fixture('Test field C'));
		const desk = await evaluateForDesk({ ...request, siteId: site.id }, { packageIds: [pkg.id] });
		expect(desk.site).toMatchObject({ siteId: site.id, name: 'Test field C' });
		expect(desk.request.site).toMatchObject({ aimDeg: 90, groundFactor: 1 });
		const [result] = desk.results;
		expect(['clear', 'tight', 'over-limit', 'short']).toContain(result.outcome);
		expect(result.limits).toHaveProperty('ok');
		expect(Array.isArray(result.receivers)).toBe(true);
		expect(desk.assumptions.some((a) => a.includes('ISO 9613-2'))).toBe(true);
	});

	it('keeps the quote’s snapshot when the site is edited or deleted later', async () => {
		const { pkg } = await makeStockedPackage();
		const staff = await makeStaffUser();
		const { client } = await makeContactUser();
		const site = await createSite(fixture('Test field D'));
		const quote = await createQuote({ clientId: client.id, eventName: 'Site fixture', packageId: pkg.id, request: { ...request, siteId: site.id } }, staff);
		expect(quote.site).toMatchObject({ siteId: site.id, name: 'Test field D', allowanceDb: 0 });

		await updateSite(site.id, { name: 'Renamed field', allowanceDb: 6, receivers: [] });
		const after = await getQuote(quote.id, staff);
		expect(after.site).toMatchObject({ siteId: site.id, name: 'Test field D', allowanceDb: 0 });
		expect(after.site?.receivers).toHaveLength(2);

		await deleteSite(site.id);
		expect((await getQuote(quote.id, staff)).site?.name).toBe('Test field D');
	});
});
