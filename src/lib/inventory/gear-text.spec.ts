import { describe, expect, it } from 'vitest';
import { bandResponseText, directivityText, historyValueText } from './gear-text';

describe('gear data in words', () => {
	it('lists bands in frequency order, 31.5 Hz first, with true minus signs', () => {
		expect(bandResponseText({ '63': -3, '31.5': -18, '1000': 0 })).toBe('31.5 Hz −18, 63 Hz −3, 1 kHz 0');
		expect(directivityText({ anglesDeg: [0, 90, 180], bandsDb: { '2000': [0, 9, 20], '31.5': [0, 0.5, 1] } })).toBe('at 0 90 180°; 31.5 Hz: 0 0.5 1; 2 kHz: 0 9 20');
	});

	it('turns stored JSON of the two table fields into words and leaves other values alone', () => {
		expect(historyValueText('directivity', '{"anglesDeg":[0,180],"bandsDb":{"63":[0,3]}}', 'GBP')).toBe('at 0 180°; 63 Hz: 0 3');
		expect(historyValueText('bandResponseDb', '{"63":-4}', 'GBP')).toBe('63 Hz −4');
		expect(historyValueText('sensitivityDb', '96', 'GBP')).toBe('96');
		expect(historyValueText('directivity', null, 'GBP')).toBeNull();
	});
});

describe('labels of the band columns', () => {
	it('shows a change of a money field as money with its currency, never minor units', () => {
		expect(historyValueText('dayRateMinor', '4500', 'GBP')).toBe('£45.00');
		expect(historyValueText('replacementValueMinor', '120000', 'EUR')).toBe('€1,200.00');
		expect(historyValueText('dayRateMinor', null, 'GBP')).toBeNull();
	});

	it('names a band response column by its band', async () => {
		const { fieldLabel } = await import('./labels');
		expect(fieldLabel('bandResponseDb.31.5')).toBe('Band response, 31.5 Hz (dB re sensitivity)');
		expect(fieldLabel('compressionDb')).toBe('Power compression (dB)');
	});
});
