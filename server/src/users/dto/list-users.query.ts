import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { ROLES, USER_SORT, type Role, type UserSort } from '@mantlepiece/shared';
import { SortField } from '../../common/list-query.js';
import { PageQuery } from '../../common/page.js';
import { QueryRowId } from '../../common/validation.js';

export class ListUsersQuery extends PageQuery {
  @ApiPropertyOptional({ description: 'Part of a name or an e-mail address' })
  @IsOptional()
  @IsString()
  @MaxLength(120)
  q?: string;

  @ApiPropertyOptional({ enum: ROLES })
  @IsOptional()
  @IsIn(ROLES)
  role?: Role;

  @ApiPropertyOptional({ description: 'Only people who hold roles at this venue (by a membership there or at every venue)' })
  @IsOptional()
  @QueryRowId()
  venueId?: number;

  @ApiPropertyOptional({ enum: ['true', 'false'] })
  @IsOptional()
  @IsIn(['true', 'false'])
  active?: 'true' | 'false';

  @SortField(USER_SORT)
  sort: UserSort = USER_SORT.fallback;
}
