import { SvelteSet } from 'svelte/reactivity';
import {
	applyFill,
	compactRows,
	liveProblems,
	singleTaskHours,
	splitSummary,
	taskRows,
	totalTenths,
	withTaskRows,
	type EntryValues,
	type RecentVehicle
} from './entry-values';

// Changing any of these changes what the others are checked against.
const TIME_FIELDS = ['hours', 'startTime', 'endTime', 'tasks'];

/** The log form's values with live checks; server messages show until the field is changed. */
export class EntryFormState {
	values = $state<EntryValues>({});
	rows = $state(1);
	server = $state<Record<string, string>>({});
	touched = new SvelteSet<string>();
	/** Set once the apprentice changes something, so opening the form stores no copy. */
	dirty = $state(false);
	/** The server's date: entries cannot be later than this. */
	today = $state('');

	total = $derived(totalTenths(this.values));
	live = $derived(liveProblems(this.values, this.rows, this.today));
	split = $derived(splitSummary(this.values, this.rows));

	constructor(values: EntryValues, rows: number, errors: Record<string, string>, today: string) {
		this.today = today;
		this.reset(values, rows, errors);
	}

	reset(values: EntryValues, rows: number, errors: Record<string, string> = {}) {
		this.rows = Math.max(1, rows);
		// Every row gets both keys, so each field binds to a string from the start.
		this.values = withTaskRows(values, taskRows(values, this.rows));
		this.server = { ...errors };
		this.touched.clear();
	}

	/** The message to show for a field: live once it has been changed, else the server's. */
	error(name: string): string | undefined {
		if (this.touched.has(name)) return this.live[name];
		return this.server[name] ?? (name === 'vin' && this.vinComplete ? this.live.vin : undefined);
	}

	/** A full-length VIN is checked as it is typed, not only after leaving the field. */
	get vinComplete() {
		return (this.values.vin ?? '').replace(/[\s-]/g, '').length >= 17;
	}

	/** Called as the apprentice types: keeps a single task's hours equal to the entry's. */
	typed() {
		this.dirty = true;
		const single = singleTaskHours(this.values, this.rows);
		if (single && this.values[single.key] !== single.value) this.values[single.key] = single.value;
	}

	/** Called when a field is left or a choice is made: its live message may now show. */
	changed(name: string) {
		const group = name.startsWith('tasks.') || TIME_FIELDS.includes(name) ? TIME_FIELDS : [];
		for (const field of [name, ...group]) this.touched.add(field);
		this.typed();
	}

	fill(fill: string, vehicles: RecentVehicle[]) {
		const next = applyFill(this.values, this.rows, fill, vehicles);
		this.values = next.values;
		this.rows = next.rows;
		this.dirty = true;
		const field = fill.split(':')[0];
		if (field === 'hours') this.changed('hours');
		if (field === 'vehicle') this.changed('vin');
		if (field === 'task' || field === 'remove') this.changed('tasks');
	}

	/** With JavaScript, empty task rows go: chips and search add rows as needed. */
	compact() {
		const next = compactRows(this.values, this.rows);
		this.values = next.values;
		this.rows = next.rows;
	}
}
