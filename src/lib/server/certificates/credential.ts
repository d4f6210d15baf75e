/**
 * The portable credential: an Open Badges 3.0 `OpenBadgeCredential` (W3C Verifiable Credentials
 * Data Model 2.0) secured as a VC-JWT signed RS256, and the W3C Bitstring Status List 1.0 that
 * says whether it has been revoked. Anyone can check both with the keys at /.well-known/jwks.json.
 */
import { createHash } from 'node:crypto';
import { gzipSync } from 'node:zlib';
import type { KeyObject } from 'node:crypto';
import type { CertificateContent } from './content';
import { b64url, signJwt } from './signing';

export const CONTEXTS = [
	'https://www.w3.org/ns/credentials/v2',
	'https://purl.imsglobal.org/spec/ob/v3p0/context-3.0.3.json'
];

/** One list holds 131,072 entries: the minimum size Bitstring Status List 1.0 asks for privacy. */
export const STATUS_LIST_SIZE = 131_072;
export const STATUS_LIST_ID = 1;

export const statusListUrl = (origin: string, id = STATUS_LIST_ID) =>
	new URL(`/api/status-lists/${id}`, origin).href;

/** OB 3.0 IdentityObject: the holder's e-mail, salted and hashed, never in clear. */
export function hashedIdentity(email: string, salt: string) {
	const hash = createHash('sha256')
		.update(email.trim().toLowerCase() + salt)
		.digest('hex');
	return {
		type: 'IdentityObject',
		identityHash: `sha256$${hash}`,
		identityType: 'emailAddress',
		hashed: true,
		salt
	};
}

export function openBadgeCredential(
	c: CertificateContent,
	facts: { origin: string; email: string; statusIndex: number }
) {
	const url = (path: string) => new URL(path, facts.origin).href;
	const achievementPath =
		c.scope.kind === 'programme'
			? `/achievements/programme-${c.programme.id}`
			: `/achievements/programme-${c.programme.id}/${c.scope.code}`;
	const criteria =
		c.scope.kind === 'programme'
			? `Completed ${c.programme.name} under its ${c.programme.approach}-based rules: the required supervised on-the-job hours, related instruction and every required task signed off by a journeyworker at its required level.`
			: `Every task of the area ${c.scope.areas[0]?.name ?? c.scope.code} signed off by a journeyworker at its required level, within ${c.programme.name}.`;
	return {
		'@context': CONTEXTS,
		id: url(`/verify/${c.serial}`),
		type: ['VerifiableCredential', 'OpenBadgeCredential'],
		name: c.scope.title,
		issuer: { id: url('/'), type: ['Profile'], name: c.issuer.name, url: url('/') },
		validFrom: c.issuedAt,
		...(c.expiresAt ? { validUntil: c.expiresAt } : {}),
		credentialSubject: {
			type: ['AchievementSubject'],
			identifier: [hashedIdentity(facts.email, c.serial)],
			achievement: {
				id: url(achievementPath),
				type: ['Achievement'],
				achievementType: c.scope.kind === 'programme' ? 'ApprenticeshipCertificate' : 'Certificate',
				name: c.scope.title,
				description: `${c.scope.areas.length} area(s), ${c.scope.tasks.length} task(s) assessed; ${c.scope.hours.verified} verified on-the-job hours.`,
				criteria: { narrative: criteria },
				tag: c.scope.areas.map((a) => a.name)
			},
			result: c.scope.tasks.map((t) => ({
				type: ['Result'],
				value: `${t.code} level ${t.level}`
			}))
		},
		credentialStatus: {
			id: `${statusListUrl(facts.origin)}#${facts.statusIndex}`,
			type: 'BitstringStatusListEntry',
			statusPurpose: 'revocation',
			statusListIndex: String(facts.statusIndex),
			statusListCredential: statusListUrl(facts.origin)
		}
	};
}

/**
 * The VC-JWT: the credential's members at the top level of the payload with the registered
 * claims OB 3.0 §8.2 asks for (iss, jti, nbf, exp).
 */
export function credentialJwt(
	credential: ReturnType<typeof openBadgeCredential>,
	key: { kid: string; privateKey: KeyObject }
): string {
	const seconds = (iso: string) => Math.floor(new Date(iso).getTime() / 1000);
	return signJwt(key.privateKey, key.kid, {
		...credential,
		iss: credential.issuer.id,
		jti: credential.id,
		nbf: seconds(credential.validFrom),
		...('validUntil' in credential && credential.validUntil
			? { exp: seconds(credential.validUntil as string) }
			: {})
	});
}

/** GZIP-compressed bitstring, base64url with the multibase 'u' prefix; index 0 is the first bit. */
export function encodeBitstring(revoked: Iterable<number>, size = STATUS_LIST_SIZE): string {
	const bits = new Uint8Array(size / 8);
	for (const i of revoked) {
		if (!Number.isInteger(i) || i < 0 || i >= size) continue;
		bits[i >> 3] |= 0x80 >> (i & 7);
	}
	return `u${b64url(gzipSync(bits))}`;
}

export function statusListCredential(
	origin: string,
	issuerName: string,
	revoked: Iterable<number>,
	now: Date
) {
	const id = statusListUrl(origin);
	return {
		'@context': [CONTEXTS[0]],
		id,
		type: ['VerifiableCredential', 'BitstringStatusListCredential'],
		issuer: { id: new URL('/', origin).href, name: issuerName },
		validFrom: now.toISOString(),
		credentialSubject: {
			id: `${id}#list`,
			type: 'BitstringStatusList',
			statusPurpose: 'revocation',
			encodedList: encodeBitstring(revoked)
		}
	};
}

export function statusListJwt(
	list: ReturnType<typeof statusListCredential>,
	key: { kid: string; privateKey: KeyObject }
) {
	return signJwt(key.privateKey, key.kid, {
		...list,
		iss: list.issuer.id,
		jti: list.id,
		nbf: Math.floor(new Date(list.validFrom).getTime() / 1000)
	});
}
