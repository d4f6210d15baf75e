import type { Unit } from '../units';

/** Whether a specification value is a target, a lower limit or an upper limit. */
export type SpecLimit = 'nominal' | 'minimum' | 'maximum';

export interface SpecDef {
	/** What the value is, e.g. "Wheel nut torque" or "Rotor lateral runout". */
	label: string;
	/** The value as entered, in `unit`. */
	value: number;
	unit: Unit;
	limit: SpecLimit;
}

export interface ChecklistItemDef {
	text: string;
	/** A step whose omission can hurt someone or damage the vehicle. */
	safety?: boolean;
}

export interface QuestionOptionDef {
	text: string;
	correct: boolean;
}

export interface QuestionDef {
	prompt: string;
	/** Two to six options; one correct makes a single-answer question, more makes multiple-answer. */
	options: QuestionOptionDef[];
	/** Shown after the attempt: why the right answer is right. */
	explanation: string;
}

export type ServiceInfoKind =
	| 'repair procedure'
	| 'specifications'
	| 'wiring diagram'
	| 'diagnostic procedure'
	| 'service bulletin'
	| 'maintenance schedule'
	| 'safety data sheet'
	| 'owner information';

export interface TaskDef {
	/** Our own scheme: area code, hyphen, two digits, e.g. "BRK-03". */
	code: string;
	title: string;
	description: string;
	tier: 1 | 2 | 3;
	/** 1 Observed, 2 Assisted, 3 Supervised, 4 Independent. */
	requiredLevel: 1 | 2 | 3 | 4;
	/** Minimum verified supervised hours before sign-off may be requested. */
	minHours: number;
	checklist: ChecklistItemDef[];
	specs: SpecDef[];
	tools: string[];
	cautions: string[];
	serviceInfo: ServiceInfoKind[];
	questions: QuestionDef[];
}

export interface AreaDef {
	/** Three capital letters, e.g. "BRK". */
	code: string;
	name: string;
	tasks: TaskDef[];
}
