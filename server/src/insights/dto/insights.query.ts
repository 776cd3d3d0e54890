import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, Min } from 'class-validator';
import { OptionalDateOnlyField } from '../../common/date-only.js';

export class InsightsQuery {
  @ApiProperty()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  galleryId: number;

  @OptionalDateOnlyField('First day (UTC) counted; 29 days before `to` when left out')
  from?: string;

  @OptionalDateOnlyField('Last day (UTC) counted, included; today when left out')
  to?: string;
}
