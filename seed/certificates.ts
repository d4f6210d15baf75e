/**
 * Demo certificates, issued through the same code a coordinator uses, for areas the demo
 * sign-offs complete: valid ones, one withdrawn and one lapsed. Serials come from fixed bytes so
 * the README can list them.
 */
import { createHash } from 'node:crypto';
import type { SignedInUser } from '../src/lib/server/auth';
import * as certificates from '../src/lib/server/certificates';
import { addMonths } from '../src/lib/server/certificates/content';
import { Certificate, Programme, User } from '../src/lib/server/db';
import { qualification } from '../src/lib/server/progress';
import { DEMO_ACCOUNTS } from './demo';

/** The demo programme asks for renewal after this many months, so a lapsed certificate exists. */
export const DEMO_VALIDITY_MONTHS = 4;

const DAY = 86_400_000;

/** Fixed serial bytes per demo certificate: the same serials in every fresh demo. */
export const demoSerialBytes = (name: string) =>
	createHash('sha256').update(`journeymark demo certificate ${name}`).digest().subarray(0, 10);

type Plan = { name: string; email: string; area: string; fate: 'valid' | 'revoked' | 'expired' };

export const DEMO_CERTIFICATES: Plan[] = [
	{ name: 'valid', email: 'apprentice@example.org', area: 'SAF', fate: 'valid' },
	{
		name: 'valid-brakes',
		email: 'bea.kowalczyk@riverbend-training.example',
		area: 'BRK',
		fate: 'valid'
	},
	{
		name: 'expired',
		email: 'bea.kowalczyk@riverbend-training.example',
		area: 'SAF',
		fate: 'expired'
	},
	{
		name: 'revoked',
		email: 'ivo.lindgren@riverbend-training.example',
		area: 'SAF',
		fate: 'revoked'
	}
];

export async function seedCertificates(now = new Date()) {
	if ((await Certificate.count()) > 0) return 'already seeded' as const;
	const coordinatorRow = await User.findOne({
		where: { email: DEMO_ACCOUNTS.find((a) => a.role === 'coordinator')!.email },
		rejectOnEmpty: true
	});
	const coordinator = {
		id: coordinatorRow.id,
		email: coordinatorRow.email,
		name: coordinatorRow.name,
		role: coordinatorRow.role,
		active: true,
		siteId: null
	} as SignedInUser;
	await Programme.update({ certificateValidityMonths: DEMO_VALIDITY_MONTHS }, { where: {} });

	const issued: { serial: string; holder: string; area: string; fate: Plan['fate'] }[] = [];
	const skipped: string[] = [];
	for (const plan of DEMO_CERTIFICATES) {
		const holder = await User.findOne({ where: { email: plan.email } });
		const standing = holder && (await qualification(holder.id));
		const area = standing?.areas.find((a) => a.code === plan.area);
		if (!holder || !area?.complete) {
			skipped.push(`${plan.name} (${plan.email} has not completed ${plan.area})`);
			continue;
		}
		const completed = Math.max(...area.tasks.map((t) => new Date(t.signedAt).getTime()));
		// A lapsed one was issued just after the area was complete and before its renewal date.
		const lapsedBy = addMonths(now, -DEMO_VALIDITY_MONTHS).getTime() - DAY;
		const issuedAt =
			plan.fate === 'valid'
				? now
				: new Date(
						plan.fate === 'expired'
							? Math.min(completed + DAY, lapsedBy)
							: Math.min(completed + 2 * DAY, now.getTime() - 20 * DAY)
					);
		const { serial } = await certificates.issue(
			coordinator,
			{ apprenticeId: holder.id, scope: `area:${plan.area}` },
			{ now: issuedAt, serialBytes: () => demoSerialBytes(plan.name), notify: false }
		);
		if (plan.fate === 'revoked') {
			await certificates.revoke(
				coordinator,
				serial,
				{ reason: 'issued-in-error', note: 'Demo: issued to the wrong apprentice record.' },
				new Date(issuedAt.getTime() + 10 * DAY)
			);
		}
		issued.push({ serial, holder: holder.name, area: plan.area, fate: plan.fate });
	}
	return { issued, skipped };
}
