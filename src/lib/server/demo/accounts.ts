// Demo accounts of the seeded scenario (invented: a fictional casework shop, its two builders and
// apprentice, and its client). Shown on the sign-in page in dev only.
export const DEMO_PASSWORD = 'sawdust-and-glue';

export const DEMO_ACCOUNTS = [
	{
		email: 'ines@quillfeather.test',
		name: 'Ines Moravec',
		password: DEMO_PASSWORD,
		role: 'owner' as const,
		note: 'Runs Quillfeather Casework; manages members'
	},
	{
		email: 'tomas@quillfeather.test',
		name: 'Tomas Reyes',
		password: DEMO_PASSWORD,
		role: 'editor' as const,
		note: 'Shop lead; checks spans and joints'
	},
	{
		email: 'noor@quillfeather.test',
		name: 'Noor Haddad',
		password: DEMO_PASSWORD,
		role: 'viewer' as const,
		note: "Apprentice; reads the shop's projects and changes nothing"
	},
	{
		email: 'dana@whitlock-home.test',
		name: 'Dana Whitlock',
		password: DEMO_PASSWORD,
		role: 'client' as const,
		note: 'A client; reads the records of her own project only'
	}
];
