import { CsvError, parse, type Info } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import { frameworkDefSchema, type FrameworkDef } from '$lib/framework/schema';
import { parseUnit } from '$lib/units';

/**
 * Journeymark's framework file: one header row, then one row per item. The `record` column says
 * what the row is; `area`, `task` and `question` say what it belongs to; the order of rows is
 * the order on screen.
 */
export const CSV_COLUMNS = [
	'record',
	'area',
	'task',
	'question',
	'text',
	'detail',
	'tier',
	'required_level',
	'min_hours',
	'value',
	'unit',
	'limit',
	'safety',
	'correct'
] as const;

type Column = (typeof CSV_COLUMNS)[number];

const RECORD_KINDS = [
	'framework',
	'area',
	'task',
	'step',
	'spec',
	'tool',
	'caution',
	'info',
	'question',
	'option'
] as const;

type Kind = (typeof RECORD_KINDS)[number];

/** The columns each kind of row fills; any other column must be empty. */
const USES: Record<Kind, readonly Column[]> = {
	framework: ['text'],
	area: ['area', 'text'],
	task: ['area', 'task', 'text', 'detail', 'tier', 'required_level', 'min_hours'],
	step: ['area', 'task', 'text', 'safety'],
	spec: ['area', 'task', 'text', 'value', 'unit', 'limit'],
	tool: ['area', 'task', 'text'],
	caution: ['area', 'task', 'text'],
	info: ['area', 'task', 'text'],
	question: ['area', 'task', 'question', 'text', 'detail'],
	option: ['area', 'task', 'question', 'text', 'correct']
};

/** The column holding each field of the object a row becomes, for mapping schema errors back. */
const FIELD_COLUMNS: Record<Kind, Record<string, Column>> = {
	framework: {},
	area: { code: 'area', name: 'text' },
	task: {
		code: 'task',
		title: 'text',
		description: 'detail',
		tier: 'tier',
		requiredLevel: 'required_level',
		minHours: 'min_hours'
	},
	step: { text: 'text', safety: 'safety' },
	spec: { label: 'text', value: 'value', unit: 'unit', limit: 'limit' },
	tool: {},
	caution: {},
	info: {},
	question: { prompt: 'text', explanation: 'detail' },
	option: { text: 'text', correct: 'correct' }
};

/** Kinds whose whole row is one string in a list. */
const SINGLE_VALUE: ReadonlySet<Kind> = new Set(['framework', 'tool', 'caution', 'info']);

/** Kinds that belong to a task and hold one item of its card. */
const CARD_KINDS: ReadonlySet<Kind> = new Set([
	'step',
	'spec',
	'tool',
	'caution',
	'info',
	'question'
]);

export const MAX_CSV_BYTES = 5_000_000;

export type CsvRowError = { line: number; column: string | null; message: string };
export type CsvCounts = Record<
	'areas' | 'tasks' | 'steps' | 'specs' | 'tools' | 'cautions' | 'info' | 'questions' | 'options',
	number
>;
export type FromCsvResult =
	{ ok: true; def: FrameworkDef; counts: CsvCounts } | { ok: false; errors: CsvRowError[] };

// OWASP's list of characters that make a spreadsheet read a cell as a formula.
const FORMULA_START = /^'*[=+\-@\t\r]/;

/** A leading apostrophe makes spreadsheets show the text instead of running it as a formula. */
function defuse(text: string): string {
	return FORMULA_START.test(text) ? `'${text}` : text;
}

function restore(text: string): string {
	return text.startsWith("'") && FORMULA_START.test(text.slice(1)) ? text.slice(1) : text;
}

/** Plain decimal with a dot, never exponent notation, so every spreadsheet reads it back. */
function numberCell(value: number): string {
	const text = String(value);
	return /e/i.test(text) ? value.toFixed(20).replace(/\.?0+$/, '') : text;
}

function yesNo(value: boolean | undefined): string {
	return value ? 'yes' : 'no';
}

export function toCsv(def: FrameworkDef): string {
	const rows: string[][] = [[...CSV_COLUMNS]];
	const row = (kind: Kind, cells: Partial<Record<Column, string | number>>) =>
		rows.push(
			CSV_COLUMNS.map((column) => {
				const cell = column === 'record' ? kind : cells[column];
				if (cell === undefined) return '';
				return typeof cell === 'number' ? numberCell(cell) : defuse(cell);
			})
		);
	row('framework', { text: def.name });
	for (const area of def.areas) {
		row('area', { area: area.code, text: area.name });
		for (const task of area.tasks) {
			const owner = { area: area.code, task: task.code };
			row('task', {
				...owner,
				text: task.title,
				detail: task.description,
				tier: task.tier,
				required_level: task.requiredLevel,
				min_hours: task.minHours
			});
			for (const step of task.checklist) {
				row('step', { ...owner, text: step.text, safety: yesNo(step.safety) });
			}
			for (const spec of task.specs) {
				row('spec', {
					...owner,
					text: spec.label,
					value: spec.value,
					unit: spec.unit,
					limit: spec.limit
				});
			}
			for (const tool of task.tools) row('tool', { ...owner, text: tool });
			for (const caution of task.cautions) row('caution', { ...owner, text: caution });
			for (const kind of task.serviceInfo) row('info', { ...owner, text: kind });
			task.questions.forEach((question, index) => {
				const number = { ...owner, question: index + 1 };
				row('question', { ...number, text: question.prompt, detail: question.explanation });
				for (const option of question.options) {
					row('option', { ...number, text: option.text, correct: yesNo(option.correct) });
				}
			});
		}
	}
	// The byte-order mark tells spreadsheet programs the file is UTF-8 (N·m, °C, Ω).
	return stringify(rows, { bom: true, record_delimiter: 'windows' });
}

type Report = (line: number, column: string | null, message: string) => void;

/** One row of the file with its line as a spreadsheet numbers it. */
type Row = { line: number; kind: Kind; cell: (column: Column) => string };

type Source = { line: number; kind: Kind };

type Draft = {
	name: unknown;
	areas: { code: string; name: string; tasks: DraftTask[] }[];
};

type DraftTask = {
	code: string;
	title: string;
	description: string;
	tier: unknown;
	requiredLevel: unknown;
	minHours: unknown;
	checklist: { text: string; safety?: boolean }[];
	specs: { label: string; value: unknown; unit: string; limit: string }[];
	tools: string[];
	cautions: string[];
	serviceInfo: string[];
	questions: {
		prompt: string;
		options: { text: string; correct: boolean }[];
		explanation: string;
	}[];
};

function fileError(message: string): FromCsvResult {
	return { ok: false, errors: [{ line: 1, column: null, message }] };
}

function byteLength(text: string): number {
	return new TextEncoder().encode(text).byteLength;
}

export function fromCsv(text: string): FromCsvResult {
	if (text.length > MAX_CSV_BYTES || byteLength(text) > MAX_CSV_BYTES) {
		return fileError('The file is larger than 5 MB. Split the framework or remove unused rows.');
	}
	const records = readRecords(text);
	if (!Array.isArray(records)) return { ok: false, errors: [records] };
	if (records.every((record) => record.cells.every((cell) => cell.trim() === ''))) {
		return fileError('The file is empty. Start from an exported framework file.');
	}

	const errors: CsvRowError[] = [];
	const report: Report = (line, column, message) => errors.push({ line, column, message });

	const header = readHeader(records[0].cells, report);
	if (!header) return { ok: false, errors };
	const width = records[0].cells.length;

	const rows = records.slice(1).flatMap(({ cells, line }) => {
		const row = readRow(cells, line, header, width, report);
		return row ? [row] : [];
	});

	const sources = new Map<string, Source>();
	const draft = buildDraft(rows, sources, report);
	const parsed = frameworkDefSchema.safeParse(draft);
	if (!parsed.success) {
		for (const issue of parsed.error.issues) {
			// A missing framework row is already reported in words that say how to fix it.
			if (issue.path.join('.') === 'name' && !sources.has('name')) continue;
			const { line, column } = locate(issue.path, sources);
			report(line, column, issue.message);
		}
	}
	if (errors.length > 0 || !parsed.success) return { ok: false, errors: tidy(errors) };
	return { ok: true, def: parsed.data, counts: countsOf(parsed.data) };
}

/** A row with its kind checked and its cells looked up by column; null when blank or unusable. */
function readRow(
	cells: string[],
	line: number,
	header: Map<Column, number>,
	width: number,
	report: Report
): Row | null {
	if (cells.every((cell) => cell.trim() === '')) return null;
	if (cells.slice(width).some((cell) => cell.trim() !== '')) {
		report(line, null, 'This row has more cells than the header has columns.');
	}
	const cell = (column: Column) => restore((cells[header.get(column) ?? -1] ?? '').trim());
	const kind = cell('record').toLowerCase();
	if (!(RECORD_KINDS as readonly string[]).includes(kind)) {
		report(
			line,
			'record',
			kind === ''
				? `Say what the row is in the record column: ${RECORD_KINDS.join(', ')}.`
				: `Unknown record kind “${kind}”; use one of: ${RECORD_KINDS.join(', ')}.`
		);
		return null;
	}
	const row: Row = { line, kind: kind as Kind, cell };
	for (const column of CSV_COLUMNS) {
		if (column !== 'record' && !USES[row.kind].includes(column) && cell(column) !== '') {
			report(line, column, `The ${column} column is not used on ${row.kind} rows; leave it empty.`);
		}
	}
	return row;
}

/** The file's records with spreadsheet line numbers, or the one error that stopped reading. */
function readRecords(text: string): { cells: string[]; line: number }[] | CsvRowError {
	try {
		// With `info` each record comes with its position; the typings do not follow that option.
		const records = parse(text, {
			bom: true,
			info: true,
			relax_column_count: true,
			// A lone quote inside a cell, as in 1/2" drive, is kept as text.
			relax_quotes: true,
			skip_empty_lines: false
		}) as unknown as { record: string[]; info: Info }[];
		// Blank lines stay records, so the count matches the row numbers a spreadsheet shows.
		return records.map(({ record, info }) => ({ cells: record, line: info.records }));
	} catch (error) {
		if (!(error instanceof CsvError)) throw error;
		const line = (typeof error.records === 'number' ? error.records : 0) + 1;
		if (error.code === 'CSV_QUOTE_NOT_CLOSED') {
			return {
				line,
				column: null,
				message:
					'A quoted cell that starts on this line is never closed. Close it with " and write a quote inside a cell as "".'
			};
		}
		return { line, column: null, message: `The file is not valid CSV here (${error.code}).` };
	}
}

/** Header names written by hand may differ in case and use spaces for underscores. */
function readHeader(cells: string[], report: Report): Map<Column, number> | null {
	const header = new Map<Column, number>();
	let ok = true;
	cells.forEach((cell, index) => {
		const name = cell.trim().toLowerCase().replace(/\s+/g, '_');
		if (name === '') return;
		if (!(CSV_COLUMNS as readonly string[]).includes(name)) {
			report(
				1,
				cell.trim(),
				`Unknown column “${cell.trim()}”; the columns are: ${CSV_COLUMNS.join(', ')}.`
			);
			ok = false;
		} else if (header.has(name as Column)) {
			report(1, name, `The column ${name} appears twice.`);
			ok = false;
		} else {
			header.set(name as Column, index);
		}
	});
	for (const column of CSV_COLUMNS) {
		if (!header.has(column)) {
			report(
				1,
				column,
				`The header has no ${column} column; the first line must name every column.`
			);
			ok = false;
		}
	}
	return ok ? header : null;
}

type TaskEntry = { area: string; path: string; line: number; task: DraftTask };
type QuestionEntry = {
	path: string;
	line: number;
	options: DraftTask['questions'][number]['options'];
};

/** What the passes share while they turn rows into a draft for the schema to judge. */
type Builder = {
	draft: Draft;
	sources: Map<string, Source>;
	report: Report;
	areas: Map<string, { index: number; line: number }>;
	tasks: Map<string, TaskEntry>;
	questions: Map<string, QuestionEntry>;
};

function buildDraft(rows: Row[], sources: Map<string, Source>, report: Report): Draft {
	const builder: Builder = {
		draft: { name: undefined, areas: [] },
		sources,
		report,
		areas: new Map(),
		tasks: new Map(),
		questions: new Map()
	};
	// Parents first, so a row may name a task or question further down the file.
	for (const row of rows) {
		if (row.kind === 'framework') addFramework(builder, row);
		if (row.kind === 'area') addArea(builder, row);
	}
	if (builder.draft.name === undefined) {
		report(
			1,
			null,
			'The file has no framework row; add one with the framework’s name in the text column.'
		);
	}
	for (const row of rows) if (row.kind === 'task') addTask(builder, row);
	for (const row of rows) if (CARD_KINDS.has(row.kind)) addCardItem(builder, row);
	for (const row of rows) if (row.kind === 'option') addOption(builder, row);
	return builder.draft;
}

function remember(builder: Builder, path: string, row: Row) {
	builder.sources.set(path, { line: row.line, kind: row.kind });
}

function required(builder: Builder, row: Row, column: Column, what: string): string {
	const text = row.cell(column);
	if (text === '') builder.report(row.line, column, `Enter the ${what}.`);
	return text;
}

/** The cell as a number; NaN after reporting when it is not one, so the schema adds nothing new. */
function numberIn(builder: Builder, row: Row, column: Column): number | undefined {
	const text = row.cell(column);
	if (text === '') return undefined;
	if (/^-?(\d+(\.\d*)?|\.\d+)$/.test(text)) return Number(text);
	builder.report(
		row.line,
		column,
		/^-?\d*,\d+$/.test(text)
			? 'Use a dot for decimals, like 2.5.'
			: `Enter a number, like 140 or 2.5, not “${text}”.`
	);
	return Number.NaN;
}

function yesNoIn(builder: Builder, row: Row, column: Column, blank?: boolean): boolean {
	const text = row.cell(column).toLowerCase();
	if (text === 'yes') return true;
	if (text === 'no' || (text === '' && blank === false)) return false;
	builder.report(row.line, column, 'Write yes or no.');
	return false;
}

function addFramework(builder: Builder, row: Row) {
	if (builder.draft.name !== undefined) {
		builder.report(
			row.line,
			'record',
			'The file names its framework twice; keep one framework row.'
		);
		return;
	}
	builder.draft.name = row.cell('text');
	remember(builder, 'name', row);
}

function addArea(builder: Builder, row: Row) {
	const code = required(builder, row, 'area', 'area code');
	const earlier = builder.areas.get(code);
	if (earlier) {
		builder.report(row.line, 'area', `Area ${code} is already defined on line ${earlier.line}.`);
		return;
	}
	const index = builder.draft.areas.length;
	builder.areas.set(code, { index, line: row.line });
	remember(builder, `areas.${index}`, row);
	builder.draft.areas.push({ code, name: row.cell('text'), tasks: [] });
}

function addTask(builder: Builder, row: Row) {
	const areaCode = required(builder, row, 'area', 'area code');
	const code = required(builder, row, 'task', 'task code');
	const area = builder.areas.get(areaCode);
	if (areaCode !== '' && !area) {
		builder.report(row.line, 'area', `There is no area row for ${areaCode}.`);
		return;
	}
	const earlier = builder.tasks.get(code);
	if (earlier) {
		builder.report(row.line, 'task', `Task ${code} is already defined on line ${earlier.line}.`);
		return;
	}
	if (!area || code === '') return;
	const task: DraftTask = {
		code,
		title: row.cell('text'),
		description: row.cell('detail'),
		tier: numberIn(builder, row, 'tier'),
		requiredLevel: numberIn(builder, row, 'required_level'),
		minHours: numberIn(builder, row, 'min_hours'),
		checklist: [],
		specs: [],
		tools: [],
		cautions: [],
		serviceInfo: [],
		questions: []
	};
	const siblings = builder.draft.areas[area.index].tasks;
	const path = `areas.${area.index}.tasks.${siblings.length}`;
	remember(builder, path, row);
	builder.tasks.set(code, { area: areaCode, path, line: row.line, task });
	siblings.push(task);
}

/** The task a card row belongs to, after checking that its area and task cells agree. */
function ownerOf(builder: Builder, row: Row): TaskEntry | null {
	const areaCode = required(builder, row, 'area', 'area code');
	const code = required(builder, row, 'task', 'task code');
	if (code === '') return null;
	const found = builder.tasks.get(code);
	if (!found) {
		builder.report(row.line, 'task', `There is no task row for ${code}.`);
		return null;
	}
	if (areaCode !== '' && areaCode !== found.area) {
		builder.report(row.line, 'area', `Task ${code} is in area ${found.area}, not ${areaCode}.`);
		return null;
	}
	return found;
}

function addCardItem(builder: Builder, row: Row) {
	const owner = ownerOf(builder, row);
	if (!owner) return;
	const { task, path } = owner;
	const text = row.cell('text');
	switch (row.kind) {
		case 'step': {
			remember(builder, `${path}.checklist.${task.checklist.length}`, row);
			const safety = yesNoIn(builder, row, 'safety', false);
			task.checklist.push(safety ? { text, safety } : { text });
			break;
		}
		case 'spec': {
			remember(builder, `${path}.specs.${task.specs.length}`, row);
			const unit = row.cell('unit');
			task.specs.push({
				label: text,
				value: numberIn(builder, row, 'value'),
				unit: parseUnit(unit) ?? unit,
				limit: row.cell('limit').toLowerCase()
			});
			break;
		}
		case 'tool':
			remember(builder, `${path}.tools.${task.tools.length}`, row);
			task.tools.push(text);
			break;
		case 'caution':
			remember(builder, `${path}.cautions.${task.cautions.length}`, row);
			task.cautions.push(text);
			break;
		case 'info':
			remember(builder, `${path}.serviceInfo.${task.serviceInfo.length}`, row);
			task.serviceInfo.push(text.toLowerCase());
			break;
		case 'question':
			addQuestion(builder, row, owner);
	}
}

function questionNumber(builder: Builder, row: Row): number | null {
	const text = required(builder, row, 'question', 'question number');
	if (text === '') return null;
	if (/^\d+$/.test(text)) return Number(text);
	builder.report(row.line, 'question', 'Number the questions of a task 1, 2, 3 and so on.');
	return null;
}

function addQuestion(builder: Builder, row: Row, { task, path }: TaskEntry) {
	const number = questionNumber(builder, row);
	if (number === null) return;
	const key = `${task.code}#${number}`;
	const earlier = builder.questions.get(key);
	if (earlier) {
		builder.report(
			row.line,
			'question',
			`Question ${number} of ${task.code} is already defined on line ${earlier.line}.`
		);
		return;
	}
	const questionPath = `${path}.questions.${task.questions.length}`;
	remember(builder, questionPath, row);
	const question = { prompt: row.cell('text'), options: [], explanation: row.cell('detail') };
	builder.questions.set(key, { path: questionPath, line: row.line, options: question.options });
	task.questions.push(question);
}

function addOption(builder: Builder, row: Row) {
	const owner = ownerOf(builder, row);
	const number = questionNumber(builder, row);
	if (!owner || number === null) return;
	const question = builder.questions.get(`${owner.task.code}#${number}`);
	if (!question) {
		builder.report(row.line, 'question', `Task ${owner.task.code} has no question ${number}.`);
		return;
	}
	remember(builder, `${question.path}.options.${question.options.length}`, row);
	question.options.push({ text: row.cell('text'), correct: yesNoIn(builder, row, 'correct') });
}

/** The row and column a schema issue came from: the deepest path that a row produced. */
function locate(
	path: readonly PropertyKey[],
	sources: Map<string, Source>
): { line: number; column: string | null } {
	for (let length = path.length; length > 0; length--) {
		const found = sources.get(path.slice(0, length).join('.'));
		if (!found) continue;
		const field = path[length];
		if (field === undefined) {
			return { line: found.line, column: SINGLE_VALUE.has(found.kind) ? 'text' : null };
		}
		return { line: found.line, column: FIELD_COLUMNS[found.kind][String(field)] ?? null };
	}
	return { line: sources.get('name')?.line ?? 1, column: null };
}

/** One message per cell, the first found, in file order. */
function tidy(errors: CsvRowError[]): CsvRowError[] {
	const seen = new Set<string>();
	const order = (column: string | null) => CSV_COLUMNS.indexOf(column as Column);
	return errors
		.filter((error) => {
			const key = `${error.line}|${error.column ?? error.message}`;
			if (seen.has(key)) return false;
			seen.add(key);
			return true;
		})
		.sort((a, b) => a.line - b.line || order(a.column) - order(b.column));
}

function countsOf(def: FrameworkDef): CsvCounts {
	const tasks = def.areas.flatMap((area) => area.tasks);
	const total = (count: (task: (typeof tasks)[number]) => number) =>
		tasks.reduce((sum, task) => sum + count(task), 0);
	return {
		areas: def.areas.length,
		tasks: tasks.length,
		steps: total((task) => task.checklist.length),
		specs: total((task) => task.specs.length),
		tools: total((task) => task.tools.length),
		cautions: total((task) => task.cautions.length),
		info: total((task) => task.serviceInfo.length),
		questions: total((task) => task.questions.length),
		options: total((task) => task.questions.reduce((sum, q) => sum + q.options.length, 0))
	};
}
