import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Max, Min } from 'class-validator';
import type { Page } from '@mantlepiece/shared';

/** `?page=&pageSize=` of every paged list. */
export class PageQuery {
  @ApiPropertyOptional({ default: 1, minimum: 1 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  page: number = 1;

  @ApiPropertyOptional({ default: 25, minimum: 1, maximum: 100 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(100)
  pageSize: number = 25;
}

export const pageWindow = ({ page, pageSize }: PageQuery) => ({ limit: pageSize, offset: (page - 1) * pageSize });

export function toPage<T>(items: T[], total: number, { page, pageSize }: PageQuery): Page<T> {
  return { items, total, page, pageSize };
}
