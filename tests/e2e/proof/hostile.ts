/**
 * Hostile request bodies for the API, as fast-check arbitraries: wrong types, extreme numbers,
 * number-like strings, injection snippets, nested junk, huge strings, broken UTF-8, raw text that
 * is not quite JSON, and the wrong content types.
 */
import fc from 'fast-check';
import { z } from 'zod';

export const ONE_MB = 1024 * 1024;

export const HOSTILE_STRINGS = [
	"'; DROP TABLE users; --",
	"1' OR '1'='1",
	'<script>alert(1)</script>',
	'"><img src=x onerror=alert(1)>',
	'NaN',
	'Infinity',
	'-Infinity',
	'1e308',
	'-1e308',
	'0x1F',
	'12abc',
	'',
	'   ',
	'\u0000',
	'\u202eevil',
	'\ud800',
	'=HYPERLINK("http://evil.test")',
	'../../etc/passwd',
	'${7*7}{{7*7}}',
	'__proto__',
	'null',
	'true',
	'💥'.repeat(300)
] as const;

export const HOSTILE_NUMBERS = [
	1e308,
	-1e308,
	Number.MAX_SAFE_INTEGER + 2,
	-Number.MAX_SAFE_INTEGER,
	5e-324,
	-0,
	4294967296,
	-1,
	0,
	0.5
] as const;

const hostileScalar: fc.Arbitrary<unknown> = fc.oneof(
	{ weight: 4, arbitrary: fc.constantFrom<unknown>(...HOSTILE_STRINGS) },
	{ weight: 3, arbitrary: fc.constantFrom<unknown>(...HOSTILE_NUMBERS) },
	{ weight: 1, arbitrary: fc.constantFrom<unknown>(null, true, false) },
	{ weight: 2, arbitrary: fc.string({ unit: 'grapheme', maxLength: 40 }) },
	{ weight: 1, arbitrary: fc.double() },
	{ weight: 1, arbitrary: fc.integer() }
);

/** Any JSON-ish value: scalars, arrays and objects of them, a few levels deep. */
export const hostileValue: fc.Arbitrary<unknown> = fc.letrec<{ value: unknown }>((tie) => ({
	value: fc.oneof(
		{ depthSize: 'small', withCrossShrink: true },
		hostileScalar,
		fc.array(tie('value'), { maxLength: 4 }),
		fc.dictionary(
			fc.oneof(
				fc.string({ maxLength: 8 }),
				fc.constantFrom('__proto__', 'constructor', 'prototype')
			),
			tie('value'),
			{ maxKeys: 4 }
		)
	)
})).value;

/** The field names a route's schema knows, so the junk lands where validation has to look. */
export function fieldsOf(schema: z.ZodType): string[] {
	return schema instanceof z.ZodObject ? Object.keys(schema.shape) : [];
}

export interface HostileBody {
	label: string;
	contentType: string | null;
	bytes: Buffer;
	/** The bytes as the server decodes them (UTF-8, bad sequences replaced, a leading BOM dropped). */
	text: string;
}

const CONTENT_TYPES = [
	'application/json',
	'application/json; charset=utf-8',
	'APPLICATION/JSON',
	'text/plain',
	'text/csv',
	'application/x-www-form-urlencoded',
	'multipart/form-data; boundary=proof',
	'application/xml',
	null
] as const;

function body(label: string, contentType: string | null, bytes: Buffer): HostileBody {
	const text = new TextDecoder().decode(bytes);
	// fast-check prints a failing case with this, instead of a megabyte of buffer.
	const describe = () =>
		`${label} (${contentType ?? 'no content type'}, ${bytes.length} bytes): ${JSON.stringify(text.slice(0, 160))}`;
	return { label, contentType, bytes, text, [fc.toStringMethod]: describe } as HostileBody;
}

const json = (value: unknown) => Buffer.from(JSON.stringify(value) ?? 'null');

/** Text that is almost JSON, or JSON that JavaScript reads in surprising ways. */
const RAW_TEXTS = [
	'',
	'{',
	'{"a":1,}',
	"{'a':1}",
	'{"targetDb": 1e999}',
	'{"a": NaN}',
	'[1, 2',
	'null',
	'"just a string"',
	'{"__proto__": {"role": "admin", "isAdmin": true}}',
	'{"a":1}{"b":2}',
	'\ufeff{"a":1}',
	'{"a":"\\ud800"}',
	'{"email":"x@y.test","email":"y@z.test"}'
];

/** JSON-shaped bodies for a route with these fields. */
export function hostileJsonBody(fields: string[]): fc.Arbitrary<HostileBody> {
	const keys = fields.length ? fc.constantFrom(...fields) : fc.string({ maxLength: 8 });
	const poisoned = fc
		.tuple(
			fc.dictionary(keys, hostileValue, { minKeys: 1, maxKeys: Math.max(1, fields.length) }),
			fc.dictionary(fc.string({ maxLength: 6 }), hostileValue, { maxKeys: 2 })
		)
		.map(([known, extra]) =>
			body('fields with hostile values', 'application/json', json({ ...extra, ...known }))
		);
	const topLevel = fc
		.oneof(hostileScalar, fc.array(hostileValue, { maxLength: 5 }))
		.map((v) => body('not an object', 'application/json', json(v)));
	const raw = fc
		.constantFrom(...RAW_TEXTS)
		.map((t) => body('almost JSON', 'application/json', Buffer.from(t)));
	const deep = fc.integer({ min: 50, max: 20_000 }).map((depth) => {
		const key = fields[0] ?? 'a';
		return body(
			`nested ${depth} deep`,
			'application/json',
			Buffer.from(`{"${key}":${'['.repeat(depth)}${']'.repeat(depth)}}`)
		);
	});
	const huge = fc
		.constantFrom(...(fields.length ? fields : ['a']))
		.map((key) => body('a 1 MB string', 'application/json', json({ [key]: 'x'.repeat(ONE_MB) })));
	const brokenUtf8 = fc
		.constantFrom(...(fields.length ? fields : ['a']))
		.chain((key) => fc.uint8Array({ minLength: 1, maxLength: 12 }).map((junk) => ({ key, junk })))
		.map(({ key, junk }) =>
			body(
				'broken UTF-8',
				'application/json',
				Buffer.concat([
					Buffer.from(`{"${key}":"`),
					Buffer.from([0xff, 0xfe, 0xc0, 0xaf]),
					Buffer.from(junk.map((b) => b | 0x80)),
					Buffer.from('"}')
				])
			)
		);
	const wrongType = fc
		.tuple(
			fc.constantFrom(
				...CONTENT_TYPES.filter(
					(t) => t === null || !t.toLowerCase().startsWith('application/json')
				)
			),
			hostileValue
		)
		.map(([type, v]) => body(`sent as ${type ?? 'no content type'}`, type, json(v)));
	return fc.oneof(
		{ weight: 8, arbitrary: poisoned },
		{ weight: 2, arbitrary: topLevel },
		{ weight: 2, arbitrary: raw },
		{ weight: 1, arbitrary: deep },
		{ weight: 1, arbitrary: huge },
		{ weight: 1, arbitrary: brokenUtf8 },
		{ weight: 2, arbitrary: wrongType }
	);
}

/** CSV files for the model imports: the real header with hostile cells, or no proper header at all. */
export function hostileCsvBody(columns: readonly string[]): fc.Arbitrary<HostileBody> {
	const cell = fc.oneof(
		fc.constantFrom(
			...HOSTILE_STRINGS,
			"=cmd|' /C calc'!A0",
			'@SUM(1+1)',
			'+1',
			'-1',
			'"quoted, with comma"',
			'"unbalanced'
		),
		fc.constantFrom(...HOSTILE_NUMBERS).map(String),
		fc.string({ maxLength: 20 })
	);
	const quote = (c: string) =>
		/[",\r\n]/.test(c) && !c.startsWith('"') ? `"${c.replace(/"/g, '""')}"` : c;
	const rows = fc.array(fc.array(cell, { minLength: columns.length, maxLength: columns.length }), {
		minLength: 1,
		maxLength: 6
	});
	const withHeader = rows.map((r) =>
		body(
			'hostile cells',
			'text/csv',
			Buffer.from([columns.join(','), ...r.map((cells) => cells.map(quote).join(','))].join('\r\n'))
		)
	);
	const badHeader = fc
		.tuple(fc.array(cell, { minLength: 1, maxLength: 5 }), rows)
		.map(([header, r]) =>
			body(
				'a header of junk',
				'text/plain',
				Buffer.from(
					[header.map(quote).join(','), ...r.map((cells) => cells.map(quote).join(','))].join('\n')
				)
			)
		);
	const headerOnly = fc.constant(
		body('a header and no rows', 'text/csv', Buffer.from(columns.join(',')))
	);
	const huge = fc.constant(
		body(
			'more than 1 MB',
			'text/csv',
			Buffer.from(`${columns.join(',')}\r\n${'x'.repeat(ONE_MB + 10)}`)
		)
	);
	const binary = fc
		.uint8Array({ minLength: 1, maxLength: 2000 })
		.map((b) => body('binary bytes', 'text/csv', Buffer.from(b)));
	const wrongType = fc
		.constantFrom('application/json', 'application/xml', null)
		.map((t) => body(`sent as ${t ?? 'no content type'}`, t, Buffer.from(columns.join(','))));
	return fc.oneof(
		{ weight: 6, arbitrary: withHeader },
		{ weight: 2, arbitrary: badHeader },
		{ weight: 1, arbitrary: headerOnly },
		{ weight: 1, arbitrary: huge },
		{ weight: 2, arbitrary: binary },
		{ weight: 1, arbitrary: wrongType }
	);
}
