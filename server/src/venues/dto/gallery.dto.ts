import { OmitType } from '@nestjs/swagger';
import { PatchType } from '../../common/validation.js';
import { ListSettingsQuery } from '../settings.service.js';
import { ParentFilterField, ParentIdField, SettingsNameField } from './settings-fields.js';

export class CreateGalleryDto {
  @ParentIdField('venue')
  venueId: number;

  @SettingsNameField()
  name: string;
}

/** A gallery stays in its venue: its stations and exhibits are set up for that building. */
export class UpdateGalleryDto extends PatchType(OmitType(CreateGalleryDto, ['venueId'] as const)) {}

export class ListGalleriesQuery extends ListSettingsQuery {
  @ParentFilterField()
  venueId?: number;
}
