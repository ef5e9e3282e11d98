// The objects the fake keeps, in the shape Stripe returns them (only the fields Throwline can meet).
export type Metadata = Record<string, string>;

export interface Customer {
	id: string;
	object: 'customer';
	address: null;
	balance: number;
	created: number;
	currency: string | null;
	default_source: null;
	delinquent: boolean;
	description: string | null;
	email: string | null;
	invoice_prefix: string;
	invoice_settings: {
		custom_fields: null;
		default_payment_method: null;
		footer: null;
		rendering_options: null;
	};
	livemode: false;
	metadata: Metadata;
	name: string | null;
	phone: string | null;
	preferred_locales: string[];
	shipping: null;
	tax_exempt: 'none';
	test_clock: null;
}

export interface InvoiceItem {
	id: string;
	object: 'invoiceitem';
	amount: number;
	currency: string;
	customer: string;
	date: number;
	description: string | null;
	discountable: boolean;
	discounts: string[];
	invoice: string | null;
	livemode: false;
	metadata: Metadata;
	parent: null;
	period: { start: number; end: number };
	pricing: { type: 'price_details'; price_details: null; unit_amount_decimal: string | null };
	proration: boolean;
	quantity: number;
	quantity_decimal: string;
	tax_rates: [];
	test_clock: null;
	/** Not a Stripe field: the id of the line this item became on its invoice. */
	line_id: string;
}

export type InvoiceStatus = 'draft' | 'open' | 'paid' | 'void' | 'uncollectible';

export interface Invoice {
	id: string;
	object: 'invoice';
	account_country: string;
	account_name: string;
	amount_due: number;
	amount_overpaid: number;
	amount_paid: number;
	amount_remaining: number;
	amount_shipping: number;
	attempt_count: number;
	attempted: boolean;
	auto_advance: boolean;
	automatic_tax: { enabled: false; liability: null; status: null };
	billing_reason: 'manual';
	collection_method: 'send_invoice' | 'charge_automatically';
	created: number;
	currency: string;
	customer: string;
	customer_email: string | null;
	customer_name: string | null;
	days_until_due: number | null;
	default_payment_method: null;
	description: string | null;
	discounts: [];
	due_date: number | null;
	effective_at: number | null;
	ending_balance: number | null;
	footer: string | null;
	hosted_invoice_url: string | null;
	invoice_pdf: string | null;
	last_finalization_error: null;
	livemode: false;
	metadata: Metadata;
	next_payment_attempt: number | null;
	number: string | null;
	parent: null;
	period_end: number;
	period_start: number;
	post_payment_credit_notes_amount: number;
	pre_payment_credit_notes_amount: number;
	receipt_number: string | null;
	starting_balance: number;
	statement_descriptor: string | null;
	status: InvoiceStatus;
	status_transitions: {
		finalized_at: number | null;
		marked_uncollectible_at: number | null;
		paid_at: number | null;
		voided_at: number | null;
	};
	subtotal: number;
	subtotal_excluding_tax: number;
	test_clock: null;
	total: number;
	total_discount_amounts: [];
	total_excluding_tax: number;
	total_taxes: [];
	webhooks_delivered_at: number | null;
	/** Legacy fields (removed from newer API versions) kept because the brief asks for them; prefer `payments`. */
	charge: string | null;
	payment_intent: string | null;
	/** Ids of this invoice's items, in the order they were added (rendered as `lines`). */
	item_ids: string[];
	/** Ids of invoice payments (rendered as `payments` when expanded). */
	payment_ids: string[];
}

export interface InvoicePayment {
	id: string;
	object: 'invoice_payment';
	amount_paid: number | null;
	amount_requested: number;
	created: number;
	currency: string;
	invoice: string;
	is_default: boolean;
	livemode: false;
	payment: { type: 'payment_intent'; payment_intent: string; charge?: string };
	status: 'open' | 'paid' | 'canceled';
	status_transitions: { canceled_at: number | null; paid_at: number | null };
}

export interface PaymentIntent {
	id: string;
	object: 'payment_intent';
	amount: number;
	amount_received: number;
	created: number;
	currency: string;
	customer: string;
	description: string | null;
	last_payment_error: Record<string, unknown> | null;
	latest_charge: string | null;
	livemode: false;
	metadata: Metadata;
	payment_method_types: string[];
	status: 'requires_payment_method' | 'succeeded';
}

export interface Charge {
	id: string;
	object: 'charge';
	amount: number;
	amount_captured: number;
	amount_refunded: number;
	captured: boolean;
	created: number;
	currency: string;
	customer: string;
	description: string | null;
	failure_code: string | null;
	failure_message: string | null;
	livemode: false;
	metadata: Metadata;
	outcome: {
		network_status: string;
		reason: string | null;
		risk_level: string;
		seller_message: string;
		type: string;
	};
	paid: boolean;
	payment_intent: string;
	payment_method_details: {
		type: 'card';
		card: { brand: string; last4: string; exp_month: number; exp_year: number };
	};
	receipt_url: string | null;
	refunded: boolean;
	status: 'succeeded' | 'failed';
}

export interface Refund {
	id: string;
	object: 'refund';
	amount: number;
	balance_transaction: null;
	charge: string;
	created: number;
	currency: string;
	metadata: Metadata;
	payment_intent: string;
	reason: string | null;
	receipt_number: null;
	status: 'succeeded';
}

export interface StripeEvent {
	id: string;
	object: 'event';
	api_version: string;
	created: number;
	data: { object: unknown; previous_attributes?: Record<string, unknown> };
	livemode: false;
	pending_webhooks: number;
	request: { id: string | null; idempotency_key: string | null };
	type: string;
}

export interface DeliveryAttempt {
	attempt: number;
	at: string;
	url: string;
	status: number | null;
	ok: boolean;
	error: string | null;
	durationMs: number;
}

/** An event plus the fake's record of its webhook deliveries (the latter is never sent to the app). */
export interface EventRecord {
	event: StripeEvent;
	delivery: {
		status: 'pending' | 'delivered' | 'failed' | 'disabled';
		attempts: DeliveryAttempt[];
	};
}
