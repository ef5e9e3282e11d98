// GET/POST /pay/:id — the hosted invoice page the app links clients to. Test cards decide the outcome:
// 4242 4242 4242 4242 pays, 4000 0000 0000 0002 is declined, anything else is refused.
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Deps } from './context';
import { invoiceLines } from './render';
import { chargeInvoice, type CardDetails } from './payments';
import { notFoundPage, payForm, statusPage } from './hosted-page-html';
import type { Invoice } from './types';

const SUCCESS_CARD = '4242424242424242';
const DECLINE_CARD = '4000000000000002';
const LOOPBACK = ['127.0.0.1', 'localhost', '[::1]'];

/** Only a link back to a local address is honoured, so the page cannot be used to bounce elsewhere. */
export function safeReturnUrl(raw: string | null | undefined): string | null {
	if (!raw) return null;
	try {
		const url = new URL(raw);
		return (url.protocol === 'http:' || url.protocol === 'https:') &&
			LOOPBACK.includes(url.hostname)
			? url.toString()
			: null;
	} catch {
		return null;
	}
}

function html(res: ServerResponse, status: number, body: string): void {
	res.writeHead(status, {
		'content-type': 'text/html; charset=utf-8',
		'cache-control': 'no-store'
	});
	res.end(body);
}

function parseCard(
	form: URLSearchParams
): { digits: string; card: CardDetails } | { error: string } {
	const digits = (form.get('card_number') ?? '').replace(/[\s-]/g, '');
	const expiry = /^\s*(\d{1,2})\s*\/\s*(\d{2}|\d{4})\s*$/.exec(form.get('expiry') ?? '');
	const cvc = (form.get('cvc') ?? '').trim();
	if (!/^\d{12,19}$/.test(digits))
		return { error: 'Enter the card number (digits only, spaces allowed).' };
	if (!expiry) return { error: 'Enter the expiry date as MM/YY.' };
	const month = Number(expiry[1]);
	const year = expiry[2].length === 2 ? 2000 + Number(expiry[2]) : Number(expiry[2]);
	const now = new Date();
	if (month < 1 || month > 12) return { error: 'The expiry month must be between 01 and 12.' };
	if (
		year < now.getUTCFullYear() ||
		(year === now.getUTCFullYear() && month < now.getUTCMonth() + 1)
	) {
		return { error: 'The card has expired: use any future expiry date.' };
	}
	if (!/^\d{3,4}$/.test(cvc)) return { error: 'Enter the 3- or 4-digit CVC.' };
	return {
		digits,
		card: { brand: 'visa', last4: digits.slice(-4), exp_month: month, exp_year: year }
	};
}

export function handleHostedPage(
	deps: Deps,
	req: IncomingMessage,
	res: ServerResponse,
	url: URL,
	body: string
): void {
	const id = decodeURIComponent(url.pathname.slice('/pay/'.length));
	const invoice: Invoice | undefined = deps.store.state.invoices[id];
	// A draft has no hosted page yet; Stripe shows one only after finalization.
	if (!invoice || invoice.status === 'draft') return html(res, 404, notFoundPage());
	const lines = invoiceLines(deps.store.state, invoice);
	const payable = invoice.status === 'open' || invoice.status === 'uncollectible';

	if (req.method === 'GET') {
		const back = safeReturnUrl(url.searchParams.get('return'));
		return html(
			res,
			200,
			payable ? payForm(invoice, lines, back, null) : statusPage(invoice, lines, back)
		);
	}
	if (req.method !== 'POST') return html(res, 405, notFoundPage());

	const form = new URLSearchParams(body);
	const back = safeReturnUrl(form.get('return'));
	if (!payable) return html(res, 409, statusPage(invoice, lines, back));
	const parsed = parseCard(form);
	if ('error' in parsed) return html(res, 400, payForm(invoice, lines, back, parsed.error));
	if (parsed.digits !== SUCCESS_CARD && parsed.digits !== DECLINE_CARD) {
		return html(
			res,
			400,
			payForm(
				invoice,
				lines,
				back,
				'Card number not recognised by the test stand-in. Use 4242 4242 4242 4242 (pays) or 4000 0000 0000 0002 (declined).'
			)
		);
	}
	const outcome = chargeInvoice(deps, invoice, parsed.card, parsed.digits === DECLINE_CARD);
	deps.store.save();
	if (!outcome.ok) {
		return html(
			res,
			402,
			payForm(
				invoice,
				lines,
				back,
				'Your card was declined (card_declined). The invoice is still open; try another card.'
			)
		);
	}
	// Post/redirect/get: a reload of the confirmation cannot pay twice.
	const next = `/pay/${encodeURIComponent(invoice.id)}${back ? `?return=${encodeURIComponent(back)}` : ''}`;
	res.writeHead(303, { location: next });
	res.end();
}
