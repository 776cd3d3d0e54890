import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional } from 'class-validator';
import type { Role } from '@mantlepiece/shared';
import { EmailField, LocalesField, PersonNameField, RolesField, UiLanguageField } from './user-fields.js';

export class InviteUserDto {
  @EmailField()
  email: string;

  @PersonNameField()
  name: string;

  @RolesField()
  roles: Role[];

  @LocalesField()
  locales: string[];

  /** The language of the invitation mail and of the new account's studio; the inviting admin's by default. */
  @ApiPropertyOptional()
  @IsOptional()
  @UiLanguageField()
  uiLanguage?: string;
}
