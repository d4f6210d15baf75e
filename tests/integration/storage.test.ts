import { randomUUID } from 'node:crypto';
import { existsSync } from 'node:fs';
import { mkdir, mkdtemp, readdir, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { assertKey, localDisk, type Storage } from '../../src/lib/server/storage';

let parent: string;
let root: string;
let storage: Storage;

beforeEach(async () => {
	parent = await mkdtemp(path.join(os.tmpdir(), 'journeymark-storage-'));
	root = path.join(parent, 'uploads');
	storage = localDisk(root);
});

afterEach(async () => {
	await rm(parent, { recursive: true, force: true });
});

async function filesUnder(dir: string): Promise<string[]> {
	const entries = await readdir(dir, { recursive: true, withFileTypes: true });
	return entries.filter((e) => e.isFile()).map((e) => path.join(e.parentPath, e.name));
}

describe('local disk storage', () => {
	it('stores and returns the same bytes, creating folders as needed', async () => {
		const key = `evidence/${randomUUID()}`;
		const bytes = Buffer.from('brake pad thickness photo');
		await storage.put(key, bytes, 'image/jpeg');
		expect(await storage.get(key)).toEqual(bytes);
		expect(existsSync(path.join(root, key))).toBe(true);
	});

	it('returns null for a key never stored', async () => {
		expect(await storage.get(randomUUID())).toBeNull();
	});

	it('replaces on a second put and leaves no temporary files', async () => {
		const key = `evidence/${randomUUID()}`;
		await storage.put(key, Buffer.from('first'), 'application/pdf');
		await storage.put(key, Buffer.from('second version'), 'application/pdf');
		expect((await storage.get(key))?.toString()).toBe('second version');
		expect(await filesUnder(root)).toEqual([path.join(root, key)]);
	});

	it('never shows a half-written file when writes race', async () => {
		const key = randomUUID();
		const versions = Array.from({ length: 12 }, (_, i) => Buffer.alloc(50_000 + i * 1000, i));
		await Promise.all(versions.map((bytes) => storage.put(key, bytes, 'image/png')));
		const stored = await storage.get(key);
		expect(versions.some((bytes) => stored?.equals(bytes))).toBe(true);
		expect(await filesUnder(root)).toHaveLength(1);
	});

	it('deletes, and deleting again is not an error', async () => {
		const key = `thumbs/${randomUUID()}`;
		await storage.put(key, Buffer.from('x'), 'image/webp');
		await storage.delete(key);
		expect(await storage.get(key)).toBeNull();
		await expect(storage.delete(key)).resolves.toBeUndefined();
	});

	it('cleans up its temporary file when the write cannot finish', async () => {
		const key = 'evidence/occupied';
		await mkdir(path.join(root, key), { recursive: true });
		await expect(storage.put(key, Buffer.from('x'), 'image/jpeg')).rejects.toThrow();
		expect(await filesUnder(root)).toEqual([]);
	});
});

describe('storage keys', () => {
	// OWASP ASVS 4.0.3 V12: never use the user's file name or a path from the request on disk
	const refused = [
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
	];

	it.each(refused)('refuses %j for put, get and delete', async (key) => {
		await expect(storage.put(key, Buffer.from('x'), 'image/jpeg')).rejects.toThrow(/Refused/);
		await expect(storage.get(key)).rejects.toThrow(/Refused/);
		await expect(storage.delete(key)).rejects.toThrow(/Refused/);
	});

	it('writes nothing outside the root for a ../ key', async () => {
		await expect(storage.put('../escape', Buffer.from('x'), 'image/jpeg')).rejects.toThrow();
		expect(existsSync(path.join(parent, 'escape'))).toBe(false);
		expect(existsSync(root)).toBe(false);
	});

	it('accepts random ids and folder/id keys', () => {
		expect(() => assertKey(randomUUID())).not.toThrow();
		expect(() => assertKey(`evidence/2025/${randomUUID()}`)).not.toThrow();
	});
});
