// The server the browser journeys run against: the production build on a fresh data folder with
// the demo scenario, and a mail catcher whose messages the specs read from the data folder.
import { rmSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { E2E_DATA_DIR, E2E_PORT } from './env';

const port = E2E_PORT;
const mailPort = Number(process.env.E2E_MAIL_PORT ?? 2626);
rmSync(E2E_DATA_DIR, { recursive: true, force: true });
process.env.SPANWRIGHT_DATA_DIR = E2E_DATA_DIR;
process.env.SMTP_URL = `smtp://127.0.0.1:${mailPort}`;
process.env.PORT = String(port);
process.env.ORIGIN = `http://localhost:${port}`;
process.env.AUTH_SECRET ??= 'e2e-only-secret-not-for-production-0123456789';
// uploads of drawings and photos are larger than adapter-node's default body limit (512 kB)
process.env.BODY_SIZE_LIMIT ??= '25M';

const { seedDemo } = await import('../../../src/lib/server/demo/seed');
const { startMailCatcher } = await import('../../../src/lib/server/dev/mail-catcher');
await seedDemo();
await startMailCatcher({ port: mailPort });
// The production server (server.js: the fast path, then the build's handler), imported by a computed
// path so type checking does not follow it into build/.
await import(pathToFileURL(join(process.cwd(), 'server.js')).href);
