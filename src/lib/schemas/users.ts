import { z } from 'zod';
import { ROLES } from '../permissions';

// The fields a new account is made of, shared by the API body and the "add a person" form.
const email = z.string().trim().toLowerCase().max(254).pipe(z.email('Enter a valid e-mail address'));
const personName = z.string().trim().min(2, 'Enter the person’s name').max(120);
const firstPassword = z
	.string()
	.max(200)
	.refine((p) => p === '' || p.length >= 10, 'Use at least 10 characters, or leave empty to generate one')
	.default('');
const clientId = z.coerce.number().int().positive().nullable().default(null);

/** A client account belongs to a client organisation. */
const belongsToClient = (u: { role: string; clientId: number | null }) => u.role !== 'client' || u.clientId !== null;
const belongsToClientError = { path: ['clientId'], message: 'A client account belongs to a client organisation; choose one' };

export const userCreateSchema = z
	.object({ email, name: personName, role: z.enum(ROLES, { error: 'Choose a role' }), password: firstPassword, clientId })
	.refine(belongsToClient, belongsToClientError);
export type UserCreateInput = z.infer<typeof userCreateSchema>;

export const userUpdateSchema = z
	.object({
		name: z.string().trim().min(2).max(120),
		role: z.enum(ROLES, { error: 'Choose a role' }),
		active: z.boolean(),
		clientId: z.number().int().positive().nullable()
	})
	.partial()
	.strict();
export type UserUpdateInput = z.infer<typeof userUpdateSchema>;

/**
 * The "add a person" form: the role starts empty and must be chosen (a new account never becomes an
 * admin by default). Valid data is a UserCreateInput.
 */
export const userCreateFormSchema = z
	.object({
		email,
		name: personName,
		role: z.enum(['', ...ROLES]).default('').refine((r) => r !== '', 'Choose a role'),
		password: firstPassword,
		clientId
	})
	.refine(belongsToClient, belongsToClientError);
