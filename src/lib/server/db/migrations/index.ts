import type { QueryInterface } from 'sequelize';
import * as foundation from './2026-12-02-01-foundation';
import * as framework from './2026-12-02-02-framework';
import * as workLog from './2026-12-02-03-work-log';
import * as reviewDigests from './2026-12-02-04-review-digests';
import * as assessment from './2026-12-02-05-assessment';
import * as signOffPhotos from './2026-12-02-06-sign-off-photos';
import * as programmeRules from './2026-12-02-07-programme-rules';
import * as certificates from './2026-12-02-08-certificates';
import * as sharedState from './2026-12-02-09-shared-state';

type Step = (params: { context: QueryInterface }) => Promise<void>;

/** Every migration, in order. Listed by hand because a bundled server cannot glob. */
export const migrations: { name: string; up: Step; down: Step }[] = [
	{ name: '2026-12-02-01-foundation', ...foundation },
	{ name: '2026-12-02-02-framework', ...framework },
	{ name: '2026-12-02-03-work-log', ...workLog },
	{ name: '2026-12-02-04-review-digests', ...reviewDigests },
	{ name: '2026-12-02-05-assessment', ...assessment },
	{ name: '2026-12-02-06-sign-off-photos', ...signOffPhotos },
	{ name: '2026-12-02-07-programme-rules', ...programmeRules },
	{ name: '2026-12-02-08-certificates', ...certificates },
	{ name: '2026-12-02-09-shared-state', ...sharedState }
];
