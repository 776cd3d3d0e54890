import { ApiPropertyOptional } from '@nestjs/swagger';
import type { Role } from '@mantlepiece/shared';
import { IsOptional } from 'class-validator';
import { IsRowId, Omittable } from '../../common/validation.js';
import { EmailField, LocalesField, PersonNameField, RolesField, UiLanguageField } from './user-fields.js';

export class InviteUserDto {
  @EmailField()
  email: string;

  @PersonNameField()
  name: string;

  /** The venue the invited person will work at; left out or null, only an organisation admin may invite, and the roles hold at every venue. */
  @ApiPropertyOptional({ type: 'integer', nullable: true, description: 'The venue whose roles the invitation grants; null for roles at every venue' })
  @IsOptional()
  @IsRowId()
  venueId?: number | null;

  @RolesField()
  roles: Role[];

  @LocalesField()
  locales: string[];

  /** The language of the invitation mail and of the new account's studio; the inviting admin's by default. */
  @Omittable()
  @UiLanguageField()
  uiLanguage?: string;
}
