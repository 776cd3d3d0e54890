import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, IsBoolean, IsIn, IsISO8601, IsOptional, IsString, IsUUID, Matches, MaxLength, ValidateIf } from 'class-validator';
import {
  APP_VERSION_PATTERN, KIOSK_ACCESS, KIOSK_EVENT_TYPES, KIOSK_SWITCHES, REPORT_TEXT_MAX, REPORT_TEXT_PATTERN, type KioskAccess, type KioskEventType, type KioskSwitch,
} from '@mantlepiece/shared';
import { PageQuery } from '../../common/page.js';
import { IsIntBetween, IsRowId, NestedObjects, Omittable, QueryRowId, UNSIGNED_BIGINT_MAX, UNSIGNED_INT_MAX } from '../../common/validation.js';
import { LocaleTagField } from '../../common/locale-tag.js';

/** A UTC instant as a kiosk writes it (toISOString), from the year 2000 on: inside what DATETIME holds. */
const UTC_INSTANT_FROM_2000 = /^[2-9]\d{3}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(\.\d{1,3})?Z$/;

export class HeartbeatDto {
  @ApiProperty({ type: 'integer', nullable: true, description: 'The release the kiosk plays' })
  @ValidateIf((_, value) => value !== null)
  @IsRowId()
  releaseId: number | null;

  @ApiProperty({ example: '0.1.0' })
  @IsString()
  @Matches(APP_VERSION_PATTERN, { message: 'appVersion must be a version of up to 40 letters, digits and . + - (such as 0.1.0).' })
  appVersion: string;

  @ApiProperty()
  @IsIntBetween(0, UNSIGNED_INT_MAX)
  uptimeS: number;

  @ApiProperty({ type: 'integer', nullable: true })
  @ValidateIf((_, value) => value !== null)
  @IsIntBetween(0, UNSIGNED_BIGINT_MAX)
  storageUsedBytes: number | null;

  @ApiProperty({ type: 'string', nullable: true, maxLength: REPORT_TEXT_MAX })
  @ValidateIf((_, value) => value !== null)
  @IsString()
  @MaxLength(REPORT_TEXT_MAX)
  @Matches(REPORT_TEXT_PATTERN, { message: 'lastError may hold letters, digits, punctuation, symbols and spaces only: no line breaks or control characters.' })
  lastError: string | null;

  @ApiPropertyOptional({ type: 'integer', nullable: true, description: 'The sequence of the publication the kiosk follows' })
  @IsOptional()
  @IsIntBetween(1, UNSIGNED_INT_MAX)
  publicationSequence?: number | null;

  @ApiPropertyOptional({ type: 'string', nullable: true, format: 'date-time' })
  @IsOptional()
  @IsISO8601({ strict: true })
  @Matches(UTC_INSTANT_FROM_2000, { message: 'publicationExpiresAt must be a UTC instant (…Z) from the year 2000 on.' })
  publicationExpiresAt?: string | null;

  @ApiProperty({ description: 'Whether that publication had expired by the kiosk’s clock' })
  @Omittable()
  @IsBoolean()
  publicationExpired?: boolean;
}

/** One visitor interaction. Only these fields: anything else (a name, a device id) is refused. */
export class KioskEventDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all')
  id: string;

  @ApiProperty({ enum: KIOSK_EVENT_TYPES })
  @IsIn(KIOSK_EVENT_TYPES)
  type: KioskEventType;

  @ApiProperty({ format: 'date-time' })
  @IsISO8601({ strict: true })
  at: string;

  @Omittable()
  @IsRowId()
  storyId?: number;

  @Omittable()
  @IsRowId()
  panelId?: number;

  @Omittable()
  @Matches(/^[A-Za-z][A-Za-z0-9-]{0,59}$/)
  widgetType?: string;

  @Omittable()
  @Matches(/^[A-Za-z][A-Za-z0-9_.-]{0,59}$/)
  param?: string;

  @Omittable()
  @LocaleTagField()
  locale?: string;

  @Omittable()
  @IsIntBetween(0, 86_400_000)
  dwellMs?: number;

  @ApiProperty({ enum: KIOSK_SWITCHES })
  @Omittable()
  @IsIn(KIOSK_SWITCHES)
  switch?: KioskSwitch;
}

export class KioskEventsDto {
  @ApiProperty({ type: [KioskEventDto] })
  @NestedObjects(() => KioskEventDto)
  @ArrayMaxSize(500)
  events: KioskEventDto[];
}

export class ListKiosksQuery extends PageQuery {
  @ApiPropertyOptional()
  @IsOptional()
  @QueryRowId()
  galleryId?: number;

  @ApiPropertyOptional({ enum: KIOSK_ACCESS, description: 'active: kiosks whose access stands; revoked: those whose access ended; left out, both' })
  @IsOptional()
  @IsIn(KIOSK_ACCESS, { message: `access is one of ${KIOSK_ACCESS.join(', ')}.` })
  access?: KioskAccess;

  @ApiPropertyOptional()
  @IsOptional()
  @QueryRowId()
  venueId?: number;
}
