import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsOptional } from 'class-validator';
import type { Role } from '@mantlepiece/shared';
import { LocalesField, PersonNameField, RolesField } from './user-fields.js';

export class UpdateUserDto {
  @IsOptional()
  @PersonNameField()
  name?: string;

  @IsOptional()
  @RolesField()
  roles?: Role[];

  @IsOptional()
  @LocalesField()
  locales?: string[];

  @ApiPropertyOptional()
  @IsOptional()
  @IsBoolean()
  active?: boolean;
}
