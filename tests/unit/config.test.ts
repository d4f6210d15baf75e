import { describe, expect, it } from 'vitest';
import { readConfig, sqlitePath } from '$lib/server/config';

describe('settings', () => {
	it('reads a SQLite path in its usual spellings', () => {
		expect(sqlitePath('data/x.db')).toMatch(/\/data\/x\.db$/);
		expect(sqlitePath('file:data/x.db')).toMatch(/\/data\/x\.db$/);
		expect(sqlitePath('sqlite://data/x.db')).toMatch(/\/data\/x\.db$/);
		expect(sqlitePath(':memory:')).toBe(':memory:');
	});

	it('refuses a database URL it cannot serve, with a clear message', () => {
		expect(() => sqlitePath('mysql://db.example/jm')).toThrow(/not a SQLite path/);
	});

	it('refuses an ORIGIN that is not a URL', () => {
		expect(() => readConfig({ ORIGIN: 'localhost' })).toThrow(/ORIGIN/);
	});

	it('defaults to a database file under data/', () => {
		expect(readConfig({}).databasePath).toMatch(/\/data\/journeymark\.db$/);
	});
});
