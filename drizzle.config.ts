import { defineConfig } from 'drizzle-kit';

// One configuration for both engines: `npm run db:generate` writes SQLite's migrations (drizzle/)
// from schema.ts; with DB_DIALECT=pg (`npm run db:generate:pg`), PostgreSQL's (drizzle/pg/) from
// schema-pg.ts. Generate both after a schema change; the parity test keeps them alike.
export default process.env.DB_DIALECT === 'pg'
	? defineConfig({
			schema: './src/lib/server/db/schema-pg.ts',
			out: './drizzle/pg',
			dialect: 'postgresql',
			dbCredentials: { url: process.env.DATABASE_URL ?? 'postgres://localhost/spanwright' }
		})
	: defineConfig({
			schema: './src/lib/server/db/schema.ts',
			out: './drizzle',
			dialect: 'sqlite',
			dbCredentials: {
				url: process.env.SPANWRIGHT_DATA_DIR
					? `${process.env.SPANWRIGHT_DATA_DIR}/spanwright.db`
					: 'data/spanwright.db'
			}
		});
