import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsOptional, IsString, Length } from 'class-validator';
import { SEARCH_KINDS, SEARCH_PAGE_SIZE, SEARCH_TEXT_LENGTH, type SearchKind } from '@mantlepiece/shared';
import { PageNumberField, PageSizeField } from '../../common/page.js';

/** `GET /api/search?q=&kind=&page=&pageSize=`: bounded text, and paging per kind. */
export class SearchQuery {
  @ApiProperty({ description: 'Words to look for in story titles, image file names and credits, and people’s names and addresses', minLength: SEARCH_TEXT_LENGTH.min, maxLength: SEARCH_TEXT_LENGTH.max })
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'Type the words to look for.' })
  @Length(SEARCH_TEXT_LENGTH.min, SEARCH_TEXT_LENGTH.max, { message: `Type ${SEARCH_TEXT_LENGTH.min} to ${SEARCH_TEXT_LENGTH.max} characters to search.` })
  q: string;

  @ApiPropertyOptional({ enum: SEARCH_KINDS, description: 'Only this kind, to page through its hits; every kind by default' })
  @IsOptional()
  @IsIn(SEARCH_KINDS)
  kind?: SearchKind;

  @PageNumberField()
  page: number = 1;

  @PageSizeField(SEARCH_PAGE_SIZE)
  pageSize: number = SEARCH_PAGE_SIZE.fallback;
}
