import { randomUUID } from 'node:crypto';
import type { AmplifierInput } from '../../src/lib/schemas/inventory-amplifiers';
import type { LoudspeakerInput } from '../../src/lib/schemas/inventory-loudspeakers';
import { User } from '../../src/lib/server/db/models';
import { uniqueEmail } from './db';

/** A name no other test or seeder uses, so test files can run side by side. */
export function uniqueName(label = 'Test'): string {
	return `${label} ${randomUUID().slice(0, 8)}`;
}

/** A plausible full-range cabinet for the inventory tests (test values, not demo data). */
export function loudspeakerInput(overrides: Partial<LoudspeakerInput> = {}): LoudspeakerInput {
	return {
		name: uniqueName('Cab'),
		maker: 'Test Maker',
		kind: 'full-range',
		sensitivityDb: 96,
		sensitivityRef: '1W',
		impedanceOhm: 8,
		powerContinuousW: 400,
		powerPeakW: 1600,
		maxSplContinuousDb: 122,
		maxSplPeakDb: 128,
		dispersionHDeg: 90,
		dispersionVDeg: 60,
		lowHz: 60,
		highHz: 18000,
		heightM: null,
		weightKg: 20,
		dayRateMinor: 2000,
		replacementValueMinor: 100000,
		notes: '',
		...overrides
	};
}

export function amplifierInput(overrides: Partial<AmplifierInput> = {}): AmplifierInput {
	return {
		name: uniqueName('Amp'),
		maker: 'Test Maker',
		channels: 2,
		powerW8: 800,
		powerW4: 1400,
		powerW2: null,
		minLoadOhm: 4,
		rackUnits: 2,
		weightKg: 10,
		dayRateMinor: 2500,
		replacementValueMinor: 120000,
		mainsCurrentAmps: 3,
		notes: '',
		...overrides
	};
}

/** A warehouse (or admin) account to act as, so the history can name who changed what. */
export async function staffUser(role: 'warehouse' | 'admin' = 'warehouse'): Promise<{ id: number; name: string }> {
	const name = uniqueName('Tech');
	const user = await User.create({ email: uniqueEmail(role), name, role, passwordHash: 'x', clientId: null });
	return { id: user.id, name };
}
