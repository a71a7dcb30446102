import { defineConfig } from 'drizzle-kit';

export default defineConfig({
	schema: './src/lib/server/db/schema.ts',
	out: './drizzle',
	dialect: 'sqlite',
	dbCredentials: {
		url: process.env.SPANWRIGHT_DATA_DIR
			? `${process.env.SPANWRIGHT_DATA_DIR}/spanwright.db`
			: 'data/spanwright.db'
	}
});
