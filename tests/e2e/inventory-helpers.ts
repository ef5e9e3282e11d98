import { randomUUID } from 'node:crypto';
import { BASE_URL } from './browser';
import { api } from './http';

/** A plain request that keeps redirects visible, for walking pages and form actions by role. */
export async function visit(
	path: string,
	{ cookie, method = 'GET', form }: { cookie?: string; method?: string; form?: Record<string, string> } = {}
): Promise<{ status: number; location: string | null }> {
	const response = await fetch(`${BASE_URL}${path}`, {
		method,
		redirect: 'manual',
		headers: {
			accept: 'text/html',
			...(cookie ? { cookie } : {}),
			...(form ? { origin: BASE_URL, 'content-type': 'application/x-www-form-urlencoded' } : {})
		},
		body: form ? new URLSearchParams(form) : undefined
	});
	await response.arrayBuffer();
	return { status: response.status, location: response.headers.get('location') };
}

export const tag = () => randomUUID().slice(0, 8);

export function loudspeakerBody(overrides: Record<string, unknown> = {}) {
	return {
		name: `E2E cab ${tag()}`,
		maker: 'E2E Maker',
		kind: 'full-range',
		sensitivityDb: 96,
		sensitivityRef: '1W',
		impedanceOhm: 8,
		powerContinuousW: 400,
		dispersionHDeg: 90,
		dispersionVDeg: 60,
		lowHz: 60,
		highHz: 18000,
		weightKg: 20,
		dayRateMinor: 2000,
		replacementValueMinor: 100000,
		...overrides
	};
}

export function amplifierBody(overrides: Record<string, unknown> = {}) {
	return {
		name: `E2E amp ${tag()}`,
		maker: 'E2E Maker',
		channels: 2,
		powerW8: 800,
		powerW4: 1400,
		minLoadOhm: 4,
		rackUnits: 2,
		weightKg: 10,
		dayRateMinor: 2500,
		replacementValueMinor: 120000,
		mainsCurrentAmps: 3,
		...overrides
	};
}

/** One loudspeaker, one amplifier, a package and a unit made through the API, for routes that need ids. */
export async function makeFixtures(adminCookie: string) {
	const speaker = await api('/api/loudspeakers', { cookie: adminCookie, method: 'POST', body: loudspeakerBody() });
	const amp = await api('/api/amplifiers', { cookie: adminCookie, method: 'POST', body: amplifierBody() });
	const pkg = await api('/api/packages', {
		cookie: adminCookie,
		method: 'POST',
		body: { name: `E2E kit ${tag()}`, slug: `e2e-kit-${tag()}`, groups: [{ loudspeakerModelId: speaker.json.id, amplifierModelId: amp.json.id, count: 2, stacks: 2, cabinetsPerChannel: 1 }] }
	});
	const unit = await api('/api/stock-units', { cookie: adminCookie, method: 'POST', body: { serial: `E2E-${tag()}`, modelType: 'loudspeaker', modelId: speaker.json.id } });
	for (const made of [speaker, amp, pkg, unit]) if (made.status !== 201) throw new Error(`fixture failed: ${JSON.stringify(made.json)}`);
	return { speakerId: speaker.json.id as number, ampId: amp.json.id as number, packageId: pkg.json.id as number, unitId: unit.json.id as number };
}
