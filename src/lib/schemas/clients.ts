import { z } from 'zod';

const optionalText = (max: number) => z.string().trim().max(max).default('');
const email = z.string().trim().toLowerCase().max(254).pipe(z.email('Enter a valid e-mail address'));

/** A client record (the organisation) as the desk edits it; the same schema backs the API and the form. */
export const clientSchema = z.object({
	name: z.string().trim().min(2, 'Enter the organisation’s name').max(160),
	contactName: z.string().trim().min(2, 'Enter a contact name').max(120),
	email,
	phone: optionalText(40),
	billingAddress: optionalText(1000),
	taxNumber: optionalText(60),
	notes: optionalText(4000)
});
export type ClientInput = z.infer<typeof clientSchema>;
export const clientUpdateSchema = clientSchema.partial();
export type ClientUpdateInput = z.infer<typeof clientUpdateSchema>;

/** A contact: a person at the client who signs in. */
export const contactSchema = z.object({
	name: z.string().trim().min(2, 'Enter the person’s name').max(120),
	email
});
export type ContactInput = z.infer<typeof contactSchema>;

export const contactUpdateSchema = contactSchema.extend({ contactId: z.number().int().positive() });

/** The fields whose changes are kept in a client's history, with the words the page uses. */
export const CLIENT_FIELD_LABELS: Record<keyof ClientInput, string> = {
	name: 'Organisation',
	contactName: 'Main contact',
	email: 'E-mail',
	phone: 'Phone',
	billingAddress: 'Billing address',
	taxNumber: 'Tax number',
	notes: 'Notes'
};
