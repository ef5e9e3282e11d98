// Markup of the hosted invoice page. Our own plain design, and it says plainly that it is a local
// test stand-in: no card data goes anywhere, no money moves.
import type { Invoice } from './types';

export function escapeHtml(value: string): string {
	return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

export function money(minor: number, currency: string): string {
	const format = new Intl.NumberFormat('en-GB', {
		style: 'currency',
		currency: currency.toUpperCase()
	});
	const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
	return format.format(minor / 10 ** digits);
}

function date(unix: number | null): string {
	if (unix === null) return '—';
	return new Date(unix * 1000).toLocaleDateString('en-GB', {
		day: 'numeric',
		month: 'long',
		year: 'numeric',
		timeZone: 'UTC'
	});
}

const STYLE = `body{font:16px/1.5 system-ui,sans-serif;margin:0;background:#f4f4f1;color:#1d1d1b}
main{max-width:34rem;margin:2rem auto;background:#fff;border:1px solid #d8d8d2;border-radius:6px;padding:1.5rem 2rem}
.banner{background:#fff3c4;border-bottom:1px solid #e0cf86;padding:.6rem 1rem;text-align:center;font-size:.9rem}
h1{font-size:1.3rem;margin:.2rem 0 1rem}table{width:100%;border-collapse:collapse;margin:1rem 0}
td{padding:.3rem 0;border-bottom:1px solid #eee}td.n{text-align:right;white-space:nowrap}
.total td{font-weight:600;border-bottom:none}label{display:block;margin:.7rem 0 .2rem;font-weight:600}
input{font:inherit;padding:.45rem .6rem;width:100%;box-sizing:border-box;border:1px solid #aaa;border-radius:4px}
.row{display:flex;gap:1rem}.row>div{flex:1}button{margin-top:1.2rem;font:inherit;font-weight:600;padding:.6rem 1.2rem;
border:0;border-radius:4px;background:#22543d;color:#fff;cursor:pointer;width:100%}
.error{background:#fde8e8;border:1px solid #e3a0a0;padding:.6rem .8rem;border-radius:4px}
.ok{background:#e5f4ea;border:1px solid #98c9a8;padding:.6rem .8rem;border-radius:4px}
.muted{color:#5d5d58;font-size:.9rem}code{background:#f0f0ec;padding:0 .25rem}`;

export function page(title: string, body: string): string {
	return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<meta name="robots" content="noindex"><title>${escapeHtml(title)}</title><style>${STYLE}</style></head><body>
<div class="banner" role="note"><strong>Local test stand-in.</strong> This is not a real payment page: nothing is charged and card details go nowhere.</div>
<main>${body}</main></body></html>`;
}

export interface LineView {
	description: string | null;
	amount: number;
}

function summary(invoice: Invoice, lines: LineView[]): string {
	const rows = lines
		.map(
			(l) =>
				`<tr><td>${escapeHtml(l.description ?? 'Item')}</td><td class="n">${money(l.amount, invoice.currency)}</td></tr>`
		)
		.join('');
	return `<p class="muted">${escapeHtml(invoice.account_name)}</p>
<h1>Invoice ${escapeHtml(invoice.number ?? invoice.id)}</h1>
${invoice.customer_name || invoice.customer_email ? `<p>For ${escapeHtml(invoice.customer_name ?? invoice.customer_email ?? '')}</p>` : ''}
${invoice.description ? `<p>${escapeHtml(invoice.description)}</p>` : ''}
<table><tbody>${rows}<tr class="total"><td>Amount due</td><td class="n" data-testid="amount-due">${money(invoice.amount_remaining, invoice.currency)}</td></tr></tbody></table>
<p>Due ${escapeHtml(date(invoice.due_date))}</p>`;
}

export function payForm(
	invoice: Invoice,
	lines: LineView[],
	returnUrl: string | null,
	error: string | null
): string {
	return page(
		`Pay invoice ${invoice.number ?? invoice.id}`,
		`${summary(invoice, lines)}
${error ? `<p class="error" role="alert">${escapeHtml(error)}</p>` : ''}
<form method="post" action="/pay/${encodeURIComponent(invoice.id)}">
<input type="hidden" name="return" value="${escapeHtml(returnUrl ?? '')}">
<label for="card-number">Card number</label>
<input id="card-number" name="card_number" inputmode="numeric" autocomplete="off" placeholder="4242 4242 4242 4242" required>
<div class="row"><div><label for="card-expiry">Expiry (MM/YY)</label><input id="card-expiry" name="expiry" autocomplete="off" placeholder="12/34" required></div>
<div><label for="card-cvc">CVC</label><input id="card-cvc" name="cvc" inputmode="numeric" autocomplete="off" placeholder="123" required></div></div>
<button type="submit">Pay ${money(invoice.amount_remaining, invoice.currency)}</button>
</form>
<p class="muted">Test cards: <code>4242 4242 4242 4242</code> pays; <code>4000 0000 0000 0002</code> is declined. Any future expiry and any 3-digit CVC.</p>`
	);
}

export function statusPage(invoice: Invoice, lines: LineView[], returnUrl: string | null): string {
	const back = returnUrl
		? `<p><a href="${escapeHtml(returnUrl)}">Back to ${escapeHtml(invoice.account_name)}</a></p>`
		: '';
	const messages: Record<string, string> = {
		paid: `<p class="ok" role="status">Paid — thank you. ${money(invoice.amount_paid, invoice.currency)} received on ${escapeHtml(date(invoice.status_transitions.paid_at))}.</p>`,
		void: `<p class="error" role="status">This invoice was cancelled; there is nothing to pay.</p>`
	};
	return page(
		`Invoice ${invoice.number ?? invoice.id}`,
		`${summary(invoice, lines)}${messages[invoice.status] ?? ''}${back}`
	);
}

export function notFoundPage(): string {
	return page(
		'Invoice not found',
		'<h1>Invoice not found</h1><p>There is no open invoice at this address.</p>'
	);
}
