import { applyDecorators } from '@nestjs/common';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, Equals, IsArray, IsBoolean, IsIn, IsInt, IsOptional, Min, ValidateNested } from 'class-validator';
import { PageQuery } from '../../common/page.js';

export class ListNotificationsQuery extends PageQuery {
  @ApiPropertyOptional({ enum: ['true', 'false'], description: 'true: only unread ones' })
  @IsOptional()
  @IsIn(['true', 'false'])
  unread?: 'true' | 'false';
}

/** Either the ids to mark read, or all: true. */
export class MarkReadDto {
  @ApiPropertyOptional({ type: [Number] })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(500)
  @IsInt({ each: true })
  @Min(1, { each: true })
  ids?: number[];

  @ApiPropertyOptional({ enum: [true] })
  @IsOptional()
  @Equals(true, { message: 'Send all: true to mark every notification read.' })
  all?: true;
}

export class KindPreferenceDto {
  @IsBoolean()
  email: boolean;
}

const KindPreferenceField = () =>
  applyDecorators(ApiPropertyOptional({ type: KindPreferenceDto }), IsOptional(), ValidateNested(), Type(() => KindPreferenceDto));

/** `{[kind]: {email}}`, one property per NotificationKind; a kind left out keeps its setting. */
export class NotificationPreferencesDto {
  @KindPreferenceField()
  revision_submitted?: KindPreferenceDto;

  @KindPreferenceField()
  verdict?: KindPreferenceDto;

  @KindPreferenceField()
  comment_reply?: KindPreferenceDto;
}
