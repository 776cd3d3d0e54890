import { applyDecorators } from '@nestjs/common';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional } from 'class-validator';
import { PAGE_SIZE, type Page } from '@mantlepiece/shared';
import { ID_MAX, QueryInt } from './validation.js';

/** `?page=`, 1 by default. A page number is bounded like a row id, so its offset stays an exact number. */
export const PageNumberField = () => applyDecorators(ApiPropertyOptional({ default: 1, minimum: 1, maximum: ID_MAX }), IsOptional(), QueryInt(1, ID_MAX));

/** `?pageSize=` within a list's limits in shared (`PAGE_SIZE`, `SEARCH_PAGE_SIZE`). */
export const PageSizeField = ({ fallback, max }: { fallback: number; max: number }) =>
  applyDecorators(ApiPropertyOptional({ default: fallback, minimum: 1, maximum: max }), IsOptional(), QueryInt(1, max));

/** `?page=&pageSize=` of every paged list. */
export class PageQuery {
  @PageNumberField()
  page: number = 1;

  @PageSizeField(PAGE_SIZE)
  pageSize: number = PAGE_SIZE.fallback;
}

export const pageWindow = ({ page, pageSize }: PageQuery) => ({ limit: pageSize, offset: (page - 1) * pageSize });

export function toPage<T>(items: T[], total: number, { page, pageSize }: PageQuery): Page<T> {
  return { items, total, page, pageSize };
}
