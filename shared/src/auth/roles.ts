/** The staff roles of Mantlepiece (see the brief's "Who uses it"). A person may hold several. */
export const ROLES = ['admin', 'curator', 'educator', 'translator', 'technician'] as const;
export type Role = (typeof ROLES)[number];

export const isRole = (value: unknown): value is Role => ROLES.includes(value as Role);
