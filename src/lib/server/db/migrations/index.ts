import type { QueryInterface } from 'sequelize';
import * as foundation from './2026-12-02-01-foundation';

type Step = (params: { context: QueryInterface }) => Promise<void>;

/** Every migration, in order. Listed by hand because a bundled server cannot glob. */
export const migrations: { name: string; up: Step; down: Step }[] = [
	{ name: '2026-12-02-01-foundation', ...foundation }
];
