import { ApiProperty } from '@nestjs/swagger';
import { INSIGHTS_DEFAULT_DAYS } from '@mantlepiece/shared';
import { OptionalDateOnlyField } from '../../common/date-only.js';
import { QueryRowId } from '../../common/validation.js';

export class InsightsQuery {
  @ApiProperty()
  @QueryRowId()
  galleryId: number;

  @OptionalDateOnlyField(`First day counted, a day of the venue's time zone; ${INSIGHTS_DEFAULT_DAYS - 1} days before \`to\` when left out`)
  from?: string;

  @OptionalDateOnlyField("Last day counted, included, a day of the venue's time zone; the venue's today when left out")
  to?: string;
}
