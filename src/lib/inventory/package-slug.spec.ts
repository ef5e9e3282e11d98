import { describe, expect, it } from 'vitest';
import { packageFields } from '$lib/schemas/inventory-packages';
import { freeSlug, slugFromName } from './package-slug';

describe('slugFromName', () => {
	it('keeps letters and digits, joined by single hyphens, accents dropped', () => {
		expect(slugFromName('Big Top — 2 × 4 Subs')).toBe('big-top-2-4-subs');
		expect(slugFromName('  Fête du Quai!! ')).toBe('fete-du-quai');
	});

	it('falls back when the name has too few letters or digits', () => {
		expect(slugFromName('×', 'package-7')).toBe('package-7');
	});

	it('always passes the package slug rule, even for a long name', () => {
		for (const name of ['A'.repeat(200), 'x-'.repeat(60), 'Rig 1', '—']) {
			expect(packageFields.shape.slug.safeParse(slugFromName(name)).success).toBe(true);
		}
	});
});

describe('freeSlug', () => {
	it('numbers the slug when the plain one is taken', () => {
		expect(freeSlug('rig', new Set())).toBe('rig');
		expect(freeSlug('rig', new Set(['rig', 'rig-2']))).toBe('rig-3');
	});
});
