import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsOptional, IsString, MaxLength, MinLength } from 'class-validator';
import { AUDIENCES, STORY_SORT, STORY_STATES, type Audience, type StorySort, type StoryState } from '@mantlepiece/shared';
import { SearchField, SortField } from '../../common/list-query.js';
import { PageQuery } from '../../common/page.js';
import { IsRowId, Omittable, PatchType, QueryRowId } from '../../common/validation.js';
import { LocaleTagField } from '../../common/locale-tag.js';

const TitleField = () =>
  applyDecorators(
    ApiProperty({ example: 'Why does the sea floor sink?' }),
    Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value)),
    IsString(),
    MinLength(1, { message: 'Give the story a title.' }),
    MaxLength(200),
  );

/** What a story's details are; where it belongs is set when it is made. */
class StoryDetailsDto {
  @TitleField()
  title: string;

  @ApiPropertyOptional({ type: 'integer', nullable: true, description: 'The exhibit the story belongs to' })
  @IsOptional()
  @IsRowId()
  exhibitId?: number | null;

  @ApiProperty({ enum: AUDIENCES, default: 'family' })
  @Omittable()
  @IsIn(AUDIENCES, { message: `The audience is one of ${AUDIENCES.join(', ')}.` })
  audience?: Audience;

  @ApiProperty({ example: 'en', description: "BCP 47; by default the venue's source locale" })
  @Omittable()
  @LocaleTagField()
  sourceLocale?: string;
}

export class CreateStoryDto extends StoryDetailsDto {
  @ApiProperty({ description: "The venue the story belongs to: the exhibit's when it names one; needed when the author writes at several venues" })
  @Omittable()
  @IsRowId()
  venueId?: number;
}

/** A story stays at its venue; its exhibit may change to another of the same venue. */
export class UpdateStoryDto extends PatchType(StoryDetailsDto) {}

export class ListStoriesQuery extends PageQuery {
  @SearchField()
  q?: string;

  @ApiPropertyOptional({ enum: STORY_STATES })
  @IsOptional()
  @IsIn(STORY_STATES)
  state?: StoryState;

  @ApiPropertyOptional()
  @IsOptional()
  @QueryRowId()
  exhibitId?: number;

  @ApiPropertyOptional({ enum: AUDIENCES })
  @IsOptional()
  @IsIn(AUDIENCES)
  audience?: Audience;

  @ApiPropertyOptional({ description: "Only this venue's stories (the studio's current venue); by default every venue of the caller's" })
  @IsOptional()
  @QueryRowId()
  venueId?: number;

  @SortField(STORY_SORT)
  sort: StorySort = STORY_SORT.fallback;
}
