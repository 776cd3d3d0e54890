import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, MaxLength } from 'class-validator';
import { PageQuery } from '../../common/page.js';

export class ListAuditEventsQuery extends PageQuery {
  @ApiPropertyOptional({ description: 'Only events of this action, e.g. user.invited' })
  @IsOptional()
  @IsString()
  @MaxLength(64)
  action?: string;
}
