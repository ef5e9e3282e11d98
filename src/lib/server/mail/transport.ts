import { env } from '$env/dynamic/private';
import nodemailer, { type Transporter } from 'nodemailer';

const cache = globalThis as unknown as { throwlineMailer?: Transporter };

/** One SMTP transport to the configured server (the local sink in development and tests). */
export function mailTransport(): Transporter {
	cache.throwlineMailer ??= nodemailer.createTransport({
		host: env.SMTP_HOST || '127.0.0.1',
		port: Number(env.SMTP_PORT || 2525),
		secure: false,
		ignoreTLS: true,
		// Fail fast: the message stays queued and the person is told, rather than a page hanging.
		connectionTimeout: 3000,
		greetingTimeout: 3000,
		socketTimeout: 5000
	});
	return cache.throwlineMailer;
}

export function mailFrom(): string {
	return env.MAIL_FROM || 'Throwline <no-reply@localhost>';
}

export function publicOrigin(): string {
	return env.ORIGIN || `http://${env.HOST || '127.0.0.1'}:${env.PORT || 3000}`;
}
