export const LEVELS = {
	1: 'Observed',
	2: 'Assisted',
	3: 'Supervised',
	4: 'Independent'
} as const;

export const TIERS = {
	1: { name: 'Tier 1', note: 'essential', mark: '●●●' },
	2: { name: 'Tier 2', note: 'core', mark: '●●○' },
	3: { name: 'Tier 3', note: 'broadening', mark: '●○○' }
} as const;

export const LIMIT_WORD = { nominal: 'Target', minimum: 'At least', maximum: 'At most' } as const;

export const hours = (h: number) => `${h.toLocaleString('en-US', { maximumFractionDigits: 1 })} h`;
