/**
 * The issuer's signing keys, kept as files under KEYS_DIR and never in the database: an Ed25519
 * key for certificates and an RSA key for the portable credential. Each is created on first use.
 * Rotation writes a new key and keeps the old public key, so certificates signed before still
 * verify; the old private key is deleted.
 */
import {
	createPrivateKey,
	createPublicKey,
	generateKeyPairSync,
	type KeyObject
} from 'node:crypto';
import { mkdir, readdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
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

const ACTIVE = (kind: KeyKind) => `${kind}-active.pem`;
const RETIRED = 'retired';

function generate(kind: KeyKind): string {
	const pair =
		kind === 'ed25519'
			? generateKeyPairSync('ed25519')
			: generateKeyPairSync('rsa', { modulusLength: 2048 });
	return pair.privateKey.export({ format: 'pem', type: 'pkcs8' }) as string;
}

/** Reads the active key of a kind, creating it if absent ('wx' so two starting processes agree). */
async function activeKey(dir: string, kind: KeyKind): Promise<ActiveKey> {
	const file = path.join(dir, ACTIVE(kind));
	let pem = await readFile(file, 'utf8').catch(() => null);
	if (pem === null) {
		try {
			await writeFile(file, generate(kind), { flag: 'wx', mode: 0o600 });
		} catch (err) {
			if ((err as NodeJS.ErrnoException).code !== 'EEXIST') throw err;
		}
		pem = await readFile(file, 'utf8');
	}
	const privateKey = createPrivateKey(pem);
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

// One ring per process and folder: reading PEM files on every verification would be the slow part.
const rings = new Map<string, Promise<KeyRing>>();

export function ring(dir = config.KEYS_DIR): Promise<KeyRing> {
	let loaded = rings.get(dir);
	if (!loaded) {
		loaded = loadRing(dir);
		loaded.catch(() => rings.delete(dir));
		rings.set(dir, loaded);
	}
	return loaded;
}

/** Replaces the active key of a kind; its public half stays published under `retired/`. */
export async function rotate(kind: KeyKind, dir = config.KEYS_DIR): Promise<string> {
	const current = await activeKey(dir, kind);
	await mkdir(path.join(dir, RETIRED), { recursive: true, mode: 0o700 });
	await writeFile(
		path.join(dir, RETIRED, `${current.kid}.pub.pem`),
		current.publicKey.export({ format: 'pem', type: 'spki' }) as string
	);
	const next = path.join(dir, `${kind}-next.pem`);
	await writeFile(next, generate(kind), { mode: 0o600 });
	await rename(next, path.join(dir, ACTIVE(kind)));
	rings.delete(dir);
	return (await ring(dir))[kind].kid;
}

/** The JWK Set published at /.well-known/jwks.json. */
export async function jwks(dir = config.KEYS_DIR) {
	const { published } = await ring(dir);
	return { keys: [...published.values()].map((p) => p.jwk) };
}

/** For tests: forget cached rings. */
export async function forget(dir: string, remove = false) {
	rings.delete(dir);
	if (remove) await rm(dir, { recursive: true, force: true });
}
