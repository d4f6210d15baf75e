import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import type { FrameworkDef } from '../../src/lib/framework/schema';
import { CSV_COLUMNS, fromCsv, MAX_CSV_BYTES, toCsv } from '../../src/lib/server/framework/csv';
import { DEFAULT_FRAMEWORK } from '../../src/lib/server/framework/default';

const HEADER = CSV_COLUMNS.join(',');

/** A small valid file: one area, one task with one of every kind of row. */
function goodRows(): string[] {
	return [
		HEADER,
		'framework,,,,Test framework,,,,,,,,,',
		'area,BRK,,,Brakes,,,,,,,,,',
		'task,BRK,BRK-01,,Replace pads and rotors,Both wheels of one axle.,1,4,6,,,,,',
		'step,BRK,BRK-01,,Raise the vehicle at the lift points,,,,,,,,yes,',
		'step,BRK,BRK-01,,Measure rotor runout,,,,,,,,no,',
		'spec,BRK,BRK-01,,Wheel nut torque,,,,,140,lbf·ft,nominal,,',
		'tool,BRK,BRK-01,,Torque wrench,,,,,,,,,',
		'caution,BRK,BRK-01,,Never hang a caliper by its hose.,,,,,,,,,',
		'info,BRK,BRK-01,,repair procedure,,,,,,,,,',
		'question,BRK,BRK-01,1,What do you do below discard thickness?,It cannot shed heat.,,,,,,,,',
		'option,BRK,BRK-01,1,Replace the rotor,,,,,,,,,yes',
		'option,BRK,BRK-01,1,Machine it,,,,,,,,,no'
	];
}

const csv = (rows: string[]) => rows.join('\n') + '\n';

function errorsOf(text: string) {
	const result = fromCsv(text);
	if (result.ok) throw new Error('expected the file to be refused');
	return result.errors;
}

describe('toCsv', () => {
	it('writes one header and one row per item, values in the unit entered', () => {
		const text = toCsv(DEFAULT_FRAMEWORK);
		expect(text.startsWith('\uFEFF' + HEADER + '\r\n')).toBe(true);
		const rows = parse(text, { bom: true, columns: true }) as Record<string, string>[];
		const tasks = DEFAULT_FRAMEWORK.areas.flatMap((area) => area.tasks);
		expect(rows.filter((row) => row.record === 'task')).toHaveLength(tasks.length);
		expect(rows.filter((row) => row.record === 'step')).toHaveLength(
			tasks.reduce((sum, task) => sum + task.checklist.length, 0)
		);
		expect(rows[0]).toMatchObject({ record: 'framework', text: DEFAULT_FRAMEWORK.name });
		expect(rows[1]).toMatchObject({ record: 'area', area: 'SAF' });
		const wheelNuts = rows.find(
			(row) => row.record === 'spec' && row.task === 'BRK-01' && /Wheel nut/.test(row.text)
		);
		expect(wheelNuts).toMatchObject({ value: '140', unit: 'N·m', limit: 'nominal' });
		expect(new Set(rows.map((row) => row.safety))).toEqual(new Set(['', 'yes', 'no']));
	});
});

describe('fromCsv', () => {
	it('reads back the default framework unchanged', () => {
		const result = fromCsv(toCsv(DEFAULT_FRAMEWORK));
		expect(result.ok ? [] : result.errors).toEqual([]);
		if (!result.ok) return;
		expect(result.def).toEqual(DEFAULT_FRAMEWORK);
		expect(result.counts.areas).toBe(11);
		expect(result.counts.tasks).toBe(DEFAULT_FRAMEWORK.areas.flatMap((a) => a.tasks).length);
	});

	it('reads a small file with every kind of row', () => {
		const result = fromCsv(csv(goodRows()));
		expect(result.ok ? [] : result.errors).toEqual([]);
		if (!result.ok) return;
		const task = result.def.areas[0].tasks[0];
		expect(task).toMatchObject({ code: 'BRK-01', tier: 1, requiredLevel: 4, minHours: 6 });
		expect(task.checklist).toEqual([
			{ text: 'Raise the vehicle at the lift points', safety: true },
			{ text: 'Measure rotor runout' }
		]);
		expect(task.specs).toEqual([
			{ label: 'Wheel nut torque', value: 140, unit: 'lbf·ft', limit: 'nominal' }
		]);
		expect(task.questions[0].options).toEqual([
			{ text: 'Replace the rotor', correct: true },
			{ text: 'Machine it', correct: false }
		]);
		expect(result.counts).toEqual({
			areas: 1,
			tasks: 1,
			steps: 2,
			specs: 1,
			tools: 1,
			cautions: 1,
			info: 1,
			questions: 1,
			options: 2
		});
	});

	it('reports the line and column of one bad row among good ones, and returns no definition', () => {
		const rows = goodRows();
		rows[3] = 'task,BRK,BRK-01,,Replace pads and rotors,Both wheels of one axle.,7,4,6,,,,,';
		const result = fromCsv(csv(rows));
		expect(result.ok).toBe(false);
		expect('def' in result).toBe(false);
		expect(errorsOf(csv(rows))).toEqual([
			{ line: 4, column: 'tier', message: 'The priority tier is 1, 2 or 3.' }
		]);
	});

	it('reports an unclosed quote once, at the row where it opens', () => {
		const rows = goodRows();
		rows[7] = 'tool,BRK,BRK-01,,"Torque wrench,,,,,,,,,';
		const errors = errorsOf(csv(rows));
		expect(errors).toHaveLength(1);
		expect(errors[0].line).toBe(8);
		expect(errors[0].message).toMatch(/never closed/);
	});

	it('keeps an inch mark inside an unquoted cell', () => {
		const rows = goodRows();
		rows[7] = 'tool,BRK,BRK-01,,1/2" drive torque wrench,,,,,,,,,';
		const result = fromCsv(csv(rows));
		expect(result.ok && result.def.areas[0].tasks[0].tools).toEqual(['1/2" drive torque wrench']);
	});

	it('reports an unknown unit and an absurd torque at their cells', () => {
		const rows = goodRows();
		rows[6] = 'spec,BRK,BRK-01,,Wheel nut torque,,,,,140,furlong,nominal,,';
		rows.splice(7, 0, 'spec,BRK,BRK-01,,Wheel nut torque,,,,,10000,N·m,nominal,,');
		const errors = errorsOf(csv(rows));
		expect(errors.map(({ line, column }) => ({ line, column }))).toEqual([
			{ line: 7, column: 'unit' },
			{ line: 8, column: 'value' }
		]);
		expect(errors[0].message).toMatch(/Use one of these units/);
		// common practice, no published source: no light-vehicle wheel nut takes 10 000 N·m
		expect(errors[1].message).toMatch(/torque above 3000 N·m/);
	});

	it('accepts keyboard spellings of units', () => {
		const rows = goodRows();
		rows[6] = 'spec,BRK,BRK-01,,Wheel nut torque,,,,,140,lb-ft,nominal,,';
		const result = fromCsv(csv(rows));
		expect(result.ok && result.def.areas[0].tasks[0].specs[0].unit).toBe('lbf·ft');
	});

	it('refuses a duplicate task code at the second row, naming the first', () => {
		const rows = [...goodRows(), 'task,BRK,BRK-01,,Another title,Another task.,2,3,1,,,,,'];
		expect(errorsOf(csv(rows))).toEqual([
			{ line: 14, column: 'task', message: 'Task BRK-01 is already defined on line 4.' }
		]);
	});

	it('reports rows pointing to a missing task or question, and a question without a correct option', () => {
		const rows = goodRows();
		rows[11] = 'option,BRK,BRK-01,1,Replace the rotor,,,,,,,,,no';
		rows.push('step,BRK,BRK-09,,Orphan step,,,,,,,,no,');
		rows.push('option,BRK,BRK-01,2,Orphan option,,,,,,,,,yes');
		rows.push('tool,ENG,BRK-01,,Dial indicator,,,,,,,,,');
		expect(errorsOf(csv(rows))).toEqual([
			{ line: 11, column: null, message: 'Mark at least one option as correct.' },
			{ line: 14, column: 'task', message: 'There is no task row for BRK-09.' },
			{ line: 15, column: 'question', message: 'Task BRK-01 has no question 2.' },
			{ line: 16, column: 'area', message: 'Task BRK-01 is in area BRK, not ENG.' }
		]);
	});

	it('lists every row error, in line order', () => {
		const rows = goodRows();
		rows[3] = 'task,BRK,BRK-01,,Replace pads and rotors,Both wheels of one axle.,1,4,six,,,,,';
		rows[4] = 'stpe,BRK,BRK-01,,Raise the vehicle,,,,,,,,yes,';
		rows[6] = 'spec,BRK,BRK-01,,Wheel nut torque,,,,,"1,5",N·m,nominal,,';
		rows[8] = 'caution,BRK,BRK-01,,Never hang a caliper by its hose.,,,,,,,,maybe,';
		const errors = errorsOf(csv(rows));
		expect(errors.map(({ line, column }) => ({ line, column }))).toEqual([
			{ line: 4, column: 'min_hours' },
			{ line: 5, column: 'record' },
			{ line: 7, column: 'value' },
			{ line: 9, column: 'safety' }
		]);
		expect(errors[2].message).toBe('Use a dot for decimals, like 2.5.');
	});

	it('reports missing and unknown columns in the header', () => {
		const rows = goodRows();
		rows[0] = HEADER.replace(',min_hours', ',minimum hours').replace(',correct', '');
		const errors = errorsOf(csv(rows));
		expect(errors.every((error) => error.line === 1)).toBe(true);
		expect(errors.map((error) => error.column).sort()).toEqual(
			['correct', 'min_hours', 'minimum hours'].sort()
		);
	});

	it('refuses empty and oversized files', () => {
		expect(errorsOf('')).toEqual([
			{ line: 1, column: null, message: expect.stringMatching(/empty/) }
		]);
		expect(errorsOf('\uFEFF\r\n\r\n')[0].message).toMatch(/empty/);
		const huge = csv(goodRows()) + 'x'.repeat(MAX_CSV_BYTES);
		expect(errorsOf(huge)).toEqual([
			{ line: 1, column: null, message: expect.stringMatching(/5 MB/) }
		]);
	});

	it('refuses a file without a framework row', () => {
		const rows = goodRows().filter((row) => !row.startsWith('framework'));
		expect(errorsOf(csv(rows))).toEqual([
			{ line: 1, column: null, message: expect.stringMatching(/no framework row/) }
		]);
	});

	it('accepts a byte-order mark, CRLF line ends and blank rows, counting lines as a spreadsheet does', () => {
		const rows = goodRows();
		const text =
			'\uFEFF' + [...rows.slice(0, 3), ',,,,,,,,,,,,,', ...rows.slice(3)].join('\r\n') + '\r\n';
		const result = fromCsv(text);
		expect(result.ok ? [] : result.errors).toEqual([]);
		const broken = text.replace(
			'Replace pads and rotors,Both wheels of one axle.,1',
			'Replace pads and rotors,Both wheels of one axle.,9'
		);
		expect(errorsOf(broken)).toEqual([
			{ line: 5, column: 'tier', message: 'The priority tier is 1, 2 or 3.' }
		]);
	});

	it('defuses spreadsheet formulas on export and restores the text on import', () => {
		// OWASP CSV injection guidance: prefix cells starting with = + - @ so they are not run.
		const hostile = "=cmd|' /C calc'!A0";
		const def: FrameworkDef = structuredClone(DEFAULT_FRAMEWORK);
		const task = def.areas[0].tasks[0];
		task.tools = [hostile, '+1 spare', '@SUM(A1)', "'=already quoted"];
		task.title = '-2+3 torque check';
		const text = toCsv(def);
		const cells = (parse(text, { bom: true }) as string[][]).flat();
		expect(cells).toContain(`'${hostile}`);
		expect(cells).not.toContain(hostile);
		const texts = cells.filter((cell) => !/^-?\d+(\.\d+)?$/.test(cell));
		expect(texts.some((cell) => /^[=+@-]/.test(cell))).toBe(false);
		const result = fromCsv(text);
		expect(result.ok ? [] : result.errors).toEqual([]);
		if (!result.ok) return;
		expect(result.def.areas[0].tasks[0].tools).toEqual(task.tools);
		expect(result.def.areas[0].tasks[0].title).toBe('-2+3 torque check');
		expect(result.def).toEqual(def);
	});

	it('keeps negative values as numbers', () => {
		const result = fromCsv(toCsv(DEFAULT_FRAMEWORK));
		const specs = result.ok ? result.def.areas.flatMap((a) => a.tasks).flatMap((t) => t.specs) : [];
		expect(specs.find((spec) => /toe-out/.test(spec.label))).toMatchObject({
			value: -1,
			unit: 'mm'
		});
		expect(specs.find((spec) => /freeze point/i.test(spec.label))).toMatchObject({ value: -37 });
	});
});
