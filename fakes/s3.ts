/**
 * A local stand-in for S3-compatible object storage (s3rver, files on disk), so the demo, CI and
 * the tests run the real SDK code path. Path-style addresses only; any keys are accepted.
 */
import { mkdir } from 'node:fs/promises';
import { createRequire } from 'node:module';
import type { AddressInfo } from 'node:net';
import path from 'node:path';

interface S3rverInstance {
	run(): Promise<AddressInfo>;
	close(): Promise<void>;
}
type S3rverClass = new (options: {
	port: number;
	address: string;
	directory: string;
	silent: boolean;
	vhostBuckets: boolean;
	configureBuckets: { name: string }[];
}) => S3rverInstance;

/** The only keys the fake accepts; others are refused as S3 would (403). */
export const FAKE_S3_KEYS = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' } as const;

export interface FakeS3 {
	port: number;
	/** `http://127.0.0.1:<port>`, for S3_ENDPOINT (with S3_FORCE_PATH_STYLE=true). */
	endpoint: string;
	close(): Promise<void>;
}

/** Starts the fake on `port` (0 picks a free one), creating `buckets` if they are not there yet. */
export async function startFakeS3(options: {
	port: number;
	dir: string;
	buckets?: string[];
	host?: string;
}): Promise<FakeS3> {
	await mkdir(options.dir, { recursive: true });
	// s3rver is CommonJS without type declarations.
	const S3rver = createRequire(import.meta.url)('s3rver') as S3rverClass;
	const host = options.host ?? '127.0.0.1';
	const server = new S3rver({
		port: options.port,
		address: host,
		directory: path.resolve(options.dir),
		silent: true,
		vhostBuckets: false,
		configureBuckets: (options.buckets ?? []).map((name) => ({ name }))
	});
	const address = await server.run();
	return {
		port: address.port,
		endpoint: `http://${host}:${address.port}`,
		close: () => server.close()
	};
}

if (import.meta.url === `file://${process.argv[1]}`) {
	const port = Number(process.env.FAKE_S3_PORT ?? 4569);
	const dir = path.resolve(process.env.FAKE_S3_DIR ?? 'data/s3');
	const bucket = process.env.S3_BUCKET ?? 'journeymark';
	const fake = await startFakeS3({ port, dir, buckets: [bucket] });
	console.log(`Fake S3 on ${fake.endpoint}, bucket "${bucket}", storing in ${dir}`);
}
