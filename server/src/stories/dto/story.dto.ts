import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsString, MaxLength, Min, MinLength } from 'class-validator';
import { AUDIENCES, STORY_STATES, type Audience, type StoryState } from '@mantlepiece/shared';
import { SearchField, SortField } from '../../common/list-query.js';
import { PageQuery } from '../../common/page.js';
import { LocaleTagField } from '../../venues/dto/locale-tag.js';

export const STORY_SORT_KEYS = ['title', 'updatedAt', 'createdAt', 'state'] as const;

const TitleField = () =>
  applyDecorators(
    ApiProperty({ example: 'Why does the sea floor sink?' }),
    Transform(({ value }) => (typeof value === 'string' ? value.trim() : value)),
    IsString(),
    MinLength(1, { message: 'Give the story a title.' }),
    MaxLength(200),
  );

export class CreateStoryDto {
  @TitleField()
  title: string;

  @ApiPropertyOptional({ nullable: true, description: 'The exhibit the story belongs to' })
  @IsOptional()
  @IsInt()
  @Min(1)
  exhibitId?: number | null;

  @ApiPropertyOptional({ enum: AUDIENCES, default: 'family' })
  @IsOptional()
  @IsIn(AUDIENCES, { message: `The audience is one of ${AUDIENCES.join(', ')}.` })
  audience?: Audience;

  @ApiPropertyOptional({ example: 'en', description: "BCP 47; by default the venue's source locale" })
  @IsOptional()
  @LocaleTagField()
  sourceLocale?: string;
}

export class UpdateStoryDto extends PartialType(CreateStoryDto) {}

export class ListStoriesQuery extends PageQuery {
  @SearchField()
  q?: string;

  @ApiPropertyOptional({ enum: STORY_STATES })
  @IsOptional()
  @IsIn(STORY_STATES)
  state?: StoryState;

  @ApiPropertyOptional()
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  exhibitId?: number;

  @ApiPropertyOptional({ enum: AUDIENCES })
  @IsOptional()
  @IsIn(AUDIENCES)
  audience?: Audience;

  @SortField(STORY_SORT_KEYS, '-updatedAt')
  sort: string = '-updatedAt';
}
