import { describe, expect, it } from 'vitest';
import { ROLES } from '@mantlepiece/shared';
import { AREAS, AREAS_BY_ROLE, areasFor, canOpen } from './areas';

describe('role → area table', () => {
  it('gives every role at least one area and the admin all of them', () => {
    for (const role of ROLES) expect(AREAS_BY_ROLE[role].length, role).toBeGreaterThan(0);
    expect(areasFor(['admin'])).toEqual([...AREAS]);
  });

  it('keeps the educator on Reviews first and the translator on Translations only', () => {
    expect(areasFor(['educator'])).toEqual(['reviews', 'stories', 'insights']);
    expect(areasFor(['translator'])).toEqual(['translations']);
  });

  it('lists each area once for a person with several roles', () => {
    expect(areasFor(['curator', 'technician'])).toEqual(['stories', 'media', 'reviews', 'insights', 'releases', 'fleet']);
  });

  it('opens People to admins only', () => {
    expect(ROLES.filter((role) => canOpen([role], 'people'))).toEqual(['admin']);
  });
});
