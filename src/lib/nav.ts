export type RoleName = 'apprentice' | 'supervisor' | 'coordinator' | 'admin';

export interface NavItem {
	href: string;
	label: string;
}

/** Navigation by role; every link points at a page that role may open. */
export const NAV: Record<RoleName, NavItem[]> = {
	apprentice: [
		{ href: '/apprentice', label: 'My progress' },
		{ href: '/apprentice/log', label: 'My log' },
		{ href: '/apprentice/rti', label: 'Instruction' },
		{ href: '/apprentice/matrix', label: 'My matrix' },
		{ href: '/apprentice/certificates', label: 'Certificates' },
		{ href: '/tasks', label: 'Tasks' }
	],
	supervisor: [
		{ href: '/supervisor', label: 'My apprentices' },
		{ href: '/supervisor/queue', label: 'Review' },
		{ href: '/tasks', label: 'Tasks' }
	],
	coordinator: [
		{ href: '/coordinator', label: 'Cohorts' },
		{ href: '/coordinator/programmes', label: 'Rules' },
		{ href: '/coordinator/frameworks', label: 'Framework' },
		{ href: '/coordinator/rti', label: 'Instruction' },
		{ href: '/coordinator/certificates', label: 'Certificates' },
		{ href: '/tasks', label: 'Tasks' }
	],
	admin: [
		{ href: '/admin', label: 'Users' },
		{ href: '/admin/audit', label: 'Audit trail' }
	]
};

export const ROLE_LABEL: Record<RoleName, string> = {
	apprentice: 'Apprentice',
	supervisor: 'Journeyworker',
	coordinator: 'Coordinator',
	admin: 'Administrator'
};
