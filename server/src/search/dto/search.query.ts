import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsOptional, IsString, Length } from 'class-validator';
import { SEARCH_KINDS, SEARCH_PAGE_SIZE, SEARCH_TEXT_LENGTH, type SearchKind } from '@mantlepiece/shared';
import { ID_MAX, QueryInt } from '../../common/validation.js';

/** `GET /api/search?q=&kind=&page=&pageSize=`: bounded text, and paging per kind. */
export class SearchQuery {
  @ApiProperty({ description: 'Words to look for in story titles, image file names and credits, and people’s names and addresses', minLength: SEARCH_TEXT_LENGTH.min, maxLength: SEARCH_TEXT_LENGTH.max })
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'Type the words to look for.' })
  @Length(SEARCH_TEXT_LENGTH.min, SEARCH_TEXT_LENGTH.max, { message: `Type ${SEARCH_TEXT_LENGTH.min} to ${SEARCH_TEXT_LENGTH.max} characters to search.` })
  q: string;

  @ApiPropertyOptional({ enum: SEARCH_KINDS, description: 'Only this kind, to page through its hits; every kind by default' })
  @IsOptional()
  @IsIn(SEARCH_KINDS)
  kind?: SearchKind;

  @ApiPropertyOptional({ default: 1, minimum: 1 })
  @IsOptional()
  @QueryInt(1, ID_MAX)
  page: number = 1;

  @ApiPropertyOptional({ default: SEARCH_PAGE_SIZE.fallback, minimum: 1, maximum: SEARCH_PAGE_SIZE.max })
  @IsOptional()
  @QueryInt(1, SEARCH_PAGE_SIZE.max)
  pageSize: number = SEARCH_PAGE_SIZE.fallback;
}
