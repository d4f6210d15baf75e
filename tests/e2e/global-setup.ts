import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { startFakeSmtp } from '../../fakes/smtp';

declare module 'vitest' {
	export interface ProvidedContext {
		baseUrl: string;
		mailDir: string;
		databasePath: string;
	}
}

const freePort = () =>
	new Promise<number>((resolve) => {
		const server = net.createServer().listen(0, '127.0.0.1', () => {
			const { port } = server.address() as net.AddressInfo;
			server.close(() => resolve(port));
		});
	});

/** Fresh demo data, the fake SMTP server and the built app (`node build`) on free ports. */
export default async function setup(project: TestProject) {
	const build = process.env.BUILD_DIR || 'build';
	if (!existsSync(`${build}/index.js`))
		throw new Error('Run `npm run build` before the browser tests.');
	const dir = mkdtempSync(path.join(os.tmpdir(), 'journeymark-e2e-'));
	const mailDir = path.join(dir, 'mail');
	const mail = await startFakeSmtp({ port: 0, dir: mailDir });
	const port = await freePort();
	const baseUrl = `http://127.0.0.1:${port}`;
	const env = {
		...process.env,
		NODE_ENV: 'production',
		PORT: String(port),
		HOST: '127.0.0.1',
		ORIGIN: baseUrl,
		DATABASE_URL: path.join(dir, 'e2e.db'),
		SMTP_URL: `smtp://127.0.0.1:${mail.port}`,
		FAKE_MAIL_DIR: mailDir,
		UPLOADS_DIR: path.join(dir, 'uploads'),
		KEYS_DIR: path.join(dir, 'keys'),
		BODY_SIZE_LIMIT: '12M'
	};

	const seeded = spawn(process.execPath, ['--import', 'tsx', 'seed/index.ts'], {
		env,
		stdio: 'inherit'
	});
	const code = await new Promise<number | null>((r) => seeded.on('exit', r));
	if (code !== 0) throw new Error('Seeding the demo data failed');

	const server: ChildProcess = spawn(process.execPath, [build], { env, stdio: 'inherit' });
	let stopping = false;
	server.on('exit', (code, signal) => {
		if (!stopping)
			console.error(`The app server stopped during the tests (code ${code}, signal ${signal})`);
	});
	const deadline = Date.now() + 30_000;
	for (;;) {
		try {
			const response = await fetch(`${baseUrl}/api/health`);
			if (response.ok) break;
		} catch {
			// not listening yet
		}
		if (Date.now() > deadline) throw new Error('The built server did not answer /api/health');
		await new Promise((r) => setTimeout(r, 200));
	}

	project.provide('baseUrl', baseUrl);
	project.provide('mailDir', mailDir);
	project.provide('databasePath', env.DATABASE_URL);

	return async () => {
		stopping = true;
		server.kill('SIGTERM');
		await mail.close();
	};
}
