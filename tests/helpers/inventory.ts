/**
 * Minimal stock for database tests: one loudspeaker model, one amplifier model, a package and a
 * number of ready units, with round textbook-like figures (not the demo catalogue). Names are
 * unique per call so test files can run side by side.
 */
import { randomUUID } from 'node:crypto';
import { AmplifierModel, Client, LoudspeakerModel, Package, PackageGroup, StockUnit, User } from '../../src/lib/server/db/models';
import { hashPassword } from '../../src/lib/server/auth/password';
import type { SessionUser } from '../../src/lib/server/auth/signed-in-user';
import { CATALOGUE, invalidate } from '../../src/lib/server/cache';

export async function makeStockedPackage(options: { cabinets?: number; units?: number; amplifierUnits?: number } = {}) {
	const tag = randomUUID().slice(0, 8);
	const cabinets = options.cabinets ?? 2;
	const loudspeaker = await LoudspeakerModel.create({
		name: `Fixture top ${tag}`, maker: 'Fixture', kind: 'full-range', sensitivityDb: 100, sensitivityRef: '1W',
		impedanceOhm: 8, powerContinuousW: 500, powerPeakW: 2000, maxSplContinuousDb: null, maxSplPeakDb: null,
		dispersionHDeg: 90, dispersionVDeg: 40, lowHz: 50, highHz: 18000, heightM: null, weightKg: 30,
		dayRateMinor: 4000, replacementValueMinor: 100000, notes: ''
	} as never);
	const amplifier = await AmplifierModel.create({
		name: `Fixture amp ${tag}`, maker: 'Fixture', channels: 2, powerW8: 1000, powerW4: 1600, powerW2: null,
		minLoadOhm: 4, rackUnits: 2, weightKg: 12, dayRateMinor: 5000, replacementValueMinor: 200000,
		mainsCurrentAmps: 3, notes: ''
	} as never);
	const pkg = await Package.create({ name: `Fixture package ${tag}`, slug: `fixture-${tag}`, description: 'test', active: true });
	await PackageGroup.create({
		packageId: pkg.id, position: 0, loudspeakerModelId: loudspeaker.id, count: cabinets, stacks: 1,
		amplifierModelId: amplifier.id, cabinetsPerChannel: 1, flown: false
	} as never);
	const units = options.units ?? cabinets;
	for (let i = 0; i < units; i++) {
		await StockUnit.create({ serial: `FX-${tag}-${i}`, modelType: 'loudspeaker', loudspeakerModelId: loudspeaker.id, amplifierModelId: null, status: 'ready', location: 'Bay 1', lastTestedAt: null, notes: '' } as never);
	}
	for (let i = 0; i < (options.amplifierUnits ?? 1); i++) {
		await StockUnit.create({ serial: `FXA-${tag}-${i}`, modelType: 'amplifier', loudspeakerModelId: null, amplifierModelId: amplifier.id, status: 'ready', location: 'Rack', lastTestedAt: null, notes: '' } as never);
	}
	invalidate(CATALOGUE); // rows written directly, past the services that normally drop the cache
	return { loudspeaker, amplifier, pkg, tag };
}

export async function makeContactUser(): Promise<{ client: Client; user: SessionUser }> {
	const tag = randomUUID().slice(0, 8);
	const client = await Client.create({ name: `Organiser ${tag}`, contactName: 'Pat Test', email: `org-${tag}@example.test` });
	const row = await User.create({ email: `org-${tag}@example.test`, name: 'Pat Test', role: 'client', clientId: client.id, passwordHash: await hashPassword('x-password-123') });
	return { client, user: { id: row.id, role: 'client', clientId: client.id, name: row.name, email: row.email } };
}

export async function makeStaffUser(role: 'sales' | 'admin' = 'sales'): Promise<SessionUser> {
	const tag = randomUUID().slice(0, 8);
	const row = await User.create({ email: `${role}-${tag}@example.test`, name: 'Desk Test', role, passwordHash: await hashPassword('x-password-123') });
	return { id: row.id, role, clientId: null, name: row.name, email: row.email };
}
