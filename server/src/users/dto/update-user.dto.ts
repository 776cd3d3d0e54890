import { IsBoolean } from 'class-validator';
import type { Role } from '@mantlepiece/shared';
import { Omittable } from '../../common/validation.js';
import { LocalesField, PersonNameField, RolesField } from './user-fields.js';

export class UpdateUserDto {
  @Omittable()
  @PersonNameField()
  name?: string;

  /** Roles held at every venue; none leaves the person with their venue memberships only. Only the organisation admin changes them. */
  @Omittable()
  @RolesField({ allowNone: true })
  roles?: Role[];

  /** Locales held at every venue; only the organisation admin changes them. */
  @Omittable()
  @LocalesField()
  locales?: string[];

  @Omittable()
  @IsBoolean()
  active?: boolean;
}
