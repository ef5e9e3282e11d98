/**
 * Kestrel Yard Audio's invented stock. Makers and model names are made up; the figures are plausible
 * for cabinets and amplifiers of each class, not any real product's. Money in pence.
 */
import type { AmplifierInput } from '../../src/lib/schemas/inventory-amplifiers';
import type { LoudspeakerInput } from '../../src/lib/schemas/inventory-loudspeakers';

const BW = 'Brackwater Acoustics';
const OS = 'Ostrel Sound Works';
const TM = 'Tallowmere Electronics';

type Speaker = Omit<LoudspeakerInput, 'notes' | 'powerPeakW' | 'heightM'> & { notes?: string; powerPeakW?: number; heightM?: number | null; code: string; stock: number };
type Amp = Omit<AmplifierInput, 'notes'> & { notes?: string; code: string; stock: number };

export const loudspeakers: Speaker[] = [
	{ code: 'CV5', stock: 4, name: 'Corvel 5 speech top', maker: BW, kind: 'full-range', sensitivityDb: 89, sensitivityRef: '2.83V', impedanceOhm: 8, powerContinuousW: 150, powerPeakW: 600, maxSplContinuousDb: 111, maxSplPeakDb: 117, dispersionHDeg: 100, dispersionVDeg: 70, lowHz: 90, highHz: 20000, weightKg: 6.5, dayRateMinor: 1200, replacementValueMinor: 45000, notes: 'Lectern and small-room speech.' },
	{ code: 'CV8', stock: 4, name: 'Corvel 8 compact top', maker: BW, kind: 'full-range', sensitivityDb: 94, sensitivityRef: '1W', impedanceOhm: 8, powerContinuousW: 250, powerPeakW: 1000, maxSplContinuousDb: 117, maxSplPeakDb: 123, dispersionHDeg: 90, dispersionVDeg: 60, lowHz: 70, highHz: 20000, weightKg: 11, dayRateMinor: 1800, replacementValueMinor: 75000 },
	{ code: 'CV10', stock: 6, name: 'Corvel 10 fill', maker: BW, kind: 'full-range', sensitivityDb: 95, sensitivityRef: '2.83V', impedanceOhm: 8, powerContinuousW: 350, powerPeakW: 1400, maxSplContinuousDb: 120, maxSplPeakDb: 126, dispersionHDeg: 100, dispersionVDeg: 60, lowHz: 60, highHz: 20000, weightKg: 15, dayRateMinor: 2200, replacementValueMinor: 95000, notes: 'Front fill and delay.' },
	{ code: 'MR12', stock: 4, name: 'Marrow 12 two-way top', maker: BW, kind: 'full-range', sensitivityDb: 97, sensitivityRef: '1W', impedanceOhm: 8, powerContinuousW: 500, powerPeakW: 2000, maxSplContinuousDb: 124, maxSplPeakDb: 130, dispersionHDeg: 90, dispersionVDeg: 50, lowHz: 55, highHz: 19000, weightKg: 24, dayRateMinor: 3500, replacementValueMinor: 160000 },
	{ code: 'MR15', stock: 6, name: 'Marrow 15 two-way top', maker: BW, kind: 'full-range', sensitivityDb: 99, sensitivityRef: '1W', impedanceOhm: 8, powerContinuousW: 600, powerPeakW: 2400, maxSplContinuousDb: 126, maxSplPeakDb: 132, dispersionHDeg: 75, dispersionVDeg: 50, lowHz: 45, highHz: 18000, weightKg: 33, dayRateMinor: 4500, replacementValueMinor: 210000 },
	{ code: 'DN18', stock: 6, name: 'Dunlin 18 sub', maker: OS, kind: 'subwoofer', sensitivityDb: 98, sensitivityRef: '1W', impedanceOhm: 8, powerContinuousW: 1000, powerPeakW: 4000, maxSplContinuousDb: 129, maxSplPeakDb: 135, dispersionHDeg: 360, dispersionVDeg: 360, lowHz: 35, highHz: 150, weightKg: 52, dayRateMinor: 4000, replacementValueMinor: 190000 },
	{ code: 'DN218', stock: 14, name: 'Dunlin 2×18 sub', maker: OS, kind: 'subwoofer', sensitivityDb: 102, sensitivityRef: '1W', impedanceOhm: 4, powerContinuousW: 2000, powerPeakW: 8000, maxSplContinuousDb: 135, maxSplPeakDb: 141, dispersionHDeg: 360, dispersionVDeg: 360, lowHz: 30, highHz: 120, weightKg: 98, dayRateMinor: 7500, replacementValueMinor: 380000 },
	{ code: 'TS8', stock: 14, name: 'Tessel 8 line element', maker: OS, kind: 'line-array-element', sensitivityDb: 100, sensitivityRef: '1W', impedanceOhm: 16, powerContinuousW: 400, powerPeakW: 1600, maxSplContinuousDb: 127, maxSplPeakDb: 133, dispersionHDeg: 100, dispersionVDeg: 10, lowHz: 65, highHz: 19000, heightM: 0.27, weightKg: 27, dayRateMinor: 4000, replacementValueMinor: 220000, notes: 'Flies from its own frame; small outdoor and mid-size halls.' },
	{ code: 'TS12', stock: 30, name: 'Tessel 12 line element', maker: OS, kind: 'line-array-element', sensitivityDb: 104, sensitivityRef: '1W', impedanceOhm: 8, powerContinuousW: 1000, powerPeakW: 4000, maxSplContinuousDb: 133, maxSplPeakDb: 139, dispersionHDeg: 90, dispersionVDeg: 10, lowHz: 50, highHz: 18000, heightM: 0.38, weightKg: 62, dayRateMinor: 8500, replacementValueMinor: 480000, notes: 'Festival main hangs.' },
	{ code: 'LW12', stock: 4, name: 'Lowen 12 wedge', maker: BW, kind: 'monitor', sensitivityDb: 98, sensitivityRef: '1W', impedanceOhm: 8, powerContinuousW: 450, powerPeakW: 1800, maxSplContinuousDb: 125, maxSplPeakDb: 131, dispersionHDeg: 60, dispersionVDeg: 40, lowHz: 60, highHz: 19000, weightKg: 21, dayRateMinor: 2500, replacementValueMinor: 110000 },
	{ code: 'LW15', stock: 6, name: 'Lowen 15 wedge', maker: BW, kind: 'monitor', sensitivityDb: 100, sensitivityRef: '1W', impedanceOhm: 8, powerContinuousW: 600, powerPeakW: 2400, maxSplContinuousDb: 128, maxSplPeakDb: 134, dispersionHDeg: 50, dispersionVDeg: 40, lowHz: 50, highHz: 18000, weightKg: 30, dayRateMinor: 3000, replacementValueMinor: 140000 }
];

export const amplifiers: Amp[] = [
	{ code: 'D12', stock: 4, name: 'Duo 1200', maker: TM, channels: 2, powerW8: 350, powerW4: 600, powerW2: null, minLoadOhm: 4, rackUnits: 1, weightKg: 6, dayRateMinor: 1500, replacementValueMinor: 60000, mainsCurrentAmps: 1.8 },
	{ code: 'D30', stock: 4, name: 'Duo 3000', maker: TM, channels: 2, powerW8: 900, powerW4: 1500, powerW2: 2200, minLoadOhm: 2, rackUnits: 2, weightKg: 12, dayRateMinor: 3000, replacementValueMinor: 150000, mainsCurrentAmps: 3.5 },
	{ code: 'Q20', stock: 3, name: 'Fourway 2000', maker: TM, channels: 4, powerW8: 1000, powerW4: 2000, powerW2: null, minLoadOhm: 4, rackUnits: 2, weightKg: 14, dayRateMinor: 3500, replacementValueMinor: 280000, mainsCurrentAmps: 5.2 },
	{ code: 'Q50', stock: 6, name: 'Fourway 5000', maker: TM, channels: 4, powerW8: 2500, powerW4: 4500, powerW2: 5000, minLoadOhm: 2, rackUnits: 2, weightKg: 19, dayRateMinor: 6000, replacementValueMinor: 450000, mainsCurrentAmps: 8.5, notes: 'Line-array and sub racks.' }
];

/** Groups name models by code; every load stays at or above the amplifier's minimum. */
type Group = { speaker: string; count: number; stacks: number; amp: string; cabinetsPerChannel: number; flown?: boolean };

export const packages: { name: string; slug: string; description: string; groups: Group[] }[] = [
	{ name: 'Speech kit, small', slug: 'speech-small', description: 'Two compact tops on stands for speeches, ceremonies and small rooms.', groups: [{ speaker: 'CV5', count: 1, stacks: 2, amp: 'D12', cabinetsPerChannel: 1 }] },
	{ name: 'Acoustic stage', slug: 'acoustic-stage', description: 'Tops and a sub each side with two wedges, for acoustic acts and school events.', groups: [
		{ speaker: 'MR12', count: 1, stacks: 2, amp: 'D12', cabinetsPerChannel: 1 },
		{ speaker: 'DN18', count: 1, stacks: 2, amp: 'D30', cabinetsPerChannel: 1 },
		{ speaker: 'LW12', count: 2, stacks: 1, amp: 'D12', cabinetsPerChannel: 1 }
	] },
	{ name: 'Band PA, medium', slug: 'band-medium', description: 'Ground-stacked two-way tops and 18" subs with four wedges.', groups: [
		{ speaker: 'MR15', count: 2, stacks: 2, amp: 'D30', cabinetsPerChannel: 2 },
		{ speaker: 'DN18', count: 2, stacks: 2, amp: 'D30', cabinetsPerChannel: 2 },
		{ speaker: 'LW15', count: 4, stacks: 1, amp: 'Q20', cabinetsPerChannel: 1 }
	] },
	{ name: 'Club rig', slug: 'club-rig', description: 'Two-way tops over dual-18 subs for dance nights.', groups: [
		{ speaker: 'MR15', count: 2, stacks: 2, amp: 'Q50', cabinetsPerChannel: 1 },
		{ speaker: 'DN218', count: 2, stacks: 2, amp: 'Q50', cabinetsPerChannel: 1 }
	] },
	{ name: 'Line array, small', slug: 'line-array-small', description: 'Two flown hangs of six small elements with ground subs.', groups: [
		{ speaker: 'TS8', count: 6, stacks: 2, amp: 'Q20', cabinetsPerChannel: 3, flown: true },
		{ speaker: 'DN18', count: 2, stacks: 2, amp: 'D30', cabinetsPerChannel: 2 }
	] },
	{ name: 'Line array, large', slug: 'line-array-large', description: 'Two flown hangs of twelve large elements, dual-18 sub blocks and front fills.', groups: [
		{ speaker: 'TS12', count: 12, stacks: 2, amp: 'Q50', cabinetsPerChannel: 3, flown: true },
		{ speaker: 'DN218', count: 6, stacks: 2, amp: 'Q50', cabinetsPerChannel: 1 },
		{ speaker: 'CV10', count: 4, stacks: 1, amp: 'Q20', cabinetsPerChannel: 1 }
	] }
];
