/**
 * Certificate benchmarks, called by the bench runner (`npm run bench`) or run alone with
 * `npx tsx bench/certificates.ts`.
 *
 *   pdfGeneration(options?: { warmup?: number; runs?: number }): Promise<PdfBench>
 *     Renders certificate PDFs (fonts converted once, QR code included, no file cache) and
 *     returns the median and 95th percentile in ms after `warmup` renders, for an interim
 *     credential (one area, 12 tasks) and a programme completion (every task of the framework).
 *     Target (issue 7): median under 50 ms.
 *
 *   verifyThroughput(options?: { duration?: number; connections?: number }): Promise<VerifyBench>
 *     Needs `npm run build` first. Seeds a fresh demo database in a temporary folder, starts the
 *     built app (`node build`) and a bare `node:http` JSON server, and measures requests per
 *     second with autocannon against `/api/verify/<serial>`, the trivial `/api/ping` route of the
 *     same build, and the bare server. Target (issue 7): verify ≥ 50 % of ping.
 *
 * Each returns plain numbers; `printPdf` and `printVerify` format them as lines of text.
 */
import autocannon from 'autocannon';
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { serialFromBytes } from '../src/lib/certificates';
import type { CertificateContent } from '../src/lib/server/certificates/content';
import { render } from '../src/lib/server/certificates/pdf';
import { DEFAULT_FRAMEWORK } from '../src/lib/server/framework/default';

export interface PdfBench {
	area: { medianMs: number; p95Ms: number; runs: number; bytes: number };
	programme: { medianMs: number; p95Ms: number; runs: number; bytes: number };
	targetMs: 50;
}

export interface VerifyBench {
	/** Requests per second, mean over the run. */
	verify: number;
	ping: number;
	bareNode: number;
	/** verify ÷ ping; the target is at least 0.5. */
	ratio: number;
	errors: { verify: number; ping: number; bareNode: number };
	durationSeconds: number;
	connections: number;
}

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

const percentile = (sorted: number[], p: number) =>
	sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];

/** A certificate like the ones the app issues, from the default framework's real tasks. */
function sampleContent(kind: 'area' | 'programme'): CertificateContent {
	const areas = kind === 'area' ? DEFAULT_FRAMEWORK.areas.slice(0, 1) : DEFAULT_FRAMEWORK.areas;
	const tasks = areas.flatMap((a) =>
		a.tasks.map((t, i) => ({
			code: t.code,
			title: t.title,
			area: a.code,
			level: t.requiredLevel as 1 | 2 | 3 | 4,
			signedAt: new Date(Date.UTC(2026, 3, 1 + i)).toISOString()
		}))
	);
	return {
		format: 'journeymark-certificate/1',
		serial: serialFromBytes(Uint8Array.from({ length: 10 }, (_, i) => i * 17)),
		holder: 'Rosa Lindqvist',
		programme: {
			id: 1,
			name: 'Automotive Service Technician (hybrid, 4 years)',
			approach: 'hybrid'
		},
		scope: {
			kind,
			code: kind === 'area' ? areas[0].code : null,
			title: kind === 'area' ? `Interim credential: ${areas[0].name}` : 'Programme completion',
			areas: areas.map((a) => ({
				code: a.code,
				name: a.name,
				tasks: a.tasks.length,
				verifiedHours: 412.5
			})),
			tasks,
			hours: { verified: 8120.5, priorCredit: 0, relatedInstruction: 576 }
		},
		issuedAt: '2026-12-02T10:00:00.000Z',
		expiresAt: null,
		issuer: {
			name: 'Riverbend Training Partnership',
			url: 'http://localhost:3000/',
			signedBy: 'Priya Castellano'
		},
		keyId: 'C2HhLOSwNMwId02Et72zGz2kkJAjz7Cx3aJ8bWB2-VY'
	};
}

async function timeRenders(content: CertificateContent, warmup: number, runs: number) {
	const url = `http://localhost:3000/verify/${content.serial}`;
	let bytes = 0;
	for (let i = 0; i < warmup; i++) await render(content, url, 'letter');
	const times: number[] = [];
	for (let i = 0; i < runs; i++) {
		const started = performance.now();
		bytes = (await render(content, url, i % 2 ? 'a4' : 'letter')).length;
		times.push(performance.now() - started);
	}
	times.sort((a, b) => a - b);
	const round = (n: number) => Math.round(n * 10) / 10;
	return {
		medianMs: round(percentile(times, 50)),
		p95Ms: round(percentile(times, 95)),
		runs,
		bytes
	};
}

export async function pdfGeneration(
	options: { warmup?: number; runs?: number } = {}
): Promise<PdfBench> {
	const warmup = options.warmup ?? 10;
	const runs = options.runs ?? 40;
	return {
		area: await timeRenders(sampleContent('area'), warmup, runs),
		programme: await timeRenders(sampleContent('programme'), warmup, Math.ceil(runs / 2)),
		targetMs: 50
	};
}

const freePort = () =>
	new Promise<number>((resolve) => {
		const server = net.createServer().listen(0, '127.0.0.1', () => {
			const { port } = server.address() as net.AddressInfo;
			server.close(() => resolve(port));
		});
	});

async function waitFor(url: string, deadlineMs = 30_000) {
	const deadline = Date.now() + deadlineMs;
	for (;;) {
		try {
			if ((await fetch(url)).ok) return;
		} catch {
			// not listening yet
		}
		if (Date.now() > deadline) throw new Error(`${url} did not answer in time`);
		await new Promise((r) => setTimeout(r, 150));
	}
}

async function load(url: string, duration: number, connections: number) {
	await autocannon({ url, connections, duration: 1 }); // warm-up, not counted
	const result = await autocannon({ url, connections, duration });
	return { rps: Math.round(result.requests.average), errors: result.errors + result.non2xx };
}

const BARE = `require('node:http').createServer((q, s) => { s.writeHead(200, { 'content-type': 'application/json' }); s.end('{"ok":true}'); }).listen(Number(process.env.PORT), '127.0.0.1');`;

export async function verifyThroughput(
	options: { duration?: number; connections?: number } = {}
): Promise<VerifyBench> {
	const duration = options.duration ?? 10;
	const connections = options.connections ?? 10;
	const build = process.env.BUILD_DIR || 'build';
	if (!existsSync(path.join(ROOT, build, 'index.js')))
		throw new Error('Run `npm run build` first.');
	const dir = mkdtempSync(path.join(os.tmpdir(), 'journeymark-bench-cert-'));
	const [appPort, barePort] = [await freePort(), await freePort()];
	const env = {
		...process.env,
		NODE_ENV: 'production',
		HOST: '127.0.0.1',
		PORT: String(appPort),
		ORIGIN: `http://127.0.0.1:${appPort}`,
		DATABASE_URL: path.join(dir, 'bench.db'),
		KEYS_DIR: path.join(dir, 'keys'),
		CERTIFICATES_DIR: path.join(dir, 'pdf'),
		SMTP_URL: 'smtp://127.0.0.1:9',
		DAILY_JOBS: 'off',
		// The per-address limit would otherwise answer most of the load with 429.
		VERIFY_LOOKUPS_PER_MINUTE: '1000000'
	};
	const children: ChildProcess[] = [];
	try {
		const seeded = spawn(process.execPath, ['--import', 'tsx', 'seed/index.ts'], {
			cwd: ROOT,
			env,
			stdio: 'pipe'
		});
		let output = '';
		seeded.stdout?.on('data', (d) => (output += d));
		if ((await new Promise((r) => seeded.on('exit', r))) !== 0) throw new Error('Seeding failed');
		const serial = output.match(/Certificate (JM-[0-9A-Z-]+): valid/)?.[1];
		if (!serial) throw new Error('The demo data has no valid certificate to look up.');

		children.push(spawn(process.execPath, [build], { cwd: ROOT, env, stdio: 'ignore' }));
		children.push(
			spawn(process.execPath, ['-e', BARE], {
				env: { ...process.env, PORT: String(barePort) },
				stdio: 'ignore'
			})
		);
		const app = `http://127.0.0.1:${appPort}`;
		await waitFor(`${app}/api/ping`);
		await waitFor(`http://127.0.0.1:${barePort}/`);
		const check = await (await fetch(`${app}/api/verify/${serial}`)).json();
		if (check.status !== 'valid' || !check.signatureValid)
			throw new Error('The lookup did not verify.');

		const bareNode = await load(`http://127.0.0.1:${barePort}/`, duration, connections);
		// Ping and verify take turns in short rounds, so a busy moment on the machine falls on both.
		const rounds = 3;
		const slice = Math.max(1, Math.round(duration / rounds));
		const ping = { rps: 0, errors: 0 };
		const verify = { rps: 0, errors: 0 };
		for (let round = 0; round < rounds; round++) {
			const order = round % 2 ? (['verify', 'ping'] as const) : (['ping', 'verify'] as const);
			for (const which of order) {
				const url = which === 'ping' ? `${app}/api/ping` : `${app}/api/verify/${serial}`;
				const result = await load(url, slice, connections);
				const total = which === 'ping' ? ping : verify;
				total.rps += result.rps / rounds;
				total.errors += result.errors;
			}
		}
		ping.rps = Math.round(ping.rps);
		verify.rps = Math.round(verify.rps);
		return {
			verify: verify.rps,
			ping: ping.rps,
			bareNode: bareNode.rps,
			ratio: Math.round((verify.rps / ping.rps) * 100) / 100,
			errors: { verify: verify.errors, ping: ping.errors, bareNode: bareNode.errors },
			durationSeconds: duration,
			connections
		};
	} finally {
		for (const child of children) child.kill('SIGTERM');
		rmSync(dir, { recursive: true, force: true });
	}
}

export function printPdf(r: PdfBench): string[] {
	const ok = (ms: number) => (ms < r.targetMs ? 'ok' : 'OVER TARGET');
	return [
		`Certificate PDF, interim credential (${r.area.runs} runs): median ${r.area.medianMs} ms, p95 ${r.area.p95Ms} ms, ${Math.round(r.area.bytes / 1024)} KiB — target < ${r.targetMs} ms: ${ok(r.area.medianMs)}`,
		`Certificate PDF, programme completion (${r.programme.runs} runs): median ${r.programme.medianMs} ms, p95 ${r.programme.p95Ms} ms, ${Math.round(r.programme.bytes / 1024)} KiB — target < ${r.targetMs} ms: ${ok(r.programme.medianMs)}`
	];
}

export function printVerify(r: VerifyBench): string[] {
	return [
		`/api/verify/<serial>: ${r.verify} req/s (${r.errors.verify} errors)`,
		`/api/ping (same build): ${r.ping} req/s (${r.errors.ping} errors)`,
		`bare node:http: ${r.bareNode} req/s (for the record)`,
		`verify ÷ ping = ${Math.round(r.ratio * 100)} % — target ≥ 50 %: ${r.ratio >= 0.5 ? 'ok' : 'UNDER TARGET'}`
	];
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
	for (const line of printPdf(await pdfGeneration())) console.log(line);
	for (const line of printVerify(await verifyThroughput())) console.log(line);
}
