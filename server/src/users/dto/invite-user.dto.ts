import { ApiPropertyOptional } from '@nestjs/swagger';
import type { Role } from '@mantlepiece/shared';
import { Omittable } from '../../common/validation.js';
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
  @Omittable()
  @UiLanguageField()
  uiLanguage?: string;
}
