import { describe, expect, it } from 'vitest';
import { safeRedirectPath } from './safe-redirect';

describe('safeRedirectPath', () => {
	it('keeps same-site paths with their query and fragment', () => {
		expect(safeRedirectPath('/quotes/4')).toBe('/quotes/4');
		expect(safeRedirectPath('/quotes?status=sent&page=2')).toBe('/quotes?status=sent&page=2');
		expect(safeRedirectPath('/inventory/units#scan')).toBe('/inventory/units#scan');
		expect(safeRedirectPath('/')).toBe('/');
	});

	it.each([
		['protocol-relative', '//evil.example'],
		['protocol-relative with a path', '//evil.example/quotes'],
		['backslash', '/\\evil.example'],
		['backslash later', '/\\/evil.example'],
		['tab after the slash', '/\t/evil.example/'],
		['newline after the slash', '/\n/evil.example'],
		['carriage return and newline', '/\r\n/evil.example'],
		['header splitting', '/quotes\r\nSet-Cookie: x=1'],
		['a NUL byte', '/quotes\u0000'],
		['javascript URL', 'javascript:alert(1)'],
		['javascript URL behind a slash-less scheme', 'JaVaScRiPt:alert(1)'],
		['data URL', 'data:text/html,<script>alert(1)</script>'],
		['absolute http URL', 'http://evil.example/'],
		['absolute https URL', 'https://evil.example/quotes'],
		['credentials trick', 'https://127.0.0.1@evil.example'],
		['relative path', 'quotes/4'],
		['dot path', '../evil'],
		['three slashes', '///evil.example'],
		['empty', ''],
		['a very long path', `/${'a'.repeat(3000)}`]
	])('refuses %s', (_label, target) => {
		expect(safeRedirectPath(target)).toBe('/');
	});

	it('refuses anything that is not a string', () => {
		expect(safeRedirectPath(null)).toBe('/');
		expect(safeRedirectPath(undefined)).toBe('/');
	});

	it('what it returns always resolves to the same origin', () => {
		for (const target of ['/a/../../b', '/%2F%2Fevil.example', '/.//evil.example', '/..//evil.example']) {
			const base = 'https://throwline.test';
			expect(new URL(safeRedirectPath(target), base).origin).toBe(base);
		}
	});
});
