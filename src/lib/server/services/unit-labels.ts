/**
 * Unit labels: each unit's serial as a QR code (SVG, drawn on the server) and as text. A label holds
 * only the serial, nothing secret: the scan is checked on the server against the signed-in person.
 */
import QRCode from 'qrcode';
import type { ModelKey } from '$lib/quotes/availability';
import { quoteReference } from '$lib/quotes/reference';
import { AmplifierModel, Booking, BookingLine, BookingUnit, LoudspeakerModel, StockUnit } from '../db';
import { DomainError } from './errors';
import type { ModelType } from '$lib/inventory/types';

export interface UnitLabel {
	serial: string;
	modelName: string;
	/** SVG markup made by the qrcode package from the serial alone (paths only, no text or script). */
	svg: string;
}

async function label(serial: string, modelName: string): Promise<UnitLabel> {
	const svg = await QRCode.toString(serial, { type: 'svg', margin: 2, errorCorrectionLevel: 'M', color: { dark: '#000000', light: '#ffffff' } });
	return { serial, modelName, svg };
}

async function modelNameOf(modelType: ModelType, id: number): Promise<string | null> {
	const model = modelType === 'loudspeaker' ? await LoudspeakerModel.findByPk(id, { attributes: ['name'] }) : await AmplifierModel.findByPk(id, { attributes: ['name'] });
	return model?.name ?? null;
}

export async function labelsForModel(key: ModelKey): Promise<{ title: string; labels: UnitLabel[] }> {
	const [modelType, id] = key.split(':') as [ModelType, string];
	const name = await modelNameOf(modelType, Number(id));
	if (!name) throw new DomainError(404, 'No such model.');
	const column = modelType === 'loudspeaker' ? 'loudspeakerModelId' : 'amplifierModelId';
	const units = await StockUnit.findAll({ where: { [column]: Number(id) }, order: [['serial', 'ASC']] });
	return { title: name, labels: await Promise.all(units.filter((u) => u.status !== 'retired').map((u) => label(u.serial, name))) };
}

/** Labels for the units on a booking; when none are reserved yet, every unit of the models it needs. */
export async function labelsForBooking(bookingId: number): Promise<{ title: string; labels: UnitLabel[] }> {
	const booking = await Booking.findByPk(bookingId);
	if (!booking) throw new DomainError(404, 'No such booking.');
	const rows = await BookingUnit.findAll({ where: { bookingId }, include: [{ model: StockUnit, as: 'unit' }] });
	const title = `Booking ${quoteReference(booking.quoteId)}`;
	if (rows.length) {
		const labels = await Promise.all(
			rows.map(async (r) => {
				const u = (r as BookingUnit & { unit: StockUnit }).unit;
				return label(u.serial, (await modelNameOf(u.modelType, (u.loudspeakerModelId ?? u.amplifierModelId)!)) ?? '');
			})
		);
		return { title, labels: labels.sort((a, b) => a.serial.localeCompare(b.serial)) };
	}
	const lines = await BookingLine.findAll({ where: { bookingId } });
	const perModel = await Promise.all(lines.map((l) => labelsForModel(`${l.modelType}:${l.modelId}`)));
	return { title, labels: perModel.flatMap((m) => m.labels) };
}
