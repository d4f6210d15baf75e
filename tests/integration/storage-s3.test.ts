/** The app with STORAGE=s3 against the fake bucket: evidence, sign-off photo reads, certificate PDFs. */
import { HeadObjectCommand } from '@aws-sdk/client-s3';
import { createHash } from 'node:crypto';
import { existsSync } from 'node:fs';
import { readdir } from 'node:fs/promises';
import path from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FAKE_S3_KEYS, startFakeS3 } from '../../fakes/s3';

// Settings are read once at import: start the fake and set them before any server module loads.
// This file's temporary folder (its mail folder's parent); DATABASE_URL may be a URL.
const dir = process.env.FAKE_MAIL_DIR!.replace(/[^/\\]+$/, '');
const BUCKET = 'journeymark-app';
const fake = await startFakeS3({ port: 0, dir: path.join(dir, 's3'), buckets: [BUCKET] });
Object.assign(process.env, {
	STORAGE: 's3',
	S3_BUCKET: BUCKET,
	S3_ENDPOINT: fake.endpoint,
	S3_FORCE_PATH_STYLE: 'true',
	S3_ACCESS_KEY_ID: FAKE_S3_KEYS.accessKeyId,
	S3_SECRET_ACCESS_KEY: FAKE_S3_KEYS.secretAccessKey,
	UPLOADS_DIR: path.join(dir, 'uploads'),
	CERTIFICATES_DIR: path.join(dir, 'pdf'),
	KEYS_DIR: path.join(dir, 'keys')
});

const { Certificate, Evidence, prepare, Supervision } = await import('$lib/server/db');
const framework = await import('$lib/server/framework');
const worklog = await import('$lib/server/worklog');
const certificates = await import('$lib/server/certificates');
const { checkStorage, s3Client, storageFromConfig } = await import('$lib/server/storage');
const { CONTENT_FORMAT } = await import('$lib/server/certificates/content');
const { seedDemo } = await import('../../seed/demo');
const { byRole } = await import('../helpers/accounts');
const { GET: evidenceRoute } = await import('../../src/routes/api/evidence/[id]/+server');
const { call } = await import('../helpers/route');

const client = s3Client({
	bucket: BUCKET,
	endpoint: fake.endpoint,
	forcePathStyle: true,
	...FAKE_S3_KEYS
});
const head = (Key: string) => client.send(new HeadObjectCommand({ Bucket: BUCKET, Key }));

beforeAll(async () => {
	await prepare();
	await framework.ensureDefault();
	await seedDemo();
}, 120_000);

afterAll(() => fake.close());

describe('STORAGE=s3', () => {
	it('passes the start-up check for the configured bucket', async () => {
		await expect(checkStorage()).resolves.toBeUndefined();
	});

	it('stores an evidence upload in the bucket and nothing on disk', async () => {
		const apprentice = await byRole('apprentice');
		const supervision = await Supervision.findOne({
			where: { apprenticeId: apprentice.id },
			rejectOnEmpty: true
		});
		const current = (await framework.current())!;
		const [task] = (await framework.tasks(current.id, { limit: 1, offset: 0 })).rows;
		const entry = await worklog.create(
			apprentice,
			{
				workDate: '2026-02-03',
				startTime: '08:00',
				endTime: '09:00',
				repairOrder: 'RO-70112',
				vehicleYear: 2020,
				vehicleMake: 'Compact hatch',
				vehicleModel: 'base',
				vin: '1J9RP1A36A1644345',
				vinOverride: false,
				odometerUnit: 'mi',
				supervisorId: supervision.supervisorId,
				notes: '',
				tasks: [{ taskId: task.id, hours: 1 }]
			},
			'draft'
		);
		const png = await sharp({
			create: { width: 640, height: 480, channels: 3, background: '#2a5aa0' }
		})
			.png()
			.toBuffer();
		const { id } = await worklog.attach(apprentice, entry.id, png, 'rotor.png');

		const row = await Evidence.findByPk(id, { rejectOnEmpty: true });
		const object = await head(row.storageKey);
		expect(object.ContentType).toBe(row.mime);
		expect(object.ContentLength).toBe(row.bytes);
		expect((await head(row.thumbnailKey!)).ContentType).toBe('image/webp');

		const read = await worklog.readEvidence(apprentice, id, false);
		expect(read!.bytes.length).toBe(row.bytes);
		expect((await storageFromConfig().get(row.storageKey))!.equals(read!.bytes)).toBe(true);

		const response = await call(evidenceRoute, { id: String(id) }, { user: apprentice });
		expect(response.status).toBe(200);
		expect(Buffer.from(await response.arrayBuffer()).equals(read!.bytes)).toBe(true);

		expect(existsSync(process.env.UPLOADS_DIR!)).toBe(false);
		expect(await readdir(path.join(dir, 's3'))).toEqual([BUCKET]);
	});

	it('caches certificate PDFs in the bucket under certificates/, not in CERTIFICATES_DIR', async () => {
		const serial = 'JM-7RKB-DPEN-0XAA-8HNN-R';
		const certificate = Certificate.build({
			serial,
			signature: 'test-signature',
			content: JSON.stringify({
				format: CONTENT_FORMAT,
				serial,
				holder: 'Test Holder',
				programme: { id: 1, name: 'Test programme', approach: 'hybrid' },
				scope: {
					kind: 'area',
					code: 'SAF',
					title: 'Shop safety',
					areas: [],
					tasks: [],
					hours: { verified: 120, priorCredit: 0, relatedInstruction: 20 }
				},
				issuedAt: '2026-10-01T09:00:00.000Z',
				expiresAt: null,
				issuer: { name: 'Test issuer', url: 'http://localhost:3999', signedBy: 'Coordinator' },
				keyId: 'test'
			})
		} as never);
		const first = await certificates.pdfFor(certificate, 'letter');
		expect(Buffer.from(first.subarray(0, 5)).toString()).toBe('%PDF-');

		const version = createHash('sha256').update('test-signature').digest('hex').slice(0, 16);
		const key = `certificates/${serial.toLowerCase()}-letter-${version}`;
		const object = await head(key);
		expect(object.ContentType).toBe('application/pdf');
		expect(object.ContentLength).toBe(first.length);

		// The second call is served from the bucket: same bytes, even if rendering would differ.
		const second = await certificates.pdfFor(certificate, 'letter');
		expect(Buffer.from(second).equals(Buffer.from(first))).toBe(true);
		expect(existsSync(process.env.CERTIFICATES_DIR!)).toBe(false);
	});
});
