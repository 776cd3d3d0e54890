import { ApiProperty, OmitType } from '@nestjs/swagger';
import { IsIn } from 'class-validator';
import { ORIENTATIONS, type Orientation } from '@mantlepiece/shared';
import { IsIntBetween, PatchType } from '../../common/validation.js';
import { ListSettingsQuery } from '../settings.service.js';
import { ParentFilterField, ParentIdField, SettingsNameField } from './settings-fields.js';

export class CreateStationDto {
  @ParentIdField('gallery')
  galleryId: number;

  @SettingsNameField()
  name: string;

  @ApiProperty({ example: 1920 })
  @IsIntBetween(320, 16_384)
  screenWidthPx: number;

  @ApiProperty({ example: 1080 })
  @IsIntBetween(320, 16_384)
  screenHeightPx: number;

  @ApiProperty({ enum: ORIENTATIONS })
  @IsIn(ORIENTATIONS, { message: `Orientation is ${ORIENTATIONS.join(' or ')}.` })
  orientation: Orientation;

  /** Reach ranges follow local building and accessibility codes; this only bounds typing errors. */
  @ApiProperty({ example: 1000, description: "Height of the screen's centre above the floor, mm" })
  @IsIntBetween(0, 5000)
  mountingHeightMm: number;
}

export class UpdateStationDto extends PatchType(OmitType(CreateStationDto, ['galleryId'] as const)) {}

export class ListStationsQuery extends ListSettingsQuery {
  @ParentFilterField()
  galleryId?: number;

  @ParentFilterField()
  venueId?: number;
}
