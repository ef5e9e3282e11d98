/** Demo accounts of the invented hire company Kestrel Yard Audio and two of its clients. */
import type { StepContext } from '../scripts/migrate';
import { hashPassword } from '../src/lib/server/auth/password';
import { Client, User } from '../src/lib/server/db/models';
import type { Role } from '../src/lib/permissions';

const clients = [
	{
		key: 'millbrook',
		name: 'Millbrook Riverside Food Festival',
		contactName: 'Priya Okafor',
		email: 'organiser@millbrook-riverside.test',
		phone: '+44 1632 960 118'
	},
	{
		key: 'aldric',
		name: "St Aldric's Academy",
		contactName: 'Tom Hedley',
		email: 'events@st-aldric.test',
		phone: '+44 1632 960 442'
	},
	{
		key: 'lowtide',
		name: 'Low Tide Club Nights',
		contactName: 'Jas Mendel',
		email: 'bookings@lowtide-club.test',
		phone: null
	}
];

const staff: { email: string; name: string; role: Role }[] = [
	{ email: 'admin@kestrel-yard.test', name: 'Morgan Reyes', role: 'admin' },
	{ email: 'warehouse@kestrel-yard.test', name: 'Sam Ilunga', role: 'warehouse' },
	{ email: 'sales@kestrel-yard.test', name: 'Ada Finch', role: 'sales' }
];

export async function up({ context }: { context: StepContext }) {
	const passwordHash = await hashPassword(process.env.DEMO_PASSWORD || 'throwline-demo');
	await context.sequelize.transaction(async (transaction) => {
		for (const person of staff) {
			await User.findOrCreate({
				where: { email: person.email },
				defaults: { ...person, passwordHash },
				transaction
			});
		}
		for (const { key, ...fields } of clients) {
			const [client] = await Client.findOrCreate({
				where: { email: fields.email },
				defaults: fields,
				transaction
			});
			if (key === 'lowtide') continue; // a client without a sign-in yet
			await User.findOrCreate({
				where: { email: fields.email },
				defaults: {
					email: fields.email,
					name: fields.contactName,
					role: 'client',
					clientId: client.id,
					passwordHash
				},
				transaction
			});
		}
	});
}
