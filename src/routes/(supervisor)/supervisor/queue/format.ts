/** A repair order as people say it: 'RO 4411', without doubling a number already written 'RO-4411'. */
export const repairOrderLabel = (repairOrder: string) =>
	/^RO\b/i.test(repairOrder) ? repairOrder : `RO ${repairOrder}`;
