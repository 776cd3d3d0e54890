import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional } from 'class-validator';
import { PAGE_SIZE, type Page } from '@mantlepiece/shared';
import { ID_MAX, QueryInt } from './validation.js';

/** `?page=&pageSize=` of every paged list. A page number is bounded like a row id, so its offset stays an exact number. */
export class PageQuery {
  @ApiPropertyOptional({ default: 1, minimum: 1, maximum: ID_MAX })
  @IsOptional()
  @QueryInt(1, ID_MAX)
  page: number = 1;

  @ApiPropertyOptional({ default: PAGE_SIZE.fallback, minimum: 1, maximum: PAGE_SIZE.max })
  @IsOptional()
  @QueryInt(1, PAGE_SIZE.max)
  pageSize: number = PAGE_SIZE.fallback;
}

export const pageWindow = ({ page, pageSize }: PageQuery) => ({ limit: pageSize, offset: (page - 1) * pageSize });

export function toPage<T>(items: T[], total: number, { page, pageSize }: PageQuery): Page<T> {
  return { items, total, page, pageSize };
}
