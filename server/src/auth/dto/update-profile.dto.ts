import { Omittable } from '../../common/validation.js';
import { PersonNameField, UiLanguageField } from '../../users/dto/user-fields.js';

export class UpdateProfileDto {
  @Omittable()
  @PersonNameField()
  name?: string;

  @Omittable()
  @UiLanguageField()
  uiLanguage?: string;
}
