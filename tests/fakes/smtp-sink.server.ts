// Entry point started by scripts/fakes.sh: the SMTP sink on $SMTP_PORT with its read API on $SMTP_HTTP_PORT.
import { startSmtpSink } from './smtp-sink';

const sink = await startSmtpSink({
	host: '127.0.0.1',
	port: Number(process.env.SMTP_PORT ?? 2525),
	httpPort: Number(process.env.SMTP_HTTP_PORT ?? 2580),
	mailDir: process.env.MAIL_DIR ?? '.data/mail'
});
console.log(
	`[smtp-sink] SMTP on ${sink.host}:${sink.smtpPort}, read API on ${sink.httpUrl}, mail in ${sink.store.dir}`
);

for (const signal of ['SIGTERM', 'SIGINT'] as const) {
	process.on(signal, () => {
		void sink.close().finally(() => process.exit(0));
	});
}
