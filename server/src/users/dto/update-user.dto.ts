import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean } from 'class-validator';
import type { Role } from '@mantlepiece/shared';
import { Omittable } from '../../common/validation.js';
import { LocalesField, PersonNameField, RolesField } from './user-fields.js';

export class UpdateUserDto {
  @Omittable()
  @PersonNameField()
  name?: string;

  @Omittable()
  @RolesField()
  roles?: Role[];

  @Omittable()
  @LocalesField()
  locales?: string[];

  @ApiPropertyOptional()
  @Omittable()
  @IsBoolean()
  active?: boolean;
}
