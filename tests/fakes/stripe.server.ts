// Entry point started by scripts/fakes.sh: the Stripe stand-in on 127.0.0.1:$STRIPE_API_PORT, its state
// kept in $RUN_DIR/stripe-state.json so a restart keeps the invoices the app already knows.
import { join } from 'node:path';
import { startFakeStripe } from './stripe/server';

const env = process.env;
const fake = await startFakeStripe({
	host: '127.0.0.1',
	port: Number(env.STRIPE_API_PORT ?? 12111),
	apiKey: env.STRIPE_SECRET_KEY || undefined,
	webhookSecret: env.STRIPE_WEBHOOK_SECRET ?? 'whsec_throwline_local_development',
	webhookUrl: env.STRIPE_WEBHOOK_URL ?? 'http://127.0.0.1:3000/api/webhooks/stripe',
	accountName: env.STRIPE_ACCOUNT_NAME ?? 'Local test account',
	statePath: join(env.RUN_DIR ?? '.data/run', 'stripe-state.json')
});
console.log(
	`[stripe-fake] API on ${fake.url}/v1, hosted pages on ${fake.url}/pay/:id, webhooks to ${fake.events.webhook.url || '(none)'}`
);

for (const signal of ['SIGTERM', 'SIGINT'] as const) {
	process.on(signal, () => {
		void fake.close().finally(() => process.exit(0));
	});
}
