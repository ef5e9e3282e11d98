// Every top-level parameter Stripe accepts on invoice create/update (from the SDK's types), so the fake
// refuses only what Stripe itself would refuse.
export const INVOICE_CREATE = [
	'account_tax_ids',
	'application_fee_amount',
	'auto_advance',
	'automatic_tax',
	'automatically_finalizes_at',
	'collection_method',
	'currency',
	'custom_fields',
	'customer',
	'customer_account',
	'days_until_due',
	'default_payment_method',
	'default_source',
	'default_tax_rates',
	'description',
	'discounts',
	'due_date',
	'effective_at',
	'expand',
	'footer',
	'from_invoice',
	'issuer',
	'metadata',
	'number',
	'on_behalf_of',
	'payment_settings',
	'pending_invoice_items_behavior',
	'rendering',
	'shipping_cost',
	'shipping_details',
	'statement_descriptor',
	'subscription',
	'transfer_data'
];
export const INVOICE_UPDATE = INVOICE_CREATE.filter(
	(p) =>
		![
			'currency',
			'customer',
			'customer_account',
			'from_invoice',
			'pending_invoice_items_behavior',
			'subscription'
		].includes(p)
);
