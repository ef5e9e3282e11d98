import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { throttleLinkRequest } from './throttle';

describe('link request throttle', () => {
	it('lets three requests for one e-mail through in an hour, then holds the fourth', async () => {
		const email = `${randomUUID()}@example.test`;
		for (let i = 0; i < 3; i++) {
			expect(await throttleLinkRequest(`net-${randomUUID()}`, email)).toEqual({ ok: true });
		}
		const fourth = await throttleLinkRequest(`net-${randomUUID()}`, email.toUpperCase());
		expect(fourth).toMatchObject({ ok: false, who: 'email' });
	});

	it('holds the 31st request from one network address in 15 minutes, whatever the e-mails', async () => {
		const network = `net-${randomUUID()}`;
		for (let i = 0; i < 30; i++) {
			expect((await throttleLinkRequest(network, `${randomUUID()}@example.test`)).ok).toBe(true);
		}
		const next = await throttleLinkRequest(network, `${randomUUID()}@example.test`);
		expect(next).toMatchObject({ ok: false, who: 'network' });
		if (!next.ok) expect(next.retryAfterS).toBeGreaterThan(0);
	});
});
