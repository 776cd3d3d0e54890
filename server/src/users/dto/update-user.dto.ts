import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean } from 'class-validator';
import type { Role } from '@mantlepiece/shared';
import { Omittable } from '../../common/validation.js';
import { LocalesField, PersonNameField, RolesField } from './user-fields.js';

export class UpdateUserDto {
  @ApiPropertyOptional()
  @Omittable()
  @PersonNameField()
  name?: string;

  /** Roles held at every venue; none leaves the person with their venue memberships only. Only the organisation admin changes them. */
  @ApiPropertyOptional()
  @Omittable()
  @RolesField({ allowNone: true })
  roles?: Role[];

  /** Locales held at every venue; only the organisation admin changes them. */
  @ApiPropertyOptional()
  @Omittable()
  @LocalesField()
  locales?: string[];

  @ApiPropertyOptional()
  @Omittable()
  @IsBoolean()
  active?: boolean;
}
