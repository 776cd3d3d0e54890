import { applyDecorators } from '@nestjs/common';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import type { OrderItem } from 'sequelize';
import type { ListSort } from '@mantlepiece/shared';

/** A LIKE pattern that matches `text` literally anywhere: %, _ and \ typed by a person are not wildcards. */
export const likePattern = (text: string) => `%${text.trim().replace(/[\\%_]/g, '\\$&')}%`;

/** `?sort=-updatedAt` as an ORDER BY, with the id as tie-break so pages never overlap. */
export function orderOf(sort: string, columns: Record<string, string> = {}): OrderItem[] {
  const descending = sort.startsWith('-');
  const key = descending ? sort.slice(1) : sort;
  return [[columns[key] ?? key, descending ? 'DESC' : 'ASC'], ['id', 'ASC']];
}

/** `?sort=` of a list, checked against the list's values in shared (`STORY_SORT`, …), which the studio offers too. */
export const SortField = ({ values, fallback }: ListSort<string>) =>
  applyDecorators(ApiPropertyOptional({ enum: values, default: fallback }), IsOptional(), IsIn(values));

export const SearchField = () =>
  applyDecorators(ApiPropertyOptional({ description: 'Words to look for' }), IsOptional(), IsString(), MaxLength(200));
