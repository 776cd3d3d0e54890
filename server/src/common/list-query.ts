import { applyDecorators } from '@nestjs/common';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import type { OrderItem } from 'sequelize';

/** A LIKE pattern that matches `text` literally anywhere: %, _ and \ typed by a person are not wildcards. */
export const likePattern = (text: string) => `%${text.trim().replace(/[\\%_]/g, '\\$&')}%`;

/** `name` and `-name` for each key: the whitelist a `?sort=` is checked against. */
export const sortValues = (keys: readonly string[]) => keys.flatMap((key) => [key, `-${key}`]);

/** `?sort=-updatedAt` as an ORDER BY, with the id as tie-break so pages never overlap. */
export function orderOf(sort: string, columns: Record<string, string> = {}): OrderItem[] {
  const descending = sort.startsWith('-');
  const key = descending ? sort.slice(1) : sort;
  return [[columns[key] ?? key, descending ? 'DESC' : 'ASC'], ['id', 'ASC']];
}

export const SortField = (keys: readonly string[], fallback: string) =>
  applyDecorators(ApiPropertyOptional({ enum: sortValues(keys), default: fallback }), IsOptional(), IsIn(sortValues(keys)));

export const SearchField = () =>
  applyDecorators(ApiPropertyOptional({ description: 'Words to look for' }), IsOptional(), IsString(), MaxLength(200));
