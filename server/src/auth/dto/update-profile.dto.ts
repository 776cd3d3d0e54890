import { Omittable } from '../../common/validation.js';
import { PersonNameField, UiLanguageField } from '../../users/dto/user-fields.js';

/** Either field may come alone: the language menu sends only the UI language. */
export class UpdateProfileDto {
  @Omittable()
  @PersonNameField()
  name?: string;

  @Omittable()
  @UiLanguageField()
  uiLanguage?: string;
}
