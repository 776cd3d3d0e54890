import { applyDecorators } from '@nestjs/common';
import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, ArrayUnique, IsArray, IsEmail, IsIn, IsString, MaxLength, MinLength } from 'class-validator';
import { MAX_PASSWORD_LENGTH, MIN_PASSWORD_LENGTH, ROLES, UI_LANGUAGE_CODES } from '@mantlepiece/shared';
import { LocaleTagsField } from '../../common/locale-tag.js';
import { IsAcceptablePassword } from '../password-rules.js';

/** Field rules that several DTOs share, so an e-mail or a role list is checked the same everywhere. */
export const EmailField = () =>
  applyDecorators(
    ApiProperty({ example: 'someone@example.org' }),
    Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim().toLowerCase() : value)),
    IsEmail({}, { message: 'Enter a valid e-mail address.' }),
    MaxLength(254),
  );

export const PersonNameField = () =>
  applyDecorators(
    ApiProperty({ example: 'Noor Haddad' }),
    Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value)),
    IsString(),
    MinLength(1, { message: 'Enter a name.' }),
    MaxLength(120),
  );

/** `allowNone`: the roles a person holds at every venue, which may be none when their venues grant them. */
export const RolesField = ({ allowNone = false } = {}) =>
  applyDecorators(
    ApiProperty({ enum: ROLES, isArray: true }),
    IsArray(),
    ArrayMinSize(allowNone ? 0 : 1, { message: 'Choose at least one role.' }),
    ArrayUnique(),
    IsIn(ROLES, { each: true, message: `Each role must be one of ${ROLES.join(', ')}.` }),
  );

export const LocalesField = () =>
  applyDecorators(
    ApiProperty({ type: [String], example: ['fr', 'es'], description: 'BCP 47 tags a translator may translate into' }),
    IsArray(),
    ArrayUnique(),
    ArrayMaxSize(20),
    // The same rule and canonical form as a venue's locales, so a translator's pt-br meets the venue's pt-BR.
    LocaleTagsField(),
  );

export const UiLanguageField = () =>
  applyDecorators(
    ApiProperty({ enum: UI_LANGUAGE_CODES }),
    IsIn(UI_LANGUAGE_CODES, { message: `The UI language must be one of ${UI_LANGUAGE_CODES.join(', ')}.` }),
  );

/** A password someone chooses: the rules of shared's passwords.ts, and the list of common ones. */
export const NewPasswordField = () =>
  applyDecorators(
    ApiProperty({ minLength: MIN_PASSWORD_LENGTH, maxLength: MAX_PASSWORD_LENGTH }),
    IsAcceptablePassword(),
  );
