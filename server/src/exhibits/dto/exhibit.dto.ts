import { OmitType } from '@nestjs/swagger';
import { OptionalDateOnlyField } from '../../common/date-only.js';
import { PatchType } from '../../common/validation.js';
import { ParentFilterField, ParentIdField, SettingsNameField } from '../../venues/dto/settings-fields.js';
import { ListSettingsQuery } from '../../venues/settings.service.js';

export class CreateExhibitDto {
  @ParentIdField('gallery')
  galleryId: number;

  @SettingsNameField()
  name: string;

  @OptionalDateOnlyField('First day the exhibit is planned to open')
  plannedStart?: string | null;

  @OptionalDateOnlyField('Last day it is planned to run; media licences should outlast it')
  plannedEnd?: string | null;
}

export class UpdateExhibitDto extends PatchType(OmitType(CreateExhibitDto, ['galleryId'] as const)) {}

export class ListExhibitsQuery extends ListSettingsQuery {
  @ParentFilterField()
  galleryId?: number;

  @ParentFilterField()
  venueId?: number;
}
