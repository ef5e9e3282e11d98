/** What a technician reads beside each field: a plain label and its unit. */
export const FIELD_LABELS: Record<string, { label: string; unit?: string }> = {
	name: { label: 'Name' },
	maker: { label: 'Maker' },
	kind: { label: 'Kind' },
	sensitivityDb: { label: 'Sensitivity', unit: 'dB' },
	sensitivityRef: { label: 'Sensitivity reference' },
	impedanceOhm: { label: 'Nominal impedance', unit: 'Ω' },
	powerContinuousW: { label: 'Continuous power', unit: 'W' },
	powerPeakW: { label: 'Peak power', unit: 'W' },
	maxSplContinuousDb: { label: 'Max SPL, continuous', unit: 'dB' },
	maxSplPeakDb: { label: 'Max SPL, peak', unit: 'dB' },
	dispersionHDeg: { label: 'Horizontal dispersion', unit: '°' },
	dispersionVDeg: { label: 'Vertical dispersion', unit: '°' },
	lowHz: { label: 'Low frequency limit', unit: 'Hz' },
	highHz: { label: 'High frequency limit', unit: 'Hz' },
	heightM: { label: 'Element height', unit: 'm' },
	bandResponseDb: { label: 'Band response', unit: 'dB re sensitivity' },
	compressionDb: { label: 'Power compression', unit: 'dB' },
	directivity: { label: 'Directivity (polar data)', unit: 'dB re on axis' },
	weightKg: { label: 'Weight', unit: 'kg' },
	dayRateMinor: { label: 'Day rate' },
	replacementValueMinor: { label: 'Replacement value' },
	notes: { label: 'Notes' },
	channels: { label: 'Channels' },
	powerW8: { label: 'Power per channel at 8 Ω', unit: 'W' },
	powerW4: { label: 'Power per channel at 4 Ω', unit: 'W' },
	powerW2: { label: 'Power per channel at 2 Ω', unit: 'W' },
	minLoadOhm: { label: 'Minimum load', unit: 'Ω' },
	rackUnits: { label: 'Rack units', unit: 'U' },
	mainsCurrentAmps: { label: 'Mains current at 1/8 power', unit: 'A' },
	slug: { label: 'Slug' },
	description: { label: 'Description' },
	active: { label: 'Active' },
	groups: { label: 'Groups' },
	serial: { label: 'Serial' },
	status: { label: 'Status' },
	location: { label: 'Location' },
	lastTestedAt: { label: 'Last tested' },
	modelId: { label: 'Model' }
};

export const KIND_LABELS = {
	'full-range': 'Full-range top',
	subwoofer: 'Subwoofer',
	'line-array-element': 'Line-array element',
	monitor: 'Monitor wedge'
} as const;

export const STATUS_LABELS = { ready: 'Ready', 'in-repair': 'In repair', retired: 'Retired' } as const;

export function fieldLabel(field: string): string {
	// A CSV column of one band of an object field: `bandResponseDb.63` → "Band response, 63 Hz (dB re sensitivity)".
	const [prefix, band] = field.split(/\.(.+)/);
	if (band && FIELD_LABELS[prefix] && /^\d+(\.\d+)?$/.test(band)) {
		const { label, unit } = FIELD_LABELS[prefix];
		return `${label}, ${band} Hz${unit ? ` (${unit})` : ''}`;
	}
	const entry = FIELD_LABELS[field];
	if (!entry) return field;
	return entry.unit ? `${entry.label} (${entry.unit})` : entry.label;
}
