/**
 * Signatures for certificates: Ed25519 (RFC 8032) over RFC 8785 canonical JSON, and RS256
 * compact JWS for the portable credential. Plain functions over Node's crypto keys.
 */
import { createHash, createPublicKey, sign, verify, type KeyObject } from 'node:crypto';
import { canonicalJson } from '../assessment/chain';

export const b64url = (bytes: Uint8Array | string) => Buffer.from(bytes).toString('base64url');

/** Ed25519 signature of raw bytes; the single signing call every certificate goes through. */
export function signBytes(privateKey: KeyObject, message: Uint8Array): Buffer {
	if (privateKey.asymmetricKeyType !== 'ed25519') throw new TypeError('Expected an Ed25519 key.');
	return sign(null, message, privateKey);
}

export function verifyBytes(publicKey: KeyObject, message: Uint8Array, signature: Uint8Array) {
	if (publicKey.asymmetricKeyType !== 'ed25519' || signature.length !== 64) return false;
	try {
		return verify(null, message, publicKey, signature);
	} catch {
		return false;
	}
}

/** Signs the canonical form of `content`; returns that text and the base64url signature. */
export function signContent(privateKey: KeyObject, content: object) {
	const text = canonicalJson(content);
	return { text, signature: b64url(signBytes(privateKey, Buffer.from(text, 'utf8'))) };
}

/** Checks a stored canonical text against its signature; false for anything malformed. */
export function verifyContent(publicKey: KeyObject, text: string, signature: string): boolean {
	if (!/^[A-Za-z0-9_-]{86}$/.test(signature)) return false;
	return verifyBytes(publicKey, Buffer.from(text, 'utf8'), Buffer.from(signature, 'base64url'));
}

/** A public key as a JWK with its RFC 7638 thumbprint as `kid`. */
export function publicJwk(key: KeyObject): Record<string, string> {
	const pub = key.type === 'public' ? key : createPublicKey(key);
	const jwk = pub.export({ format: 'jwk' }) as Record<string, string>;
	const members: Record<string, string> =
		jwk.kty === 'OKP'
			? { crv: jwk.crv, kty: jwk.kty, x: jwk.x }
			: { e: jwk.e, kty: jwk.kty, n: jwk.n };
	const kid = b64url(createHash('sha256').update(canonicalJson(members)).digest());
	const usage = jwk.kty === 'OKP' ? { alg: 'EdDSA', use: 'sig' } : { alg: 'RS256', use: 'sig' };
	return { ...members, ...usage, kid };
}

/** A compact JWS (RFC 7515) signed RS256, as VC-JWT needs. */
export function signJwt(privateKey: KeyObject, kid: string, payload: object, typ = 'JWT'): string {
	if (privateKey.asymmetricKeyType !== 'rsa') throw new TypeError('Expected an RSA key.');
	const header = b64url(JSON.stringify({ alg: 'RS256', kid, typ }));
	const body = b64url(JSON.stringify(payload));
	const signature = sign('sha256', Buffer.from(`${header}.${body}`), privateKey);
	return `${header}.${body}.${b64url(signature)}`;
}
