/** A spec sheet uploaded through one process is served, byte for byte, by the other. */
import { describe, expect, it } from 'vitest';
import { call, PROCESS_A, PROCESS_B, signIn, WAREHOUSE } from './cluster';

describe('uploads across processes', () => {
	it('stored via process A, read via process B', async () => {
		const warehouse = await signIn(WAREHOUSE);
		const models = await call(PROCESS_A, '/api/loudspeakers', { cookie: warehouse });
		expect(models.status).toBe(200);
		const modelId = (models.json as { id: number }[])[0].id;

		const bytes = Buffer.concat([Buffer.from('%PDF-1.7\n'), Buffer.from(Array.from({ length: 300_000 }, (_, i) => (i * 7) % 256))]);
		const form = new FormData();
		form.set('kind', 'spec-sheet');
		form.set('file', new Blob([bytes], { type: 'application/pdf' }), 'cluster-sheet.pdf');
		const stored = await call(PROCESS_A, `/api/loudspeakers/${modelId}/attachments`, { cookie: warehouse, method: 'POST', form });
		expect(stored.status, stored.text).toBe(201);

		const read = await call(PROCESS_B, `/api/attachments/${stored.json.id}`, { cookie: warehouse });
		expect(read.status).toBe(200);
		expect(read.bytes.equals(bytes)).toBe(true);
	});
});
