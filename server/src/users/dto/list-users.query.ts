import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { ROLES, type Role } from '@mantlepiece/shared';
import { PageQuery } from '../../common/page.js';
import { QueryRowId } from '../../common/validation.js';

export const USER_SORT_KEYS = ['name', 'email', 'createdAt', 'lastSignInAt'] as const;
export const USER_SORTS = USER_SORT_KEYS.flatMap((key) => [key, `-${key}`]);

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

  @ApiPropertyOptional({ enum: USER_SORTS, default: 'name' })
  @IsOptional()
  @IsIn(USER_SORTS)
  sort: string = 'name';
}
