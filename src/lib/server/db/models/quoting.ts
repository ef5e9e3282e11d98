import type { Sequelize } from 'sequelize';
import { Booking, BookingLine, BookingUnit } from './booking';
import { BookingEvent, DamageReport, ModelTestInterval, Repair } from './out-and-back';
import { StockUnit } from './stock-unit';
import { Client } from './client';
import { CompanySettings } from './company-settings';
import { Invoice, WebhookEvent } from './invoice';
import { OutboundEmail } from './outbound-email';
import { ProgrammeProfile } from './programme-profile';
import { Quote } from './quote';
import { QuoteVersion } from './quote-version';

export { Booking, BookingEvent, BookingLine, BookingUnit, DamageReport, ModelTestInterval, Repair, CompanySettings, Invoice, OutboundEmail, ProgrammeProfile, Quote, QuoteVersion, WebhookEvent };

/** Registers the quoting side's models (settings, programmes, quotes, bookings, invoices, mail). */
export function initQuotingModels(sequelize: Sequelize): void {
	for (const model of [CompanySettings, ProgrammeProfile, Quote, QuoteVersion, Booking, BookingLine, BookingUnit, OutboundEmail, Invoice, WebhookEvent, BookingEvent, DamageReport, Repair, ModelTestInterval]) {
		model.initModel(sequelize);
	}
	Quote.belongsTo(Client, { foreignKey: 'clientId', as: 'client' });
	Client.hasMany(Quote, { foreignKey: 'clientId', as: 'quotes' });
	Quote.hasMany(QuoteVersion, { foreignKey: 'quoteId', as: 'versions' });
	QuoteVersion.belongsTo(Quote, { foreignKey: 'quoteId', as: 'quote' });
	Quote.hasOne(Booking, { foreignKey: 'quoteId', as: 'booking' });
	Booking.belongsTo(Quote, { foreignKey: 'quoteId', as: 'quote' });
	Booking.hasMany(BookingLine, { foreignKey: 'bookingId', as: 'lines' });
	BookingLine.belongsTo(Booking, { foreignKey: 'bookingId', as: 'booking' });
	Booking.hasMany(BookingUnit, { foreignKey: 'bookingId', as: 'units' });
	BookingUnit.belongsTo(Booking, { foreignKey: 'bookingId', as: 'booking' });
	BookingUnit.belongsTo(StockUnit, { foreignKey: 'stockUnitId', as: 'unit' });
	Booking.hasMany(BookingEvent, { foreignKey: 'bookingId', as: 'events' });
	Quote.hasMany(Invoice, { foreignKey: 'quoteId', as: 'invoices' });
	Invoice.belongsTo(Quote, { foreignKey: 'quoteId', as: 'quote' });
}
