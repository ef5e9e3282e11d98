// In-memory state of the fake, optionally mirrored to a JSON file so a restart of the process (e.g.
// `npm start` again) keeps the invoices the app's database already points at.
import { mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { randomToken } from './ids';
import type {
	Charge,
	Customer,
	EventRecord,
	Invoice,
	InvoiceItem,
	InvoicePayment,
	PaymentIntent,
	Refund
} from './types';

export interface IdempotentResponse {
	fingerprint: string;
	status: number;
	body: unknown;
}

export interface State {
	customers: Record<string, Customer>;
	invoiceItems: Record<string, InvoiceItem>;
	invoices: Record<string, Invoice>;
	invoicePayments: Record<string, InvoicePayment>;
	paymentIntents: Record<string, PaymentIntent>;
	charges: Record<string, Charge>;
	refunds: Record<string, Refund>;
	events: Record<string, EventRecord>;
	idempotency: Record<string, IdempotentResponse>;
	/** Invoice numbers are `<prefix>-0001`…; a fresh prefix after each reset keeps numbers unique across runs. */
	numberPrefix: string;
	invoiceSequence: number;
}

export function emptyState(): State {
	return {
		customers: {},
		invoiceItems: {},
		invoices: {},
		invoicePayments: {},
		paymentIntents: {},
		charges: {},
		refunds: {},
		events: {},
		idempotency: {},
		numberPrefix: randomToken(8).toUpperCase(),
		invoiceSequence: 0
	};
}

export class Store {
	state: State;
	private saveQueued = false;

	constructor(private readonly filePath?: string) {
		this.state = this.load() ?? emptyState();
	}

	reset(): void {
		this.state = emptyState();
		this.save();
	}

	/** Coalesces writes: many mutations in one tick cost one file write. */
	save(): void {
		if (!this.filePath || this.saveQueued) return;
		this.saveQueued = true;
		setImmediate(() => {
			this.saveQueued = false;
			this.flush();
		});
	}

	flush(): void {
		if (!this.filePath) return;
		mkdirSync(dirname(this.filePath), { recursive: true });
		const tmp = `${this.filePath}.tmp`;
		writeFileSync(tmp, JSON.stringify(this.state));
		renameSync(tmp, this.filePath);
	}

	private load(): State | null {
		if (!this.filePath) return null;
		try {
			return {
				...emptyState(),
				...(JSON.parse(readFileSync(this.filePath, 'utf8')) as Partial<State>)
			};
		} catch {
			return null;
		}
	}
}

/** Newest first, as Stripe lists; insertion order stands in for creation order within the same second. */
export function newestFirst<T>(record: Record<string, T>): T[] {
	return Object.values(record).reverse();
}
