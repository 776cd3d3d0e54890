import { IsOptional } from 'class-validator';
import { PersonNameField, UiLanguageField } from '../../users/dto/user-fields.js';

export class UpdateProfileDto {
  @IsOptional()
  @PersonNameField()
  name?: string;

  @IsOptional()
  @UiLanguageField()
  uiLanguage?: string;
}
