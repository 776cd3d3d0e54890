import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize, IsArray, IsIn, IsInt, IsISO8601, IsOptional, IsString, IsUUID, Matches, Max, MaxLength, Min, ValidateIf, ValidateNested,
} from 'class-validator';
import { KIOSK_EVENT_TYPES, KIOSK_SWITCHES, type KioskEventType, type KioskSwitch } from '@mantlepiece/shared';
import { PageQuery } from '../../common/page.js';

export class HeartbeatDto {
  @ApiProperty({ nullable: true, description: 'The release the kiosk plays' })
  @ValidateIf((_, value) => value !== null)
  @IsInt()
  @Min(1)
  releaseId: number | null;

  @ApiProperty({ example: '0.1.0' })
  @IsString()
  @MaxLength(40)
  appVersion: string;

  @ApiProperty()
  @IsInt()
  @Min(0)
  uptimeS: number;

  @ApiProperty({ nullable: true })
  @ValidateIf((_, value) => value !== null)
  @IsInt()
  @Min(0)
  storageUsedBytes: number | null;

  @ApiProperty({ nullable: true })
  @ValidateIf((_, value) => value !== null)
  @IsString()
  @MaxLength(1000)
  lastError: string | null;
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

  @ApiPropertyOptional()
  @IsOptional()
  @IsInt()
  @Min(1)
  storyId?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsInt()
  @Min(1)
  panelId?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @Matches(/^[A-Za-z][A-Za-z0-9-]{0,59}$/)
  widgetType?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Matches(/^[A-Za-z][A-Za-z0-9_.-]{0,59}$/)
  param?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Matches(/^[A-Za-z]{2,3}(-[A-Za-z0-9]{2,8})*$/, { message: 'A BCP 47 language tag.' })
  @MaxLength(35)
  locale?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(86_400_000)
  dwellMs?: number;

  @ApiPropertyOptional({ enum: KIOSK_SWITCHES })
  @IsOptional()
  @IsIn(KIOSK_SWITCHES)
  switch?: KioskSwitch;
}

export class KioskEventsDto {
  @ApiProperty({ type: [KioskEventDto] })
  @IsArray()
  @ArrayMaxSize(500)
  @ValidateNested({ each: true })
  @Type(() => KioskEventDto)
  events: KioskEventDto[];
}

export class ListKiosksQuery extends PageQuery {
  @ApiPropertyOptional()
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  galleryId?: number;
}
