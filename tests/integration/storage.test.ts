import { HeadObjectCommand } from '@aws-sdk/client-s3';
import { randomBytes, randomUUID } from 'node:crypto';
import { existsSync } from 'node:fs';
import { mkdir, mkdtemp, readdir, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import {
	assertKey,
	checkBucket,
	localDisk,
	s3Client,
	s3Storage,
	type S3Options,
	type Storage
} from '../../src/lib/server/storage';
import { FAKE_S3_KEYS, startFakeS3, type FakeS3 } from '../../fakes/s3';

const BUCKET = 'journeymark-test';

let fake: FakeS3;
let fakeDir: string;
let parent: string;
let root: string;

const s3Options = (over: Partial<S3Options> = {}): S3Options => ({
	bucket: BUCKET,
	endpoint: fake.endpoint,
	region: 'us-east-1',
	forcePathStyle: true,
	...FAKE_S3_KEYS,
	...over
});

beforeAll(async () => {
	fakeDir = await mkdtemp(path.join(os.tmpdir(), 'journeymark-s3-'));
	fake = await startFakeS3({ port: 0, dir: fakeDir, buckets: [BUCKET] });
});

afterAll(async () => {
	await fake.close();
	await rm(fakeDir, { recursive: true, force: true });
});

beforeEach(async () => {
	parent = await mkdtemp(path.join(os.tmpdir(), 'journeymark-storage-'));
	root = path.join(parent, 'uploads');
});

afterEach(async () => {
	await rm(parent, { recursive: true, force: true });
});

async function filesUnder(dir: string): Promise<string[]> {
	const entries = await readdir(dir, { recursive: true, withFileTypes: true });
	return entries.filter((e) => e.isFile()).map((e) => path.join(e.parentPath, e.name));
}

const backends: [string, () => Storage][] = [
	['local disk', () => localDisk(root)],
	['S3 bucket (fake)', () => s3Storage(s3Options())]
];

describe.each(backends)('%s', (_name, make) => {
	let storage: Storage;
	beforeEach(() => {
		storage = make();
	});

	it('returns exactly the bytes stored: 300 KB of random binary', async () => {
		const key = `evidence/${randomUUID()}`;
		const bytes = randomBytes(300_000);
		await storage.put(key, bytes, 'application/octet-stream');
		const stored = await storage.get(key);
		expect(Buffer.isBuffer(stored)).toBe(true);
		expect(stored!.equals(bytes)).toBe(true);
	});

	it('returns exactly the bytes stored: a PNG, from a Uint8Array', async () => {
		const png = await sharp({
			create: {
				width: 64,
				height: 48,
				channels: 4,
				background: { r: 200, g: 40, b: 0, alpha: 0.5 }
			}
		})
			.png()
			.toBuffer();
		const key = `thumbs/${randomUUID()}`;
		await storage.put(key, new Uint8Array(png), 'image/png');
		expect((await storage.get(key))!.equals(png)).toBe(true);
	});

	it('returns null for a key never stored', async () => {
		expect(await storage.get(randomUUID())).toBeNull();
		expect(await storage.get(`evidence/${randomUUID()}`)).toBeNull();
	});

	it('replaces on a second put', async () => {
		const key = `evidence/${randomUUID()}`;
		await storage.put(key, Buffer.from('first'), 'application/pdf');
		await storage.put(key, Buffer.from('second version'), 'application/pdf');
		expect((await storage.get(key))?.toString()).toBe('second version');
	});

	it('shows one whole version when writes race', async () => {
		const key = randomUUID();
		const versions = Array.from({ length: 8 }, (_, i) => Buffer.alloc(50_000 + i * 1000, i));
		await Promise.all(versions.map((bytes) => storage.put(key, bytes, 'image/png')));
		const stored = await storage.get(key);
		expect(versions.some((bytes) => stored?.equals(bytes))).toBe(true);
	});

	it('deletes, and deleting again or deleting what never was is not an error', async () => {
		const key = `thumbs/${randomUUID()}`;
		await storage.put(key, Buffer.from('x'), 'image/webp');
		await storage.delete(key);
		expect(await storage.get(key)).toBeNull();
		await expect(storage.delete(key)).resolves.toBeUndefined();
		await expect(storage.delete(`thumbs/${randomUUID()}`)).resolves.toBeUndefined();
	});

	// OWASP ASVS 4.0.3 V12: never use the user's file name or a path from the request as a key
	it.each([
		'../escape',
		'evidence/../../escape',
		'..',
		'/etc/passwd',
		'evidence//double',
		'evidence/',
		'',
		'Evidence/ABC',
		'photo.jpg',
		'evidence\\win',
		'evidence/%2e%2e',
		'a b',
		'x'.repeat(201)
	])('refuses the key %j for put, get and delete', async (key) => {
		await expect(storage.put(key, Buffer.from('x'), 'image/jpeg')).rejects.toThrow(/Refused/);
		await expect(storage.get(key)).rejects.toThrow(/Refused/);
		await expect(storage.delete(key)).rejects.toThrow(/Refused/);
	});
});

describe('local disk specifics', () => {
	it('creates folders as needed and leaves no temporary files', async () => {
		const storage = localDisk(root);
		const key = `evidence/${randomUUID()}`;
		await storage.put(key, Buffer.from('first'), 'image/jpeg');
		await storage.put(key, Buffer.from('second'), 'image/jpeg');
		expect(existsSync(path.join(root, key))).toBe(true);
		expect(await filesUnder(root)).toEqual([path.join(root, key)]);
	});

	it('leaves one file when writes race', async () => {
		const storage = localDisk(root);
		const key = randomUUID();
		await Promise.all(
			Array.from({ length: 12 }, (_, i) => storage.put(key, Buffer.alloc(50_000, i), 'image/png'))
		);
		expect(await filesUnder(root)).toHaveLength(1);
	});

	it('cleans up its temporary file when the write cannot finish', async () => {
		const storage = localDisk(root);
		const key = 'evidence/occupied';
		await mkdir(path.join(root, key), { recursive: true });
		await expect(storage.put(key, Buffer.from('x'), 'image/jpeg')).rejects.toThrow();
		expect(await filesUnder(root)).toEqual([]);
	});

	it('writes nothing outside the root for a ../ key', async () => {
		const storage = localDisk(root);
		await expect(storage.put('../escape', Buffer.from('x'), 'image/jpeg')).rejects.toThrow();
		expect(existsSync(path.join(parent, 'escape'))).toBe(false);
		expect(existsSync(root)).toBe(false);
	});
});

describe('S3 specifics', () => {
	const head = (Key: string) =>
		s3Client(s3Options()).send(new HeadObjectCommand({ Bucket: BUCKET, Key }));

	it('stores the content type with the object', async () => {
		const storage = s3Storage(s3Options());
		const key = `evidence/${randomUUID()}`;
		await storage.put(key, Buffer.from('%PDF-1.7 test'), 'application/pdf');
		const object = await head(key);
		expect(object.ContentType).toBe('application/pdf');
		expect(object.ContentLength).toBe(13);
	});

	it('keeps a prefix apart and refuses an unsafe one', async () => {
		const certificates = s3Storage({ ...s3Options(), prefix: 'certificates' });
		const plain = s3Storage(s3Options());
		const key = `jm-${randomUUID()}-a4`;
		await certificates.put(key, Buffer.from('pdf'), 'application/pdf');
		expect((await head(`certificates/${key}`)).ContentType).toBe('application/pdf');
		expect(await plain.get(key)).toBeNull();
		expect((await plain.get(`certificates/${key}`))?.toString()).toBe('pdf');
		await certificates.delete(key);
		expect(await plain.get(`certificates/${key}`)).toBeNull();
		expect(() => s3Storage({ ...s3Options(), prefix: '../up' })).toThrow(/Refused/);
	});

	it('treats a missing bucket as a fault, not as a missing object', async () => {
		const storage = s3Storage(s3Options({ bucket: 'no-such-bucket' }));
		await expect(storage.get(randomUUID())).rejects.toThrow();
		await expect(storage.put(randomUUID(), Buffer.from('x'), 'image/png')).rejects.toThrow();
		expect(await readdir(fakeDir)).toEqual([BUCKET]);
	});

	it('refuses one key without the other', () => {
		expect(() => s3Storage(s3Options({ secretAccessKey: undefined }))).toThrow(
			/S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY must be set together/
		);
	});
});

describe('checking the bucket before start', () => {
	it('passes for a bucket that exists', async () => {
		await expect(checkBucket(s3Options())).resolves.toBeUndefined();
	});

	it('refuses a bucket that does not exist, and creates nothing', async () => {
		const before = await filesUnder(fakeDir);
		await expect(checkBucket(s3Options({ bucket: 'missing-bucket' }))).rejects.toThrow(
			`Storage bucket "missing-bucket" at ${fake.endpoint} does not exist. Create it first or correct S3_BUCKET.`
		);
		expect(await readdir(fakeDir)).toEqual([BUCKET]);
		expect(await filesUnder(fakeDir)).toEqual(before);
	});

	it('refuses wrong keys as access denied', async () => {
		await expect(
			checkBucket(s3Options({ accessKeyId: 'WRONG', secretAccessKey: 'WRONG' }))
		).rejects.toThrow(`Storage bucket "${BUCKET}" at ${fake.endpoint}: access denied.`);
	});

	it('refuses an endpoint nobody answers on, quickly and without retries', async () => {
		const started = Date.now();
		const error = await checkBucket(s3Options({ endpoint: 'http://127.0.0.1:1' })).catch(
			(e: Error) => e
		);
		expect(error).toBeInstanceOf(Error);
		expect((error as Error).message).toMatch(
			new RegExp(`^Storage bucket "${BUCKET}" at http://127\\.0\\.0\\.1:1 could not be reached: `)
		);
		expect((error as Error).message).toMatch(/ECONNREFUSED/);
		expect(Date.now() - started).toBeLessThan(4_000);
	});

	it('gives up after the timeout when the endpoint never answers', async () => {
		const net = await import('node:net');
		// Accepts connections and never replies.
		const silent = net.createServer(() => {});
		await new Promise<void>((resolve) => silent.listen(0, '127.0.0.1', resolve));
		const { port } = silent.address() as import('node:net').AddressInfo;
		const started = Date.now();
		try {
			await expect(
				checkBucket(s3Options({ endpoint: `http://127.0.0.1:${port}` }), 500)
			).rejects.toThrow(/could not be reached: no answer within 0\.5 s\./);
			expect(Date.now() - started).toBeLessThan(3_000);
		} finally {
			silent.close();
		}
	});
});

describe('storage keys', () => {
	it('accepts random ids and folder/id keys', () => {
		expect(() => assertKey(randomUUID())).not.toThrow();
		expect(() => assertKey(`evidence/2025/${randomUUID()}`)).not.toThrow();
	});
});
