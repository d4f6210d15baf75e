/**
 * `npm run demo`: starts the local fake mail server, loads the demo data, and serves the built
 * app on http://localhost:3000 until stopped. With STORAGE=s3 and no S3_ENDPOINT it also starts
 * the local fake S3 and points the app at it.
 */
import { spawn } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { FAKE_S3_KEYS, startFakeS3, type FakeS3 } from '../fakes/s3';
import { startFakeSmtp } from '../fakes/smtp';

const port = process.env.PORT ?? '3000';
const smtpPort = Number(process.env.FAKE_SMTP_PORT ?? 2525);
const env = {
	...process.env,
	PORT: port,
	ORIGIN: process.env.ORIGIN ?? `http://localhost:${port}`,
	DATABASE_URL: process.env.DATABASE_URL ?? 'data/demo.db',
	SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
	FAKE_MAIL_DIR: path.resolve(process.env.FAKE_MAIL_DIR ?? 'data/demo-mail'),
	BODY_SIZE_LIMIT: process.env.BODY_SIZE_LIMIT ?? '12M'
};
mkdirSync('data', { recursive: true });

const mail = await startFakeSmtp({ port: smtpPort, dir: env.FAKE_MAIL_DIR });
console.log(`Fake mail server on 127.0.0.1:${smtpPort}; messages in ${env.FAKE_MAIL_DIR}`);

let s3: FakeS3 | undefined;
if (process.env.STORAGE === 's3' && !process.env.S3_ENDPOINT) {
	const bucket = process.env.S3_BUCKET || 'journeymark';
	const dir = path.resolve('data/demo-s3');
	s3 = await startFakeS3({
		port: Number(process.env.FAKE_S3_PORT ?? 4569),
		dir,
		buckets: [bucket]
	});
	Object.assign(env, {
		S3_BUCKET: bucket,
		S3_ENDPOINT: s3.endpoint,
		S3_FORCE_PATH_STYLE: 'true',
		S3_ACCESS_KEY_ID: FAKE_S3_KEYS.accessKeyId,
		S3_SECRET_ACCESS_KEY: FAKE_S3_KEYS.secretAccessKey
	});
	console.log(`Fake S3 on ${s3.endpoint}, bucket "${bucket}"; objects in ${dir}`);
}
const closeFakes = async () => {
	await mail.close();
	await s3?.close();
};

const run = (args: string[]) =>
	new Promise<number>((resolve) => {
		const child = spawn(process.execPath, args, { env, stdio: 'inherit' });
		child.on('exit', (code) => resolve(code ?? 1));
	});

if ((await run(['--import', 'tsx', 'seed/index.ts'])) !== 0) {
	await closeFakes();
	process.exit(1);
}
console.log(`Journeymark on ${env.ORIGIN} (Ctrl+C to stop)`);
const server = spawn(process.execPath, ['build'], { env, stdio: 'inherit' });
const stop = () => server.kill('SIGTERM');
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
server.on('exit', async (code) => {
	await closeFakes();
	process.exit(code ?? 0);
});
