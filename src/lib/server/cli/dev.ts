// `npm run dev`: everything a fresh clone needs to show the app with demo data — the data folder,
// a kept development secret, migrations, the demo scenario (once), the mail catcher, and Vite.
import { spawn } from 'node:child_process';
import { dataDir, dbReady } from '../db';
import { demoIsSeeded, seedDemo } from '../demo/seed';
import { startMailCatcher } from '../dev/mail-catcher';
import { ensureAuthSecret } from './secrets';

ensureAuthSecret();
await dbReady();
if (!(await demoIsSeeded())) {
	await seedDemo();
	console.log('Seeded the demo scenario.');
}
const mailPort = Number(process.env.MAIL_CATCHER_PORT ?? 2525);
await startMailCatcher({ port: mailPort });
process.env.SMTP_URL ??= `smtp://127.0.0.1:${mailPort}`;
console.log(`Mail catcher on port ${mailPort}; caught mail at http://localhost:5173/dev/mail`);
console.log(`Data folder: ${dataDir}`);

const vite = spawn(
	'npx',
	['vite', 'dev', '--port', process.env.PORT ?? '5173', ...process.argv.slice(2)],
	{
		stdio: 'inherit',
		env: process.env
	}
);
const stop = () => vite.kill('SIGTERM');
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
vite.on('exit', (code) => process.exit(code ?? 0));
