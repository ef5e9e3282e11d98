import type { Sequelize } from 'sequelize';
import { Booking, BookingLine, BookingUnit } from './booking';
import { Client } from './client';
import { CompanySettings } from './company-settings';
import { Invoice, WebhookEvent } from './invoice';
import { OutboundEmail } from './outbound-email';
import { ProgrammeProfile } from './programme-profile';
import { Quote } from './quote';
import { QuoteVersion } from './quote-version';

export { Booking, BookingLine, BookingUnit, CompanySettings, Invoice, OutboundEmail, ProgrammeProfile, Quote, QuoteVersion, WebhookEvent };

/** Registers the quoting side's models (settings, programmes, quotes, bookings, invoices, mail). */
export function initQuotingModels(sequelize: Sequelize): void {
	for (const model of [CompanySettings, ProgrammeProfile, Quote, QuoteVersion, Booking, BookingLine, BookingUnit, OutboundEmail, Invoice, WebhookEvent]) {
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
	Quote.hasMany(Invoice, { foreignKey: 'quoteId', as: 'invoices' });
	Invoice.belongsTo(Quote, { foreignKey: 'quoteId', as: 'quote' });
}
