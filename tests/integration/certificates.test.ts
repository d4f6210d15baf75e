import jsQR from 'jsqr';
import { createLocalJWKSet, decodeProtectedHeader, jwtVerify } from 'jose';
import { gunzipSync } from 'node:zlib';
import { beforeAll, describe, expect, it, vi } from 'vitest';

// Keys and rendered PDFs go in this file's temporary folder (beside its mail folder; DATABASE_URL
// may be a PostgreSQL address), before any server module loads.
vi.hoisted(() => {
	const dir = process.env.FAKE_MAIL_DIR!.replace(/[^/\\]+$/, '');
	process.env.KEYS_DIR = `${dir}keys`;
	process.env.CERTIFICATES_DIR = `${dir}pdf`;
});

import { normaliseSerial } from '$lib/certificates';
import type { SignedInUser } from '$lib/server/auth';
import * as certificates from '$lib/server/certificates';
import {
	AuditEvent,
	Certificate,
	prepare,
	Programme,
	sequelize,
	SignOff,
	Task,
	User
} from '$lib/server/db';
import * as framework from '$lib/server/framework';
import { EntryProblem } from '$lib/server/worklog/errors';
import { GET as verifyRoute } from '../../src/routes/api/verify/[serial]/+server';
import { GET as jwksRoute } from '../../src/routes/.well-known/jwks.json/+server';
import { GET as statusRoute } from '../../src/routes/api/status-lists/[id]/+server';
import { GET as credentialRoute } from '../../src/routes/api/certificates/[serial]/credential/+server';
import { seedDemo } from '../../seed/demo';
import { enlarge, readPdf } from '../helpers/pdf';
import { waitForMail } from '../helpers/mail';
import { signed, byRole as demo } from '../helpers/accounts';
import { call } from '../helpers/route';

let coordinator: SignedInUser;
let apprentice: SignedInUser;
let supervisor: SignedInUser;
let other: SignedInUser;

const refusal = async (promise: Promise<unknown>) => {
	try {
		await promise;
	} catch (err) {
		if (err instanceof EntryProblem) return { status: err.status, errors: err.errors };
		throw err;
	}
	throw new Error('expected a refusal');
};

/** Signs off every task of an area at its required level, as journeyworkers would have. */
async function completeArea(
	apprenticeId: string,
	areaCode: string,
	signedAt = new Date('2026-10-01T09:00:00Z')
) {
	const current = (await framework.current())!;
	const tasks = await Task.findAll({ where: { frameworkId: current.id }, include: ['area'] });
	const inArea = tasks.filter(
		(t) => (t as unknown as { area: { code: string } }).area.code === areaCode
	);
	expect(inArea.length).toBeGreaterThan(0);
	await SignOff.bulkCreate(
		inArea.map((t) => ({
			kind: 'sign-off' as const,
			apprenticeId,
			taskId: t.id,
			frameworkId: current.id,
			supervisorId: supervisor.id,
			level: t.requiredLevel as 1 | 2 | 3 | 4,
			results: {},
			quizAttemptId: null,
			verifiedTenths: Math.round(t.minHours * 10),
			refersToId: null,
			reason: null,
			sessionHash: 'f'.repeat(64),
			contentHash: 'e'.repeat(64),
			signedAt
		}))
	);
	return inArea;
}

const counts = async () => ({
	certificates: await Certificate.count(),
	audit: await AuditEvent.count()
});

beforeAll(async () => {
	await prepare();
	await framework.ensureDefault();
	await seedDemo();
	coordinator = await demo('coordinator');
	apprentice = await demo('apprentice');
	supervisor = await demo('supervisor');
	other = signed(
		await User.findOne({
			where: { role: 'apprentice', email: 'bea.kowalczyk@riverbend-training.example' },
			rejectOnEmpty: true
		})
	);
});

describe('issuing', () => {
	it('refuses whoever is not a coordinator, bad input and unknown apprentices, storing nothing', async () => {
		const before = await counts();
		expect(
			(
				await refusal(
					certificates.issue(apprentice, { apprenticeId: apprentice.id, scope: 'area:SAF' })
				)
			).status
		).toBe(403);
		expect(
			(
				await refusal(
					certificates.issue(coordinator, { apprenticeId: apprentice.id, scope: 'everything' })
				)
			).errors.scope
		).toMatch(/covers/);
		expect((await refusal(certificates.issue(coordinator, { scope: 'programme' }))).status).toBe(
			400
		);
		expect(
			(
				await refusal(
					certificates.issue(coordinator, { apprenticeId: 'x'.repeat(41), scope: 'programme' })
				)
			).status
		).toBe(400);
		expect(
			(
				await refusal(
					certificates.issue(coordinator, { apprenticeId: supervisor.id, scope: 'programme' })
				)
			).status
		).toBe(404);
		expect(await counts()).toEqual(before);
	});

	it('refuses when the apprentice does not qualify, saying what is missing', async () => {
		const before = await counts();
		const programme = await refusal(
			certificates.issue(coordinator, { apprenticeId: apprentice.id, scope: 'programme' })
		);
		expect(programme.status).toBe(409);
		expect(programme.errors.missing.length).toBeGreaterThan(0);
		const area = await refusal(
			certificates.issue(coordinator, { apprenticeId: apprentice.id, scope: 'area:SAF' })
		);
		expect(area.status).toBe(409);
		expect(area.errors.missing).toMatch(/SAF-01/);
		expect(
			(
				await refusal(
					certificates.issue(coordinator, { apprenticeId: apprentice.id, scope: 'area:ZZZ' })
				)
			).errors.missing
		).toMatch(/no area ZZZ/);
		expect(await counts()).toEqual(before);
	});

	let serial = '';

	it('issues an interim credential once the area is complete, signs it, audits it and e-mails the PDF', async () => {
		const tasks = await completeArea(apprentice.id, 'SAF');
		const result = await certificates.issue(coordinator, {
			apprenticeId: apprentice.id,
			scope: 'area:SAF'
		});
		serial = result.serial;
		expect(serial).toMatch(
			/^JM-[0-9A-HJKMNP-TV-Z]{4}(-[0-9A-HJKMNP-TV-Z]{4}){3}-[0-9A-HJKMNP-TV-Z]$/
		);
		expect(normaliseSerial(serial)).toBe(serial);
		expect(result.mailed).toBe(true);

		const view = (await certificates.lookup(serial))!;
		expect(view).toMatchObject({
			status: 'valid',
			holder: apprentice.name,
			signatureValid: true,
			expiresAt: null
		});
		expect(view.tasks).toBe(tasks.length);
		const event = await AuditEvent.findOne({
			where: { subject: `certificate:${serial}` },
			rejectOnEmpty: true
		});
		expect(event.kind).toBe('certificate.issued');

		const mail = await waitForMail(
			process.env.FAKE_MAIL_DIR!,
			apprentice.email,
			/Your certificate/
		);
		expect(mail.text).toContain(`/verify/${serial}`);
		expect(mail.attachments).toEqual([
			expect.objectContaining({ filename: `${serial}.pdf`, contentType: 'application/pdf' })
		]);
		expect(mail.attachments[0].size).toBeGreaterThan(10_000);
	});

	it('refuses a second certificate for the same holder and scope while one is valid', async () => {
		const before = await counts();
		const again = await refusal(
			certificates.issue(coordinator, { apprenticeId: apprentice.id, scope: 'area:SAF' })
		);
		expect(again.status).toBe(409);
		expect(again.errors.form).toContain(serial);
		expect(await counts()).toEqual(before);
	});

	it('answers the public API with exactly the documented fields, and 4xx for bad serials', async () => {
		const response = await call(verifyRoute, { serial: serial.toLowerCase() });
		expect(response.status).toBe(200);
		const body = await response.json();
		expect(Object.keys(body).sort()).toEqual(
			[
				'expiresAt',
				'holder',
				'issuedAt',
				'programme',
				'scope',
				'serial',
				'signatureValid',
				'status'
			].sort()
		);
		expect(body).toMatchObject({
			serial,
			status: 'valid',
			holder: apprentice.name,
			signatureValid: true
		});
		expect(body.scope).toEqual([expect.objectContaining({ code: 'SAF' })]);
		expect(JSON.stringify(body)).not.toContain(apprentice.email);

		// A serial with a correct check character that was never issued.
		const unknown = normaliseSerial('JM-0000-0000-0000-0000-0')!;
		const missing = await call(verifyRoute, { serial: unknown });
		expect(missing.status).toBe(404);
		expect(await missing.json()).toEqual({ status: 'unknown' });
		// One character changed: the check character catches it.
		const altered = serial.slice(0, 3) + (serial[3] === 'A' ? 'B' : 'A') + serial.slice(4);
		expect((await call(verifyRoute, { serial: altered })).status).toBe(400);
		expect((await call(verifyRoute, { serial: 'not-a-serial' })).status).toBe(400);
		expect((await call(verifyRoute, { serial: 'JM-' + 'A'.repeat(5000) })).status).toBe(400);
	});

	it('limits lookups per address, with Retry-After', async () => {
		const address = '198.51.100.77';
		const statuses: number[] = [];
		for (let i = 0; i < 121; i++) {
			statuses.push((await call(verifyRoute, { serial }, { address })).status);
		}
		expect(statuses.slice(0, 120).every((s) => s === 200)).toBe(true);
		const refused = await call(verifyRoute, { serial }, { address });
		expect(refused.status).toBe(429);
		expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
		expect((await call(verifyRoute, { serial }, { address: '198.51.100.78' })).status).toBe(200);
	});

	it('shows a changed record as not matching its signature', async () => {
		const row = await Certificate.findOne({ where: { serial }, rejectOnEmpty: true });
		const original = row.content;
		await sequelize.query('UPDATE certificates SET content = ? WHERE serial = ?', {
			replacements: [original.replace(apprentice.name, 'Someone Else'), serial]
		});
		expect((await certificates.lookup(serial))!.signatureValid).toBe(false);
		await sequelize.query('UPDATE certificates SET content = ? WHERE serial = ?', {
			replacements: [original, serial]
		});
		expect((await certificates.lookup(serial))!.signatureValid).toBe(true);
	});
});

describe('portable credential', () => {
	let serial = '';
	let jwks: ReturnType<typeof createLocalJWKSet>;

	const statusBit = async (index: number) => {
		const jwt = await (await call(statusRoute, { id: '1' })).text();
		const { payload } = await jwtVerify(jwt, jwks, { algorithms: ['RS256'] });
		const encoded = (payload.credentialSubject as { encodedList: string }).encodedList;
		expect(encoded[0]).toBe('u'); // multibase base64url, W3C Bitstring Status List 1.0 §2.1
		const bits = gunzipSync(Buffer.from(encoded.slice(1), 'base64url'));
		expect(bits.length).toBe(16_384); // 131,072 entries, the specification's minimum
		return (bits[index >> 3] >> (7 - (index & 7))) & 1;
	};

	beforeAll(async () => {
		await completeArea(other.id, 'BRK');
		serial = (
			await certificates.issue(
				coordinator,
				{ apprenticeId: other.id, scope: 'area:BRK' },
				{ notify: false }
			)
		).serial;
		const published = await (await call(jwksRoute, {})).json();
		expect(published.keys.map((k: { kty: string }) => k.kty).sort()).toEqual(['OKP', 'RSA']);
		// Only what the issuer publishes: the JWK Set, as a stranger would fetch it.
		jwks = createLocalJWKSet(published);
	});

	it('is an Open Badges 3.0 credential that verifies with the published keys alone', async () => {
		const response = await call(credentialRoute, { serial }, { user: other });
		expect(response.status).toBe(200);
		expect(response.headers.get('content-type')).toBe('application/vc+jwt');
		const jwt = await response.text();
		expect(decodeProtectedHeader(jwt)).toMatchObject({ alg: 'RS256' });
		const { payload } = await jwtVerify(jwt, jwks, { algorithms: ['RS256'] });
		// Required members of the OB 3.0 AchievementCredential JSON schema and its Achievement
		// (memory: the schema file was not read here).
		for (const key of [
			'@context',
			'type',
			'id',
			'issuer',
			'validFrom',
			'credentialSubject',
			'name'
		])
			expect(payload).toHaveProperty(key);
		expect(payload['@context']).toEqual([
			'https://www.w3.org/ns/credentials/v2',
			'https://purl.imsglobal.org/spec/ob/v3p0/context-3.0.3.json'
		]);
		expect(payload.type).toEqual(['VerifiableCredential', 'OpenBadgeCredential']);
		const subject = payload.credentialSubject as {
			achievement: Record<string, unknown>;
			identifier: Record<string, unknown>[];
		};
		expect(subject.achievement).toMatchObject({
			type: ['Achievement'],
			criteria: { narrative: expect.any(String) }
		});
		expect(subject.achievement.name).toBeTruthy();
		expect(subject.achievement.description).toBeTruthy();
		expect(subject.identifier[0]).toMatchObject({
			type: 'IdentityObject',
			hashed: true,
			identityType: 'emailAddress'
		});
		expect(JSON.stringify(payload)).not.toContain(other.email);
		// VC-JWT registered claims, OB 3.0 §8.2 (memory).
		expect(payload.iss).toBe((payload.issuer as { id: string }).id);
		expect(payload.jti).toBe(payload.id);
		expect(payload.nbf).toBe(Math.floor(Date.parse(payload.validFrom as string) / 1000));
		const status = payload.credentialStatus as Record<string, string>;
		expect(status).toMatchObject({ type: 'BitstringStatusListEntry', statusPurpose: 'revocation' });
		expect(status.statusListCredential).toBe('http://localhost:3999/api/status-lists/1');
		expect(await statusBit(Number(status.statusListIndex))).toBe(0);
	});

	it('fails verification when one byte of it is altered', async () => {
		const jwt = await (await call(credentialRoute, { serial }, { user: other })).text();
		const [header, body, signature] = jwt.split('.');
		const bytes = Buffer.from(body, 'base64url');
		bytes[10] ^= 0x01;
		await expect(
			jwtVerify(`${header}.${bytes.toString('base64url')}.${signature}`, jwks)
		).rejects.toThrow();
		const sig = Buffer.from(signature, 'base64url');
		sig[0] ^= 0x01;
		await expect(
			jwtVerify(`${header}.${body}.${sig.toString('base64url')}`, jwks)
		).rejects.toThrow();
	});

	it('is not handed to other people, nor for an altered serial', async () => {
		expect((await call(credentialRoute, { serial }, { user: apprentice })).status).toBe(404);
		const altered = serial.slice(0, -1) + (serial.endsWith('A') ? 'B' : 'A');
		expect((await call(credentialRoute, { serial: altered }, { user: other })).status).toBe(400);
	});

	it('shows as revoked in the status list once the certificate is withdrawn', async () => {
		const before = await counts();
		const noReason = await refusal(
			certificates.revoke(coordinator, serial, { note: 'no reason given' })
		);
		expect(noReason.status).toBe(400);
		expect(noReason.errors.reason).toMatch(/reason/);
		expect(
			(await refusal(certificates.revoke(coordinator, serial, { reason: 'because' }))).status
		).toBe(400);
		expect(
			(await refusal(certificates.revoke(other, serial, { reason: 'misconduct' }))).status
		).toBe(403);
		expect(
			(
				await refusal(
					certificates.revoke(coordinator, 'JM-0000-0000-0000-0000-0', { reason: 'misconduct' })
				)
			).status
		).toBe(404);
		expect(await counts()).toEqual(before);

		// Read first, so the lookup's kept statement has run before the revocation is written.
		expect((await certificates.lookup(serial))!.status).toBe('valid');
		await certificates.revoke(coordinator, serial, {
			reason: 'sign-off-withdrawn',
			note: 'BRK-03 revoked after review'
		});
		const jwt = await (await call(credentialRoute, { serial }, { user: other })).text();
		const { payload } = await jwtVerify(jwt, jwks);
		const index = Number((payload.credentialStatus as Record<string, string>).statusListIndex);
		expect(await statusBit(index)).toBe(1);

		const view = (await certificates.lookup(serial))!;
		expect(view.status).toBe('revoked');
		expect(view.revoked?.reason).toMatch(/assessment it relied on was withdrawn/);
		expect(JSON.stringify(view)).not.toContain('BRK-03 revoked after review');
		const api = await (await call(verifyRoute, { serial })).json();
		expect(api.status).toBe('revoked');

		expect(
			(await refusal(certificates.revoke(coordinator, serial, { reason: 'misconduct' }))).status
		).toBe(409);
	});

	it('never reissues a revoked serial: a new certificate for the same scope gets a new one', async () => {
		const again = await certificates.issue(
			coordinator,
			{ apprenticeId: other.id, scope: 'area:BRK' },
			{ notify: false }
		);
		expect(again.serial).not.toBe(serial);
		// Even a serial source that keeps offering the revoked serial cannot reuse it.
		const row = await Certificate.findOne({ where: { serial }, rejectOnEmpty: true });
		await certificates.revoke(coordinator, again.serial, { reason: 'issued-in-error' });
		const bytesOf = (s: string) => {
			let value = 0n;
			for (const c of s.replace(/^JM-|-.$/g, '').replace(/-/g, ''))
				value = value * 32n + BigInt('0123456789ABCDEFGHJKMNPQRSTVWXYZ'.indexOf(c));
			return Uint8Array.from({ length: 10 }, (_, i) =>
				Number((value >> BigInt(8 * (9 - i))) & 255n)
			);
		};
		await expect(
			certificates.issue(
				coordinator,
				{ apprenticeId: other.id, scope: 'area:BRK' },
				{ notify: false, serialBytes: () => bytesOf(row.serial) }
			)
		).rejects.toThrow(/unused serial/);
		expect(await Certificate.count({ where: { serial } })).toBe(1);
	});
});

describe('expiry and keys', () => {
	it('marks a certificate past its programme validity as expired, and then allows a new one', async () => {
		const holder = signed(
			await User.findOne({
				where: { email: 'cal.mbeki@riverbend-training.example' },
				rejectOnEmpty: true
			})
		);
		await completeArea(holder.id, 'HVS');
		await Programme.update({ certificateValidityMonths: 12 }, { where: {} });
		try {
			const old = await certificates.issue(
				coordinator,
				{ apprenticeId: holder.id, scope: 'area:HVS' },
				{ notify: false, now: new Date('2024-03-31T12:00:00Z') }
			);
			const view = (await certificates.lookup(old.serial))!;
			expect(view.expiresAt).toBe('2025-03-31T12:00:00.000Z');
			expect(view.status).toBe('expired');
			expect(view.signatureValid).toBe(true);
			const fresh = await certificates.issue(
				coordinator,
				{ apprenticeId: holder.id, scope: 'area:HVS' },
				{ notify: false }
			);
			expect((await certificates.lookup(fresh.serial))!.status).toBe('valid');
		} finally {
			await Programme.update({ certificateValidityMonths: null }, { where: {} });
		}
	});

	it('keeps verifying certificates signed before a key rotation', async () => {
		const [first] = await Certificate.findAll({ order: [['id', 'ASC']], limit: 1 });
		const before = await certificates.jwks();
		const newKid = await certificates.rotate('ed25519');
		expect(newKid).not.toBe(first.keyId);
		const after = await certificates.jwks();
		expect(after.keys.map((k) => k.kid)).toEqual(
			expect.arrayContaining([...before.keys.map((k) => k.kid), newKid])
		);
		expect((await certificates.lookup(first.serial))!.signatureValid).toBe(true);
	});
});

describe('the PDF', () => {
	it('reads back with pdf.js: serial and holder as text, a task page, and a QR code to the verify page', async () => {
		const row = await Certificate.findOne({
			where: { apprenticeId: apprentice.id },
			rejectOnEmpty: true
		});
		for (const [paper, size] of [
			['a4', [595.28, 841.89]],
			['letter', [612, 792]]
		] as const) {
			const pages = await readPdf(await certificates.pdfFor(row, paper));
			expect(pages.length).toBeGreaterThanOrEqual(2);
			expect([pages[0].width, pages[0].height]).toEqual(size);
			expect(pages[0].text).toContain(row.serial);
			expect(pages[0].text).toContain(apprentice.name);
			expect(pages[1].text).toContain('Tasks covered');
			expect(pages[1].text).toMatch(/SAF-01[\s\S]*SAF-12/);
			// QR decoded by jsQR, an independent reader (ISO/IEC 18004).
			const [qr] = pages[0].images;
			const big = enlarge(qr, 8);
			expect(jsQR(big.rgba, big.width, big.height)?.data).toBe(
				`http://localhost:3999/verify/${row.serial}`
			);
		}
	});

	it('is served only to its holder and coordinators', async () => {
		const { GET } = await import('../../src/routes/api/certificates/[serial]/pdf/+server');
		const row = await Certificate.findOne({
			where: { apprenticeId: apprentice.id },
			rejectOnEmpty: true
		});
		const url = new URL(`http://localhost:3999/api/certificates/${row.serial}/pdf?paper=letter`);
		const mine = await call(GET, { serial: row.serial }, { user: apprentice, url });
		expect(mine.status).toBe(200);
		expect(mine.headers.get('content-type')).toBe('application/pdf');
		expect((await call(GET, { serial: row.serial }, { user: other, url })).status).toBe(404);
		expect((await call(GET, { serial: row.serial }, { user: coordinator, url })).status).toBe(200);
		const bad = new URL(`${url.origin}${url.pathname}?paper=tabloid`);
		expect((await call(GET, { serial: row.serial }, { user: coordinator, url: bad })).status).toBe(
			400
		);
		expect((await call(GET, { serial: row.serial }, { url })).status).toBe(401);
	});
});
