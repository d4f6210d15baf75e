/**
 * The demo scenario: an invented training partnership with three shops, two cohorts, twenty
 * apprentices and six journeyworkers. Every name, shop and address here is made up.
 */
import { generateIdFromEntropySize } from 'lucia';
import {
	ApprenticeProfile,
	Cohort,
	Programme,
	Site,
	SupervisorProfile,
	Supervision,
	User,
	write,
	type Role
} from '../src/lib/server/db';
import { hashPassword } from '../src/lib/server/password';

export const DEMO_PASSWORD = 'journeymark-demo';

export const DEMO_ACCOUNTS: { email: string; role: Role; name: string }[] = [
	{ email: 'apprentice@example.org', role: 'apprentice', name: 'Rosa Lindqvist' },
	{ email: 'supervisor@example.org', role: 'supervisor', name: 'Dale Okafor' },
	{ email: 'coordinator@example.org', role: 'coordinator', name: 'Priya Castellano' },
	{ email: 'admin@example.org', role: 'admin', name: 'Tomasz Whitfield' }
];

const SITES = [
	{ code: 'HSG', name: 'Harbor Street Garage', town: 'Port Alder' },
	{ code: 'MFS', name: 'Millrace Fleet Services', town: 'Millrace' },
	{ code: 'KMS', name: 'Kestrel Motors Service Bay', town: 'Kestrel Falls' }
];

const SUPERVISORS = [
	'Ines Bauer',
	'Marcus Oyelaran',
	'Hollis Vance',
	'Keiko Brandt',
	'Sam Delacroix'
];

const APPRENTICES = [
	'Amir Haddad',
	'Bea Kowalczyk',
	'Cal Mbeki',
	'Dana Ferreira',
	'Eli Sorensen',
	'Fern Achebe',
	'Gus Takahashi',
	'Hana Petrov',
	'Ivo Lindgren',
	'Jo Nakamura',
	'Kai Moreau',
	'Lena Varga',
	'Milo Quist',
	'Nia Obuya',
	'Oren Castillo',
	'Pia Halvorsen',
	'Quinn Adebayo',
	'Rafe Dumont',
	'Sol Ibarra'
];

/** The demo's programme: a hybrid standard of our invented training partnership. */
export const DEMO_PROGRAMME = {
	name: 'Automotive Service Technician (hybrid, 4 years)',
	approach: 'hybrid' as const,
	termYears: 4,
	// A hybrid standard: a specified minimum of hours and the coverage, 29 CFR 29.5(b)(2)(iii).
	ojlHours: 6000,
	rtiHoursPerYear: 144,
	probationHours: 1500,
	journeyworkerRateCents: 3400,
	wageSchedule: [
		{ fromHours: 0, percent: 55 },
		{ fromHours: 1500, percent: 65 },
		{ fromHours: 3000, percent: 75 },
		{ fromHours: 4500, percent: 85 }
	],
	ratioApprentices: 3,
	ratioJourneyworkers: 1,
	tierThresholds: [95, 80, 50] as [number, number, number],
	certificateValidityMonths: null
} satisfies Parameters<typeof Programme.create>[0];

const slug = (name: string) => name.toLowerCase().replace(/[^a-z]+/g, '.');

export async function seedDemo(): Promise<'seeded' | 'already seeded'> {
	const realUsers = await User.count({ where: { isDemo: false } });
	if (realUsers > 0) {
		throw new Error(
			`Refusing to load demo data: this database holds ${realUsers} real account(s). ` +
				'Point DATABASE_URL at a new file for the demo.'
		);
	}
	if ((await User.count()) > 0) return 'already seeded';

	const passwordHash = await hashPassword(DEMO_PASSWORD);
	await write(async (transaction) => {
		const sites = await Site.bulkCreate(SITES, { transaction });
		const programme = await Programme.create({ ...DEMO_PROGRAMME }, { transaction });
		const [autumn, spring] = await Cohort.bulkCreate(
			[
				{
					name: 'Autumn 2025 intake',
					programmeId: programme.id,
					startDate: '2025-09-01',
					plannedEndDate: '2029-08-31'
				},
				{
					name: 'Spring 2026 intake',
					programmeId: programme.id,
					startDate: '2026-03-02',
					plannedEndDate: '2030-02-28'
				}
			],
			{ transaction }
		);

		const account = (name: string, role: Role, email: string, siteId: number | null) => ({
			id: generateIdFromEntropySize(10),
			name,
			role,
			email,
			siteId,
			passwordHash,
			isDemo: true
		});
		const demo = Object.fromEntries(DEMO_ACCOUNTS.map((a) => [a.role, a]));
		const supervisorRows = [
			account(demo.supervisor.name, 'supervisor', demo.supervisor.email, sites[0].id),
			...SUPERVISORS.map((name, i) =>
				account(
					name,
					'supervisor',
					`${slug(name)}@riverbend-training.example`,
					sites[(i + 1) % 3].id
				)
			)
		];
		const apprenticeRows = [
			account(demo.apprentice.name, 'apprentice', demo.apprentice.email, sites[0].id),
			...APPRENTICES.map((name, i) =>
				account(
					name,
					'apprentice',
					`${slug(name)}@riverbend-training.example`,
					sites[(i + 1) % 3].id
				)
			)
		];
		await User.bulkCreate(
			[
				...supervisorRows,
				...apprenticeRows,
				account(demo.coordinator.name, 'coordinator', demo.coordinator.email, null),
				account(demo.admin.name, 'admin', demo.admin.email, null)
			],
			{ transaction }
		);
		await SupervisorProfile.bulkCreate(
			supervisorRows.map((s, i) => ({
				userId: s.id,
				qualification: 'Automotive service technician, journeyworker',
				qualifiedSince: `${2008 + i}-06-30`,
				shift: i % 3 === 2 ? ('late' as const) : ('day' as const)
			})),
			{ transaction }
		);
		await ApprenticeProfile.bulkCreate(
			apprenticeRows.map((a, i) => {
				const cohort = i < 12 ? autumn : spring;
				return {
					userId: a.id,
					cohortId: cohort.id,
					startDate: cohort.startDate,
					plannedEndDate: cohort.plannedEndDate,
					priorCreditHours: i % 7 === 3 ? 500 : 0
				};
			}),
			{ transaction }
		);
		// Each apprentice works beside the journeyworkers of their own shop.
		await Supervision.bulkCreate(
			apprenticeRows.flatMap((a) =>
				supervisorRows
					.filter((s) => s.siteId === a.siteId)
					.map((s) => ({ apprenticeId: a.id, supervisorId: s.id }))
			),
			{ transaction }
		);
	});
	return 'seeded';
}
