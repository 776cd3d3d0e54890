import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsISO8601, IsOptional, IsString, MaxLength } from 'class-validator';
import { PageQuery } from '../../common/page.js';
import { QueryRowId } from '../../common/validation.js';

const WHEN = 'A date (YYYY-MM-DD, UTC) or a moment (ISO 8601)';
const WHEN_MESSAGE = { message: 'Use a date (YYYY-MM-DD, UTC) or a moment (ISO 8601).' };

export class ListAuditEventsQuery extends PageQuery {
  @ApiPropertyOptional({ description: 'Only events of this action, e.g. user.invited' })
  @IsOptional()
  @IsString()
  @MaxLength(64)
  action?: string;

  @ApiPropertyOptional({ description: 'Only events done by this person' })
  @IsOptional()
  @QueryRowId()
  actorId?: number;

  @ApiPropertyOptional({ description: 'Only events about this venue' })
  @IsOptional()
  @QueryRowId()
  venueId?: number;

  @ApiPropertyOptional({ description: `${WHEN}: events from then on` })
  @IsOptional()
  @IsISO8601({ strict: true }, WHEN_MESSAGE)
  from?: string;

  @ApiPropertyOptional({ description: `${WHEN}: events up to then; a date includes that whole day` })
  @IsOptional()
  @IsISO8601({ strict: true }, WHEN_MESSAGE)
  to?: string;
}
