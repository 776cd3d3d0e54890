import { ApiProperty } from '@nestjs/swagger';
import { OptionalDateOnlyField } from '../../common/date-only.js';
import { QueryRowId } from '../../common/validation.js';

export class InsightsQuery {
  @ApiProperty()
  @QueryRowId()
  galleryId: number;

  @OptionalDateOnlyField('First day (UTC) counted; 29 days before `to` when left out')
  from?: string;

  @OptionalDateOnlyField('Last day (UTC) counted, included; today when left out')
  to?: string;
}
