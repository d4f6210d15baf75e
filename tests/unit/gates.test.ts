import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import {
	signOffProblems,
	signatureDigest,
	stepField,
	type SignOffContent,
	type SignOffFacts
} from '$lib/server/assessment/gates';

/** Facts for a sign-off that passes every gate; tests change one thing at a time. */
function facts(overrides: Partial<SignOffFacts> = {}): SignOffFacts {
	return {
		level: 3,
		requiredLevel: 3,
		minHours: 6,
		verifiedTenths: 72,
		quizPassed: true,
		checklist: [
			{ stepId: 41, safety: true },
			{ stepId: 42, safety: false },
			{ stepId: 43, safety: true },
			{ stepId: 44, safety: false }
		],
		results: { 41: 'met', 42: 'met', 43: 'met', 44: 'n/a' },
		supervisorAssigned: true,
		supervisorQualified: true,
		selfSignOff: false,
		...overrides
	};
}

describe('signOffProblems', () => {
	it('finds nothing wrong with a complete, qualified sign-off', () => {
		expect(signOffProblems(facts())).toEqual({});
	});

	it('says how many verified hours there are against the task minimum', () => {
		expect(signOffProblems(facts({ verifiedTenths: 35 }))).toEqual({
			hours: 'RO hours verified so far: 3.5 h of the 6 h this task needs.'
		});
		expect(signOffProblems(facts({ verifiedTenths: 0, minHours: 2.5 })).hours).toBe(
			'RO hours verified so far: 0 h of the 2.5 h this task needs.'
		);
	});

	it('accepts hours exactly at the minimum, compared in tenths', () => {
		expect(signOffProblems(facts({ verifiedTenths: 60 }))).toEqual({});
		// 0.1 + 0.2 is 0.30000000000000004 in binary; as tenths it is exactly 3.
		expect(signOffProblems(facts({ verifiedTenths: 3, minHours: 0.1 + 0.2 }))).toEqual({});
		expect(signOffProblems(facts({ verifiedTenths: 59 })).hours).toMatch(/5\.9 h of the 6 h/);
	});

	it('needs a passing knowledge check on file', () => {
		expect(signOffProblems(facts({ quizPassed: false }))).toEqual({
			quiz: 'No passing knowledge check is on file: the apprentice must pass one first.'
		});
	});

	it('needs a result for every checklist step, named by its place on the list', () => {
		const problems = signOffProblems(facts({ results: { 41: 'met', 43: 'met', 44: 'met' } }));
		expect(problems).toEqual({
			[stepField(42)]: 'Checklist step 2 has no result: mark it met, not met or n/a.'
		});
		expect(stepField(42)).toBe('step-42');
	});

	it('treats an unknown result word as no result', () => {
		const results = {
			41: 'met',
			42: 'yes',
			43: 'met',
			44: 'met'
		} as unknown as SignOffFacts['results'];
		expect(signOffProblems(facts({ results }))).toHaveProperty(
			'step-42',
			'Checklist step 2 has no result: mark it met, not met or n/a.'
		);
	});

	it('never allows a safety step to be marked n/a, at any level', () => {
		for (const level of [1, 2, 3, 4] as const) {
			const problems = signOffProblems(
				facts({ level, requiredLevel: 4, results: { 41: 'met', 42: 'met', 43: 'n/a', 44: 'met' } })
			);
			expect(problems).toEqual({
				'step-43': 'Checklist step 3 is a safety step: it can never be marked n/a.'
			});
		}
	});

	it('needs every safety step met at level 3 or above', () => {
		const results = { 41: 'not met', 42: 'met', 43: 'met', 44: 'met' } as const;
		expect(signOffProblems(facts({ level: 3, requiredLevel: 4, results }))).toEqual({
			'step-41':
				'Checklist step 1 is a safety step and was not met: a sign-off at level 3 Supervised needs every safety step met.'
		});
		expect(signOffProblems(facts({ level: 4, requiredLevel: 4, results }))['step-41']).toMatch(
			/level 4 Independent/
		);
	});

	it('lets a safety step go unmet below level 3 while the task is not yet at its required level', () => {
		const results = { 41: 'not met', 42: 'not met', 43: 'met', 44: 'met' } as const;
		expect(signOffProblems(facts({ level: 2, requiredLevel: 3, results }))).toEqual({});
		expect(signOffProblems(facts({ level: 1, requiredLevel: 4, results }))).toEqual({});
	});

	it('needs every safety step met in the sign-off that reaches the required level', () => {
		const results = { 41: 'not met', 42: 'met', 43: 'met', 44: 'met' } as const;
		expect(signOffProblems(facts({ level: 2, requiredLevel: 2, results }))).toEqual({
			'step-41':
				'Checklist step 1 is a safety step and was not met: a sign-off at the level this task requires needs every safety step met.'
		});
	});

	it('allows an ordinary step to be not met or n/a', () => {
		const results = { 41: 'met', 42: 'not met', 43: 'met', 44: 'n/a' } as const;
		expect(signOffProblems(facts({ level: 4, requiredLevel: 4, results }))).toEqual({});
	});

	it('refuses results for steps that are not on the checklist', () => {
		const results = { 41: 'met', 42: 'met', 43: 'met', 44: 'met', 99: 'met' } as const;
		expect(signOffProblems(facts({ results }))).toEqual({
			results: "The results name a step that is not on this task's checklist."
		});
	});

	it('needs the journeyworker assigned to this apprentice', () => {
		expect(signOffProblems(facts({ supervisorAssigned: false }))).toEqual({
			supervisor: 'You are not assigned to supervise this apprentice.'
		});
	});

	it('needs the journeyworker qualification', () => {
		expect(signOffProblems(facts({ supervisorQualified: false }))).toEqual({
			qualification:
				'Your account does not hold the journeyworker qualification needed to sign off.'
		});
	});

	it('refuses anyone signing off their own work (segregation of duties, OWASP ASVS 4.0.3 V4)', () => {
		const problems = signOffProblems(facts({ selfSignOff: true, supervisorAssigned: false }));
		expect(problems).toEqual({
			supervisor: 'Nobody signs off their own work: ask your journeyworker to assess it.'
		});
	});

	it('refuses a level outside 1 to 4', () => {
		const level = 5 as unknown as SignOffFacts['level'];
		expect(signOffProblems(facts({ level }))).toEqual({
			level: 'Choose a level from 1 Observed to 4 Independent.'
		});
	});

	it('reports every problem at once', () => {
		const problems = signOffProblems(
			facts({
				verifiedTenths: 10,
				quizPassed: false,
				results: { 41: 'n/a', 43: 'not met', 44: 'met' },
				supervisorAssigned: false,
				supervisorQualified: false
			})
		);
		expect(Object.keys(problems).sort()).toEqual(
			['hours', 'qualification', 'quiz', 'step-41', 'step-42', 'step-43', 'supervisor'].sort()
		);
	});
});

describe('signatureDigest', () => {
	const content: SignOffContent = {
		supervisorId: 'u-jw-7',
		apprenticeId: 'u-ap-3',
		taskCode: 'BRK-03',
		frameworkVersion: 4,
		level: 3,
		results: { 41: 'met', 42: 'not met' },
		verifiedTenths: 72,
		quizAttemptId: 15,
		signedAt: '2027-03-04T09:15:00.000Z',
		sessionHash: 'c'.repeat(64)
	};

	it('is the SHA-256 of this exact canonical text, so stored digests stay checkable', () => {
		// Keys sorted per RFC 8785 §3.2.3 (from memory); written out by hand here.
		const canonical =
			'{"apprenticeId":"u-ap-3","frameworkVersion":4,"level":3,"quizAttemptId":15,' +
			'"results":{"41":"met","42":"not met"},' +
			`"sessionHash":"${'c'.repeat(64)}","signedAt":"2027-03-04T09:15:00.000Z",` +
			'"supervisorId":"u-jw-7","taskCode":"BRK-03","verifiedTenths":72}';
		const expected = createHash('sha256').update(canonical, 'utf8').digest('hex');
		expect(signatureDigest(content)).toBe(expected);
	});

	it('does not depend on key order', () => {
		const reordered: SignOffContent = {
			sessionHash: content.sessionHash,
			signedAt: content.signedAt,
			results: { 42: 'not met', 41: 'met' },
			quizAttemptId: 15,
			verifiedTenths: 72,
			level: 3,
			frameworkVersion: 4,
			taskCode: 'BRK-03',
			apprenticeId: 'u-ap-3',
			supervisorId: 'u-jw-7'
		};
		expect(signatureDigest(reordered)).toBe(signatureDigest(content));
	});

	it('changes when any signed field changes', () => {
		const base = signatureDigest(content);
		const changes: Partial<SignOffContent>[] = [
			{ supervisorId: 'u-jw-8' },
			{ apprenticeId: 'u-ap-4' },
			{ taskCode: 'BRK-04' },
			{ frameworkVersion: 5 },
			{ level: 4 },
			{ results: { 41: 'met', 42: 'met' } },
			{ verifiedTenths: 73 },
			{ quizAttemptId: null },
			{ signedAt: '2027-03-04T09:15:00.001Z' },
			{ sessionHash: 'd'.repeat(64) }
		];
		const digests = changes.map((change) => signatureDigest({ ...content, ...change }));
		expect(digests.every((digest) => digest !== base)).toBe(true);
		expect(new Set(digests).size).toBe(changes.length);
	});

	it('hashes a Date as its ISO text and refuses what is not JSON', () => {
		const withDate = { ...content, signedAt: new Date(content.signedAt) };
		expect(signatureDigest(withDate)).toBe(signatureDigest(content));
		expect(() => signatureDigest({ ...content, verifiedTenths: Number.NaN })).toThrow();
	});
});
