import type { FrameworkDef } from '$lib/framework/schema';
import { area as atx } from './atx';
import { area as brk } from './brk';
import { area as ele } from './ele';
import { area as eng } from './eng';
import { area as epf } from './epf';
import { area as hac } from './hac';
import { area as hvs } from './hvs';
import { area as mda } from './mda';
import { area as mlr } from './mlr';
import { area as saf } from './saf';
import { area as sus } from './sus';

/** The framework a new installation starts from; safety areas come first because they gate the rest. */
export const DEFAULT_FRAMEWORK: FrameworkDef = {
	name: 'Light-vehicle service technician',
	areas: [saf, hvs, mlr, eng, atx, mda, sus, brk, ele, hac, epf]
};
