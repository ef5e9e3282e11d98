/** The letterhead logo: checked like every upload, served for the print view, drawn into the PDF. */
import { PDFParse } from 'pdf-parse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sentQuoteForNewClient, ADMIN, SALES } from '../helpers/deal';
import { useTestDatabase } from '../helpers/db';
import { BASE_URL } from './browser';
import { sessionCookie } from './http';

useTestDatabase();
// A 1 × 1 PNG (the smallest valid image).
const PNG = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==', 'base64');
let admin: string;

async function upload(bytes: Buffer, name: string, type: string): Promise<{ status: number; text: string }> {
	const form = new FormData();
	form.set('logo', new Blob([new Uint8Array(bytes)], { type }), name);
	const response = await fetch(`${BASE_URL}/admin/settings/logo?/upload`, {
		method: 'POST',
		headers: { cookie: admin, origin: BASE_URL, accept: 'text/html' },
		body: form
	});
	return { status: response.status, text: await response.text() };
}

beforeAll(async () => {
	admin = await sessionCookie(ADMIN);
});
afterAll(async () => {
	// Leave the world without a logo, as the route matrix expects.
	await fetch(`${BASE_URL}/admin/settings/logo?/remove`, {
		method: 'POST',
		headers: { cookie: admin, origin: BASE_URL, accept: 'text/html', 'content-type': 'application/x-www-form-urlencoded' },
		body: ''
	});
});

describe('the letterhead logo', () => {
	it('refuses a file that is not a PNG or JPEG, whatever its name', async () => {
		const refused = await upload(Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>'), 'logo.png', 'image/png');
		expect(refused.status).toBe(422);
		expect(refused.text).toContain('not a PNG or JPEG');
		expect((await fetch(`${BASE_URL}/api/company-logo`, { headers: { cookie: admin } })).status).toBe(404);
	});

	it('keeps a PNG, serves it to those who read quotes, and the PDF still renders with it', async () => {
		expect((await upload(PNG, 'logo.png', 'image/png')).status).toBe(200);
		const served = await fetch(`${BASE_URL}/api/company-logo`, { headers: { cookie: await sessionCookie(SALES) } });
		expect(served.status).toBe(200);
		expect(served.headers.get('content-type')).toBe('image/png');
		expect(Buffer.from(await served.arrayBuffer()).equals(PNG)).toBe(true);

		const { id } = await sentQuoteForNewClient('Letterhead');
		const pdf = await fetch(`${BASE_URL}/api/quotes/${id}/document`, { headers: { cookie: admin } });
		expect(pdf.status).toBe(200);
		const text = (await new PDFParse({ data: new Uint8Array(await pdf.arrayBuffer()) }).getText()).text;
		expect(text).toContain('Quote Q-');
		const print = await (await fetch(`${BASE_URL}/quotes/${id}/print`, { headers: { cookie: admin, accept: 'text/html' } })).text();
		expect(print).toContain('src="/api/company-logo"');
	});
});
