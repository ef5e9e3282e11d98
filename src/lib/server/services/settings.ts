import type { SettingsInput } from '$lib/schemas/programmes';
import type { PriceSettings } from '$lib/quotes/pricing';
import { cached } from '../cache';
import { bumpStamp } from '../cache-stamps';
import { CompanySettings } from '../db/models';

export interface Settings {
	companyName: string;
	currency: string;
	taxRateBp: number;
	depositBp: number;
	pricingRule: PriceSettings['rule'];
	defaultMarginDb: number;
	distanceUnit: 'm' | 'ft';
	paymentTermsDays: number;
	cancellationFullRefundDays: number;
	/** Days between electrical safety tests for models without their own interval. */
	testIntervalDays: number;
	quoteValidityDays: number;
	companyAddress: string | null;
	companyTaxNumber: string | null;
	companyContact: string | null;
	salesDeskEmail: string | null;
	logoFile: string | null;
}

// Used until an admin saves settings (a fresh install before seeding).
const DEFAULTS: Settings = {
	companyName: 'Our hire company',
	currency: 'GBP',
	taxRateBp: 2000,
	depositBp: 3000,
	pricingRule: 'daily',
	defaultMarginDb: 3,
	distanceUnit: 'm',
	paymentTermsDays: 14,
	cancellationFullRefundDays: 28,
	testIntervalDays: 365,
	quoteValidityDays: 30,
	companyAddress: null,
	companyTaxNumber: null,
	companyContact: null,
	salesDeskEmail: null,
	logoFile: null
};

export function getSettings(): Promise<Settings> {
	return cached('settings', loadSettings);
}

async function loadSettings(): Promise<Settings> {
	const row = await CompanySettings.findByPk(1);
	if (!row) return { ...DEFAULTS };
	const { id: _id, createdAt: _c, updatedAt: _u, ...settings } = row.get({ plain: true });
	return settings;
}

export async function updateSettings(input: SettingsInput): Promise<Settings> {
	const { taxRatePct, depositPct, companyAddress, companyTaxNumber, companyContact, salesDeskEmail, ...rest } = input;
	const values = {
		...rest,
		taxRateBp: Math.round(taxRatePct * 100),
		depositBp: Math.round(depositPct * 100),
		companyAddress: companyAddress || null,
		companyTaxNumber: companyTaxNumber || null,
		companyContact: companyContact || null,
		salesDeskEmail: salesDeskEmail || null
	};
	await CompanySettings.sequelize!.transaction(async (transaction) => {
		await CompanySettings.upsert({ id: 1, ...values }, { transaction });
		await bumpStamp('settings', transaction);
	});
	return getSettings();
}

export function priceSettingsOf(settings: Settings): PriceSettings {
	return {
		rule: settings.pricingRule,
		taxRateBp: settings.taxRateBp,
		depositBp: settings.depositBp,
		currency: settings.currency
	};
}

/** The form shows percentages; the database keeps basis points. */
export function settingsForForm(settings: Settings): SettingsInput {
	const { taxRateBp, depositBp, logoFile: _logo, companyAddress, companyTaxNumber, companyContact, salesDeskEmail, ...rest } = settings;
	return {
		...rest,
		taxRatePct: taxRateBp / 100,
		depositPct: depositBp / 100,
		companyAddress: companyAddress ?? '',
		companyTaxNumber: companyTaxNumber ?? '',
		companyContact: companyContact ?? '',
		salesDeskEmail: salesDeskEmail ?? ''
	};
}

/** Stores the logo file name after the upload was checked and written (see company-logo.ts). */
export async function setLogoFile(logoFile: string | null): Promise<void> {
	const current = await getSettings();
	await CompanySettings.sequelize!.transaction(async (transaction) => {
		await CompanySettings.upsert({ id: 1, ...settingsRow(current), logoFile }, { transaction });
		await bumpStamp('settings', transaction);
	});
}

function settingsRow(settings: Settings) {
	return { ...settings };
}
