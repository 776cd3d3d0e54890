import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, Equals, IsArray, IsBoolean, IsIn, IsOptional } from 'class-validator';
import { PageQuery } from '../../common/page.js';
import { IsRowId, NestedObject, Omittable } from '../../common/validation.js';

export class ListNotificationsQuery extends PageQuery {
  @ApiPropertyOptional({ enum: ['true', 'false'], description: 'true: only unread ones' })
  @IsOptional()
  @IsIn(['true', 'false'])
  unread?: 'true' | 'false';
}

/** Either the ids to mark read, or all: true. */
export class MarkReadDto {
  @ApiProperty({ type: [Number] })
  @Omittable()
  @IsArray()
  @ArrayMaxSize(500)
  @IsRowId({ each: true })
  ids?: number[];

  @ApiProperty({ enum: [true] })
  @Omittable()
  @Equals(true, { message: 'Send all: true to mark every notification read.' })
  all?: true;
}

export class KindPreferenceDto {
  @IsBoolean()
  email: boolean;
}

const KindPreferenceField = () =>
  applyDecorators(ApiProperty({ type: KindPreferenceDto }), Omittable(), NestedObject(() => KindPreferenceDto));

/** `{[kind]: {email}}`, one property per NotificationKind; a kind left out keeps its setting. */
export class NotificationPreferencesDto {
  @KindPreferenceField()
  revision_submitted?: KindPreferenceDto;

  @KindPreferenceField()
  verdict?: KindPreferenceDto;

  @KindPreferenceField()
  comment_reply?: KindPreferenceDto;
}
