import type { Role } from '@mantlepiece/shared';
import { LocalesField, RolesField } from './user-fields.js';

/** The roles (and, for a translator, the locales) a person holds at one venue. */
export class MembershipDto {
  @RolesField()
  roles: Role[];

  @LocalesField()
  locales: string[];
}
