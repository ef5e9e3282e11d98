/** Gathers one model's stock, bookings, late units and open quotes for the availability calendar. */
import { Op, QueryTypes } from 'sequelize';
import { calendarWeeks, weekStartsBetween, type CalendarWeek } from '$lib/bookings/calendar';
import { HOLDING_STATES, type BookingState } from '$lib/bookings/states';
import type { ModelKey } from '$lib/quotes/availability';
import { quoteReference } from '$lib/quotes/reference';
import { AmplifierModel, Booking, BookingLine, BookingUnit, LoudspeakerModel, Quote, QuoteVersion, StockUnit } from '../db';
import { DomainError } from './errors';
import type { ModelType } from '$lib/inventory/types';

export interface ModelCalendar {
	model: ModelKey;
	name: string;
	weeks: CalendarWeek[];
}

const OPEN_QUOTE_STATUSES = ['draft', 'sent', 'accepted', 'deposit-paid'] as const;

export async function calendarModels(): Promise<{ key: ModelKey; name: string }[]> {
	const [speakers, amps] = await Promise.all([
		LoudspeakerModel.findAll({ attributes: ['id', 'name'], order: [['name', 'ASC']] }),
		AmplifierModel.findAll({ attributes: ['id', 'name'], order: [['name', 'ASC']] })
	]);
	return [
		...speakers.map((m) => ({ key: `loudspeaker:${m.id}` as ModelKey, name: m.name })),
		...amps.map((m) => ({ key: `amplifier:${m.id}` as ModelKey, name: m.name }))
	];
}

export async function modelCalendar(model: ModelKey, from: string, to: string, today: string): Promise<ModelCalendar> {
	const [modelType, idText] = model.split(':') as [ModelType, string];
	const modelId = Number(idText);
	const found = modelType === 'loudspeaker' ? await LoudspeakerModel.findByPk(modelId) : await AmplifierModel.findByPk(modelId);
	if (!found) throw new DomainError(404, 'No such model.', { model: ['No such model.'] });
	const column = modelType === 'loudspeaker' ? 'loudspeakerModelId' : 'amplifierModelId';
	const weekStarts = weekStartsBetween(from, to);
	const rangeEnd = weekStarts.length ? weekStarts[weekStarts.length - 1] : to;

	const [inService, inRepair, lines, late, versions] = await Promise.all([
		StockUnit.count({ where: { [column]: modelId, status: { [Op.ne]: 'retired' } } }),
		StockUnit.count({ where: { [column]: modelId, status: 'in-repair' } }),
		BookingLine.findAll({
			where: { modelType, modelId },
			include: [{ model: Booking, as: 'booking', where: { status: HOLDING_STATES as BookingState[], startDate: { [Op.lte]: `${rangeEnd}` }, endDate: { [Op.gte]: weekStarts[0] ?? from } } }]
		}),
		StockUnit.sequelize!.query<{ endDate: string }>(
			`SELECT b.endDate FROM booking_units bu JOIN bookings b ON b.id = bu.bookingId JOIN stock_units s ON s.id = bu.stockUnitId
			  WHERE s.${column} = :modelId AND bu.dispatchedAt IS NOT NULL AND bu.returnedAt IS NULL AND b.endDate < :today`,
			{ type: QueryTypes.SELECT, replacements: { modelId, today } }
		),
		QuoteVersion.findAll({
			include: [{ model: Quote, as: 'quote', where: { status: OPEN_QUOTE_STATUSES as unknown as string[] }, attributes: ['id', 'currentVersion'] }],
			where: { startDate: { [Op.lte]: rangeEnd }, endDate: { [Op.gte]: weekStarts[0] ?? from } }
		})
	]);
	const bookingIds = lines.map((l) => l.bookingId);
	const outRows = await BookingUnit.findAll({
		where: { bookingId: bookingIds, dispatchedAt: { [Op.ne]: null }, returnedAt: null },
		include: [{ model: StockUnit, as: 'unit', where: { [column]: modelId }, attributes: ['id'] }]
	});
	const bookings = lines.map((l) => {
		const b = (l as BookingLine & { booking: Booking }).booking;
		return { reference: quoteReference(b.quoteId), startDate: b.startDate, endDate: b.endDate, needed: l.quantity, out: outRows.filter((r) => r.bookingId === b.id).length };
	});
	const openQuotes = versions
		.filter((v) => v.version === (v as QuoteVersion & { quote: Quote }).quote.currentVersion)
		.map((v) => {
			const bom = v.evaluation.billOfMaterials;
			const needed = (modelType === 'loudspeaker' ? bom.loudspeakers : bom.amplifiers).filter((l) => l.modelId === modelId).reduce((s, l) => s + l.count, 0);
			return { reference: quoteReference(v.quoteId), startDate: v.startDate, endDate: v.endDate, needed };
		})
		.filter((q) => q.needed > 0);
	return { model, name: found.name, weeks: calendarWeeks({ weekStarts, today, inService, inRepair, bookings, late, openQuotes }) };
}
