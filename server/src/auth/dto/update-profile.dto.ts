import { ApiPropertyOptional } from '@nestjs/swagger';
import { Omittable } from '../../common/validation.js';
import { PersonNameField, UiLanguageField } from '../../users/dto/user-fields.js';

/** Either field may come alone: the language menu sends only the UI language. */
export class UpdateProfileDto {
  @ApiPropertyOptional()
  @Omittable()
  @PersonNameField()
  name?: string;

  @ApiPropertyOptional()
  @Omittable()
  @UiLanguageField()
  uiLanguage?: string;
}
