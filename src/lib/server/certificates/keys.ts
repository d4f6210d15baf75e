/**
 * The issuer's signing keys, kept as files under KEYS_DIR and never in the database: an Ed25519
 * key for certificates and an RSA key for the portable credential. Each is created on first use.
 * Rotation writes a new key and keeps the old public key, so certificates signed before still
 * verify; the old private key is deleted.
 *
 * With several app instances KEYS_DIR is one shared folder. A missing key is created by linking
 * a complete temporary file into place, which fails if another instance got there first; the
 * loser reads the winner's key. Every key's public half is written to `retired/` before the key
 * becomes active, so whatever key an instance signs with stays published. Each process caches
 * the ring, re-reads it when older than `RING_MAX_AGE_MS`, and on an unknown key id at most once
 * per `MISS_RELOAD_MS` (`publishedKey`), so a rotation by another instance is seen quickly.
 */
import {
	createPrivateKey,
	createPublicKey,
	generateKeyPairSync,
	randomBytes,
	type KeyObject
} from 'node:crypto';
import { link, mkdir, readdir, readFile, rename, rm, unlink, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { config } from '../config';
import { publicJwk } from './signing';

export type KeyKind = 'ed25519' | 'rsa';

export interface ActiveKey {
	kid: string;
	privateKey: KeyObject;
	publicKey: KeyObject;
}

export interface KeyRing {
	ed25519: ActiveKey;
	rsa: ActiveKey;
	/** Every public key ever used, by kid (active ones included). */
	published: Map<string, { key: KeyObject; jwk: Record<string, string> }>;
}

/** A cached ring is re-read from KEYS_DIR when older than this. */
export const RING_MAX_AGE_MS = 60_000;
/** An unknown key id re-reads KEYS_DIR at most this often. */
export const MISS_RELOAD_MS = 5_000;

const ACTIVE = (kind: KeyKind) => `${kind}-active.pem`;
const RETIRED = 'retired';
/** How long a reader waits for a key file another process is still writing. */
const PARTIAL_WAIT_MS = 2_000;

function generate(kind: KeyKind): string {
	const pair =
		kind === 'ed25519'
			? generateKeyPairSync('ed25519')
			: generateKeyPairSync('rsa', { modulusLength: 2048 });
	return pair.privateKey.export({ format: 'pem', type: 'pkcs8' }) as string;
}

const temporary = (dir: string, name: string) =>
	path.join(dir, `.${name}.${process.pid}.${randomBytes(6).toString('hex')}.tmp`);

const code = (err: unknown) => (err as NodeJS.ErrnoException).code;

/** Creates `file` with `text` unless it exists; never leaves a partly written `file` behind. */
async function createExclusive(file: string, text: string): Promise<void> {
	const tmp = temporary(path.dirname(file), path.basename(file));
	await writeFile(tmp, text, { flag: 'wx', mode: 0o600 });
	try {
		await link(tmp, file);
	} catch (err) {
		if (code(err) === 'EEXIST') return;
		// A volume without hard links: exclusive create, written in one call (readers retry).
		if (!['EPERM', 'ENOTSUP', 'EOPNOTSUPP', 'ENOSYS', 'EXDEV'].includes(code(err) ?? '')) throw err;
		await writeFile(file, text, { flag: 'wx', mode: 0o600 }).catch((e) => {
			if (code(e) !== 'EEXIST') throw e;
		});
	} finally {
		await unlink(tmp).catch(() => undefined);
	}
}

/** Writes `file` whole through a temporary file and a rename (replacing any old one). */
async function replaceFile(file: string, text: string, mode: number): Promise<void> {
	const tmp = temporary(path.dirname(file), path.basename(file));
	await writeFile(tmp, text, { flag: 'wx', mode });
	try {
		await rename(tmp, file);
	} catch (err) {
		await unlink(tmp).catch(() => undefined);
		throw err;
	}
}

/** Reads and parses a private key, waiting briefly if another process is still writing it. */
async function readPrivate(file: string): Promise<KeyObject | null> {
	const deadline = Date.now() + PARTIAL_WAIT_MS;
	for (;;) {
		let pem: string;
		try {
			pem = await readFile(file, 'utf8');
		} catch (err) {
			if (code(err) === 'ENOENT') return null;
			throw err;
		}
		try {
			return createPrivateKey(pem);
		} catch (err) {
			if (Date.now() >= deadline) throw err;
			await new Promise((resolve) => setTimeout(resolve, 25));
		}
	}
}

/** Reads the active key of a kind, creating it if absent; racing processes end with one key. */
async function activeKey(dir: string, kind: KeyKind): Promise<ActiveKey> {
	const file = path.join(dir, ACTIVE(kind));
	let privateKey = await readPrivate(file);
	if (!privateKey) {
		await createExclusive(file, generate(kind));
		privateKey = await readPrivate(file);
		if (!privateKey) throw new Error(`The ${kind} signing key vanished from ${dir}.`);
	}
	const publicKey = createPublicKey(privateKey);
	return { kid: publicJwk(publicKey).kid, privateKey, publicKey };
}

export async function loadRing(dir = config.KEYS_DIR): Promise<KeyRing> {
	await mkdir(path.join(dir, RETIRED), { recursive: true, mode: 0o700 });
	const ed25519 = await activeKey(dir, 'ed25519');
	const rsa = await activeKey(dir, 'rsa');
	const published: KeyRing['published'] = new Map();
	for (const key of [ed25519.publicKey, rsa.publicKey]) {
		const jwk = publicJwk(key);
		published.set(jwk.kid, { key, jwk });
	}
	for (const name of (await readdir(path.join(dir, RETIRED))).sort()) {
		if (!name.endsWith('.pub.pem')) continue;
		const key = createPublicKey(await readFile(path.join(dir, RETIRED, name), 'utf8'));
		const jwk = publicJwk(key);
		published.set(jwk.kid, { key, jwk });
	}
	return { ed25519, rsa, published };
}

interface Cached {
	ring: Promise<KeyRing>;
	loadedAt: number;
}

// One ring per process and folder: reading PEM files on every verification would be the slow part.
const rings = new Map<string, Cached>();
const lastMissReload = new Map<string, number>();

function reload(dir: string, now = Date.now()): Promise<KeyRing> {
	const previous = rings.get(dir);
	const loading = loadRing(dir);
	const entry = { ring: loading, loadedAt: now };
	rings.set(dir, entry);
	// A failed re-read keeps the ring that worked; a failed first read is tried again next time.
	loading.catch(() => {
		if (rings.get(dir) !== entry) return;
		if (previous) rings.set(dir, previous);
		else rings.delete(dir);
	});
	return loading;
}

/** The key ring of `dir`, re-read from disk when older than RING_MAX_AGE_MS. */
export function ring(dir = config.KEYS_DIR): Promise<KeyRing> {
	const cached = rings.get(dir);
	const now = Date.now();
	if (!cached || now - cached.loadedAt >= RING_MAX_AGE_MS) return reload(dir, now);
	return cached.ring;
}

/**
 * The published public key with id `kid`, or undefined. An id unknown to the cached ring
 * re-reads KEYS_DIR (at most once per MISS_RELOAD_MS), so a key created by another instance
 * is found before a signature is called invalid.
 */
export async function publishedKey(
	kid: string,
	dir = config.KEYS_DIR
): Promise<KeyObject | undefined> {
	const found = (await ring(dir)).published.get(kid);
	if (found) return found.key;
	const now = Date.now();
	if (now - (lastMissReload.get(dir) ?? 0) < MISS_RELOAD_MS) return undefined;
	lastMissReload.set(dir, now);
	return (await reload(dir, now)).published.get(kid)?.key;
}

/**
 * Replaces the active key of a kind; its public half stays published under `retired/`. The new
 * key's public half is published before it becomes active.
 */
export async function rotate(kind: KeyKind, dir = config.KEYS_DIR): Promise<string> {
	const current = await activeKey(dir, kind);
	await mkdir(path.join(dir, RETIRED), { recursive: true, mode: 0o700 });
	const publish = (key: KeyObject) =>
		replaceFile(
			path.join(dir, RETIRED, `${publicJwk(key).kid}.pub.pem`),
			key.export({ format: 'pem', type: 'spki' }) as string,
			0o644
		);
	await publish(current.publicKey);
	const pem = generate(kind);
	await publish(createPublicKey(createPrivateKey(pem)));
	await replaceFile(path.join(dir, ACTIVE(kind)), pem, 0o600);
	return (await reload(dir))[kind].kid;
}

/** The JWK Set published at /.well-known/jwks.json. */
export async function jwks(dir = config.KEYS_DIR) {
	const { published } = await ring(dir);
	return { keys: [...published.values()].map((p) => p.jwk) };
}

/** For tests: forget cached rings. */
export async function forget(dir: string, remove = false) {
	rings.delete(dir);
	lastMissReload.delete(dir);
	if (remove) await rm(dir, { recursive: true, force: true });
}
