/**
 * Property-based bad input against every JSON API route, the CSV imports and the attachment
 * uploads, each as a role allowed to call it. Whatever arrives, the answer is a refusal (400, 401,
 * 403, 404, 409, 413, 415, 422) in the one error envelope — never a 5xx, never a stack trace — and
 * the database is the same afterwards.
 *
 * The expected status is worked out from the same shared schemas the routes use (proof/oracle.ts),
 * so the check is exact: unreadable → 400, too large → 413, well-formed but invalid → 422. A body
 * the schema would accept is not hostile: on create routes it is skipped, and routes with an id
 * are aimed at an id that does not exist, so even a valid body changes nothing.
 *
 * Bodies over the server's own BODY_SIZE_LIMIT (adapter-node, 11 MB in the test world) get its
 * 413 before any route runs; hooks.server.ts handleError gives it the same envelope
 * (`{ message: 'The body is too large.' }`). A server may answer an oversize upload before it has
 * read it and close the connection; the client can then see a reset instead of the 413. That is
 * accepted only for bodies over a limit, and each request has its own connection (proof/raw-http.ts).
 */
import { existsSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import type { z } from 'zod';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AMPLIFIER_CSV_COLUMNS, LOUDSPEAKER_CSV_COLUMNS } from '../../src/lib/inventory/csv';
import { amplifierPatchSchema, amplifierSchema } from '../../src/lib/schemas/inventory-amplifiers';
import {
	loudspeakerPatchSchema,
	loudspeakerSchema
} from '../../src/lib/schemas/inventory-loudspeakers';
import { packagePatchSchema, packageSchema } from '../../src/lib/schemas/inventory-packages';
import { stockUnitPatchSchema, stockUnitSchema } from '../../src/lib/schemas/inventory-units';
import { repairSchema, scanSchema } from '../../src/lib/schemas/bookings';
import { quoteRequestSchema } from '../../src/lib/schemas/evaluation';
import { quoteRequestWithSystemSchema, promoteSchema } from '../../src/lib/schemas/systems';
import {
	quoteActionSchema,
	quoteCreateSchema,
	quoteReviseSchema
} from '../../src/lib/schemas/quotes';
import { userCreateSchema, userUpdateSchema } from '../../src/lib/schemas/users';
import { clientSchema, clientUpdateSchema } from '../../src/lib/schemas/clients';
import { linkRequestSchema } from '../../src/lib/schemas/access';
import { QueryTypes } from 'sequelize';
import { useTestDatabase } from '../helpers/db';
import { BASE_URL } from './browser';
import { api } from './http';
import { fieldsOf, hostileCsvBody, hostileJsonBody, type HostileBody } from './proof/hostile';
import {
	makeInventoryFixtures,
	makeThrowaway,
	removeThrowaways,
	TINY_PDF,
	uploadAttachment,
	type InventoryFixtures
} from './proof/inventory';
import { csvVerdict, envelopeProblem, jsonVerdict, REFUSALS } from './proof/oracle';
import { signInEveryone, type Role, type Sessions } from './proof/people';
import { rawRequest, type RawAnswer } from './proof/raw-http';
import { differences, snapshot, type Snapshot } from './proof/snapshot';
import { siteSchema, siteUpdateSchema } from '../../src/lib/schemas/sites';
import { discoverEntryPoints } from './proof/routes';
import { hostileUploads, multipartBody, type HostileUpload } from './proof/uploads';

/** An id no row has: valid bodies sent to it can only be refused (404), never applied. */
const ABSENT_ID = 4294967295;
const RUNS_PER_ROUTE = 40;

type Target =
	| { as: Role; body: 'json'; schema: z.ZodType }
	| { as: Role; body: 'csv'; columns: readonly string[]; schema: z.ZodType }
	| { as: Role; body: 'multipart' }
	| { as: Role; body: 'ignored'; status: number };

/** Every API route that takes a body, the role that may call it, and the schema that judges it. */
const TARGETS: Record<string, Target> = {
	'POST /api/users': { as: 'admin', body: 'json', schema: userCreateSchema },
	'PATCH /api/users/[id=id]': { as: 'admin', body: 'json', schema: userUpdateSchema },
	'POST /api/evaluations': { as: 'sales', body: 'json', schema: quoteRequestWithSystemSchema },
	'POST /api/suggestions': { as: 'sales', body: 'json', schema: quoteRequestSchema },
	'POST /api/clients': { as: 'sales', body: 'json', schema: clientSchema },
	'PATCH /api/clients/[id=id]': { as: 'sales', body: 'json', schema: clientUpdateSchema },
	// Open to the signed-out: asking for a link is how they get back in.
	'POST /api/sign-in-links': { as: 'out', body: 'json', schema: linkRequestSchema },
	'POST /api/password-resets': { as: 'out', body: 'json', schema: linkRequestSchema },
	'POST /api/sites': { as: 'sales', body: 'json', schema: siteSchema },
	'PUT /api/sites/[id=id]': { as: 'sales', body: 'json', schema: siteSchema },
	'PATCH /api/sites/[id=id]': { as: 'sales', body: 'json', schema: siteUpdateSchema },
	'POST /api/loudspeakers': { as: 'warehouse', body: 'json', schema: loudspeakerSchema },
	'PATCH /api/loudspeakers/[id=id]': {
		as: 'warehouse',
		body: 'json',
		schema: loudspeakerPatchSchema
	},
	'POST /api/amplifiers': { as: 'warehouse', body: 'json', schema: amplifierSchema },
	'PATCH /api/amplifiers/[id=id]': { as: 'warehouse', body: 'json', schema: amplifierPatchSchema },
	'POST /api/packages': { as: 'warehouse', body: 'json', schema: packageSchema },
	'PATCH /api/packages/[id=id]': { as: 'warehouse', body: 'json', schema: packagePatchSchema },
	'POST /api/stock-units': { as: 'warehouse', body: 'json', schema: stockUnitSchema },
	'PATCH /api/stock-units/[id=id]': { as: 'warehouse', body: 'json', schema: stockUnitPatchSchema },
	'POST /api/quotes': { as: 'sales', body: 'json', schema: quoteCreateSchema },
	'PATCH /api/quotes/[id=id]': { as: 'sales', body: 'json', schema: quoteReviseSchema },
	'POST /api/quotes/[id=id]/actions': { as: 'sales', body: 'json', schema: quoteActionSchema },
	'POST /api/quotes/[id=id]/package': { as: 'warehouse', body: 'json', schema: promoteSchema },
	'POST /api/bookings/[id=id]/dispatch': { as: 'warehouse', body: 'json', schema: scanSchema },
	'POST /api/bookings/[id=id]/return': { as: 'warehouse', body: 'json', schema: scanSchema },
	'POST /api/stock-units/[id=id]/repairs': { as: 'warehouse', body: 'json', schema: repairSchema },
	'POST /api/quotes/[id=id]/balance-invoice': { as: 'sales', body: 'ignored', status: 404 }, // no such quote
	'POST /api/webhooks/stripe': { as: 'out', body: 'ignored', status: 400 }, // no signature, whatever the body
	'POST /api/loudspeakers/import': {
		as: 'warehouse',
		body: 'csv',
		columns: LOUDSPEAKER_CSV_COLUMNS,
		schema: loudspeakerSchema
	},
	'POST /api/amplifiers/import': {
		as: 'warehouse',
		body: 'csv',
		columns: AMPLIFIER_CSV_COLUMNS,
		schema: amplifierSchema
	},
	'POST /api/loudspeakers/[id=id]/directivity.csv': { as: 'warehouse', body: 'ignored', status: 404 }, // no such model; its CSV checks are in gear-data-api
	'POST /api/loudspeakers/[id=id]/attachments': { as: 'warehouse', body: 'multipart' },
	'POST /api/amplifiers/[id=id]/attachments': { as: 'warehouse', body: 'multipart' }
};

let sessions: Sessions;
let fixtures: InventoryFixtures;
let before: Snapshot;
let tried = 0;
const sequelize = useTestDatabase();

/** Uploaded files live in the database (stored_files): their names, to see nothing was added. */
async function storedFileNames(): Promise<string[]> {
	const rows = await sequelize.query<{ name: string }>('SELECT name FROM stored_files ORDER BY name', {
		type: QueryTypes.SELECT
	});
	return rows.map((r) => r.name);
}

const throwaways: { kind: 'loudspeaker' | 'attachment'; id: number }[] = [];

beforeAll(async () => {
	sessions = await signInEveryone();
	fixtures = await makeInventoryFixtures(sessions.admin!);
	before = await snapshot(sessions.admin!);
}, 60_000);

afterAll(async () => {
	console.log(`hostile input: ${tried} hostile requests tried`);
	if (sessions?.admin) await removeThrowaways(throwaways, sessions.admin);
});

/** Attachments go to the suite's own models (the upload checks run there); every other id is absent. */
function urlOf(route: string): string {
	const model = route.startsWith('/api/amplifiers/') ? fixtures.ampId : fixtures.speakerId;
	return route.replace('[id=id]', String(route.endsWith('/attachments') ? model : ABSENT_ID));
}

async function send(
	method: string,
	url: string,
	as: Role,
	contentType: string | null,
	bytes: Buffer
): Promise<RawAnswer> {
	tried++;
	const headers: Record<string, string> = { origin: BASE_URL, accept: 'application/json' };
	if (contentType) headers['content-type'] = contentType;
	const cookie = sessions[as];
	if (cookie) headers.cookie = cookie;
	return rawRequest(method, url, headers, bytes);
}

/** Throws (for fast-check to report) unless the answer is the expected refusal in the envelope. */
function judge(
	what: string,
	answer: RawAnswer,
	expected: readonly number[],
	oversize: boolean
): void {
	if (answer.reset) {
		if (oversize) return; // refused before it was read; see the note at the top
		throw new Error(`${what}: connection ${answer.reset} with no answer`);
	}
	if (
		!(REFUSALS as readonly number[]).includes(answer.status) ||
		!expected.includes(answer.status)
	) {
		throw new Error(
			`${what}: ${answer.status}, wanted ${expected.join(' or ')}: ${answer.text.slice(0, 300)}`
		);
	}
	const problem = envelopeProblem(answer);
	if (problem) throw new Error(`${what}: ${answer.status} ${problem}`);
}

const VALID_ON_ABSENT_ID = [403, 404, 409];

describe('hostile input', () => {
	const bodyRoutes = discoverEntryPoints().filter(
		(e) =>
			e.kind === 'endpoint' &&
			e.route.startsWith('/api/') &&
			['POST', 'PATCH', 'PUT'].includes(e.method)
	);

	it('knows every API route that takes a body', () => {
		const found = bodyRoutes.map((e) => e.key);
		const missing = found.filter((k) => !(k in TARGETS)).map((k) => `add a target for ${k}`);
		const stale = Object.keys(TARGETS)
			.filter((k) => !found.includes(k))
			.map((k) => `no route for the target ${k}`);
		expect([...missing, ...stale]).toEqual([]);
	});

	it('refuses hostile JSON bodies on every route with 4xx and the error envelope', async () => {
		for (const entry of bodyRoutes) {
			const target = TARGETS[entry.key];
			if (!target || target.body === 'csv') continue; // the imports have their own property below
			const schema = target.body === 'json' ? target.schema : null;
			const url = urlOf(entry.route);
			await fc.assert(
				fc.asyncProperty(
					hostileJsonBody(schema ? fieldsOf(schema) : []),
					async (b: HostileBody) => {
						let expected: readonly number[];
						if (target.body === 'json') {
							const verdict = jsonVerdict(b, target.schema);
							if (verdict === 'valid') {
								fc.pre(entry.route.includes('[id=id]')); // a valid create body is not hostile: skipped
								expected = VALID_ON_ABSENT_ID;
							} else expected = [verdict];
						} else if (target.body === 'ignored') expected = [target.status];
						else expected = (b.contentType ?? '').startsWith('multipart/') ? [400, 422] : [400];
						const answer = await send(entry.method, url, target.as, b.contentType, b.bytes);
						judge(`${entry.key} with ${b.label}`, answer, expected, b.bytes.length > 256 * 1024);
					}
				),
				{ numRuns: RUNS_PER_ROUTE, endOnFailure: true }
			);
		}
	}, 600_000);

	it('refuses hostile CSV files on both imports, importing nothing', async () => {
		for (const [key, target] of Object.entries(TARGETS)) {
			if (target.body !== 'csv') continue;
			const route = key.split(' ')[1];
			await fc.assert(
				fc.asyncProperty(hostileCsvBody(target.columns), async (b: HostileBody) => {
					const verdict = csvVerdict(b, target.columns, target.schema);
					fc.pre(verdict !== 'valid'); // a file that would import is not hostile
					const answer = await send('POST', route, target.as, b.contentType, b.bytes);
					judge(
						`${key} with ${b.label}`,
						answer,
						[verdict as number],
						b.bytes.length > 1024 * 1024
					);
				}),
				{ numRuns: RUNS_PER_ROUTE, endOnFailure: true }
			);
		}
	}, 300_000);

	it('refuses hostile uploads and stores nothing', async () => {
		const filesBefore = await storedFileNames();
		for (const model of ['loudspeakers', 'amplifiers'] as const) {
			const id = model === 'loudspeakers' ? fixtures.speakerId : fixtures.ampId;
			const listUrl = `/api/${model}/${id}/attachments`;
			const listBefore = await api(listUrl, { cookie: sessions.admin });
			const check = async (u: HostileUpload) => {
				const { contentType, bytes } = multipartBody(u);
				const answer = await send('POST', listUrl, 'warehouse', contentType, bytes);
				judge(`upload to ${model} of ${u.label}`, answer, u.expected, u.oversize);
			};
			for (const u of hostileUploads.fixed()) await check(u);
			await fc.assert(fc.asyncProperty(hostileUploads.arbitrary, check), {
				numRuns: 30,
				endOnFailure: true
			});
			expect(await api(listUrl, { cookie: sessions.admin })).toEqual(listBefore);
		}
		expect(await storedFileNames()).toEqual(filesBefore);
	}, 300_000);

	it("answers a body over the server's own limit with 413 in the envelope", async () => {
		// The webhook reads the body before anything else looks at its size, so adapter-node's limit answers.
		const huge = Buffer.alloc(12 * 1024 * 1024, 0x20);
		tried++;
		const answer = await rawRequest(
			'POST',
			'/api/webhooks/stripe',
			{
				'content-type': 'application/json',
				'stripe-signature': 't=1,v1=00',
				accept: 'application/json'
			},
			huge
		);
		judge('12 MB to the webhook', answer, [413], true);
		if (!answer.reset) expect(JSON.parse(answer.text).message).toMatch(/too large/i);
	});

	it('leaves the database as it found it', async () => {
		expect(differences(before, await snapshot(sessions.admin!))).toEqual([]);
	});

	it('keeps a genuine PDF with a path in its name, under a generated name inside the upload folder', async () => {
		const model = await makeThrowaway('loudspeaker', sessions.admin!, fixtures);
		throwaways.push({ kind: 'loudspeaker', id: model });
		const uploadDir = path.resolve(process.env.UPLOAD_DIR ?? '.data/test/uploads');
		for (const name of [
			'../../etc/passwd.pdf',
			'..\\..\\boot.ini.pdf',
			'/tmp/../proof-escape.pdf'
		]) {
			tried++;
			const stored = await uploadAttachment(sessions.warehouse!, `/api/loudspeakers/${model}`, {
				bytes: TINY_PDF,
				name
			});
			expect(stored.status).toBe(201);
			throwaways.push({ kind: 'attachment', id: stored.json.id });
			expect(stored.json.originalName).not.toMatch(/[\\/]|^\./);
		}
		for (const escaped of [
			'../../etc/passwd.pdf',
			'../proof-escape.pdf',
			'../../proof-escape.pdf'
		]) {
			expect(existsSync(path.resolve(uploadDir, escaped))).toBe(false);
		}
		expect(
			(await storedFileNames()).filter((f) => !/^[0-9a-f-]{36}\.(pdf|jpg|png|webp)$/.test(f))
		).toEqual([]);
	});
});
