export type RoleName = 'apprentice' | 'supervisor' | 'coordinator' | 'admin';

export interface NavItem {
	href: string;
	label: string;
}

/** Navigation by role; every link points at a page that role may open. */
export const NAV: Record<RoleName, NavItem[]> = {
	apprentice: [
		{ href: '/apprentice', label: 'My progress' },
		{ href: '/tasks', label: 'Tasks' }
	],
	supervisor: [
		{ href: '/supervisor', label: 'My apprentices' },
		{ href: '/tasks', label: 'Tasks' }
	],
	coordinator: [
		{ href: '/coordinator', label: 'Cohorts' },
		{ href: '/coordinator/frameworks', label: 'Framework' },
		{ href: '/tasks', label: 'Tasks' }
	],
	admin: [{ href: '/admin', label: 'Users' }]
};

export const ROLE_LABEL: Record<RoleName, string> = {
	apprentice: 'Apprentice',
	supervisor: 'Journeyworker',
	coordinator: 'Coordinator',
	admin: 'Administrator'
};
