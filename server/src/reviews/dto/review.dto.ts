import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { QUEUE_SORT, VERDICTS, type QueueSort, type Verdict } from '@mantlepiece/shared';
import { SearchField, SortField } from '../../common/list-query.js';
import { PageQuery } from '../../common/page.js';
import { QueryRowId } from '../../common/validation.js';

export class RecordVerdictDto {
  @ApiProperty({ enum: VERDICTS })
  @IsIn(VERDICTS, { message: `The verdict is one of ${VERDICTS.join(', ')}.` })
  verdict: Verdict;

  @ApiPropertyOptional({ type: 'string', nullable: true, description: 'Required when asking for changes: what should change' })
  @IsOptional()
  @IsString()
  @MaxLength(5000)
  note?: string | null;
}

/** The oldest submission first, by default: a queue. */
export class ReviewQueueQuery extends PageQuery {
  @SearchField()
  q?: string;

  @ApiPropertyOptional({ description: "Only this venue's submissions (the studio's current venue); by default every venue where the caller reviews" })
  @IsOptional()
  @QueryRowId()
  venueId?: number;

  @SortField(QUEUE_SORT)
  sort: QueueSort = QUEUE_SORT.fallback;
}
