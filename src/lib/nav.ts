export type RoleName = 'apprentice' | 'supervisor' | 'coordinator' | 'admin';

export interface NavItem {
	href: string;
	label: string;
}

/** Navigation by role; every link points at a page that role may open. */
export const NAV: Record<RoleName, NavItem[]> = {
	apprentice: [{ href: '/apprentice', label: 'My progress' }],
	supervisor: [{ href: '/supervisor', label: 'My apprentices' }],
	coordinator: [{ href: '/coordinator', label: 'Cohorts' }],
	admin: [{ href: '/admin', label: 'Users' }]
};

export const ROLE_LABEL: Record<RoleName, string> = {
	apprentice: 'Apprentice',
	supervisor: 'Journeyworker',
	coordinator: 'Coordinator',
	admin: 'Administrator'
};
