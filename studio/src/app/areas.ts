import type { Role } from '@mantlepiece/shared';

/** The studio's areas, in the brief's order. Each is also the first segment of its URL. */
export const AREAS = ['stories', 'media', 'reviews', 'translations', 'releases', 'fleet', 'insights', 'people', 'settings'] as const;
export type Area = (typeof AREAS)[number];

/**
 * Which areas each role works in, most used first. This table is the one place the studio's
 * navigation comes from; the server guards the routes behind each area on its own.
 */
export const AREAS_BY_ROLE: Record<Role, readonly Area[]> = {
  admin: AREAS,
  curator: ['stories', 'media', 'reviews', 'insights'],
  educator: ['reviews', 'stories', 'insights'],
  translator: ['translations'],
  technician: ['releases', 'fleet', 'insights'],
};

/** Areas that have working pages; the rest show an honest "arrives later" state. */
export const BUILT_AREAS: ReadonlySet<Area> = new Set<Area>(['stories', 'media', 'reviews', 'translations', 'releases', 'fleet', 'insights', 'people', 'settings']);

/** A person with several roles sees each area once, in the order of their first role that has it. */
export function areasFor(roles: readonly Role[]): Area[] {
  return [...new Set(roles.flatMap((role) => AREAS_BY_ROLE[role]))];
}

export function canOpen(roles: readonly Role[], area: Area): boolean {
  return roles.some((role) => AREAS_BY_ROLE[role].includes(area));
}

export const isArea = (value: string | undefined): value is Area => AREAS.includes(value as Area);
