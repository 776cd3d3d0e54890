import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, ArrayUnique, IsArray } from 'class-validator';
import { PageQuery } from '../../common/page.js';
import { IsRowId, Omittable, QueryRowId } from '../../common/validation.js';

export class RequestReleaseDto {
  @ApiPropertyOptional({ type: [Number], description: 'Revisions to carry, one per story; by default the latest approved revision of every story of the gallery' })
  @Omittable()
  @IsArray()
  @ArrayMaxSize(500)
  @ArrayUnique({ message: 'Each revision appears once.' })
  @IsRowId({ each: true, message: 'A revision is named by its id.' })
  revisionIds?: number[];
}

export class ListReleasesQuery extends PageQuery {}

export class CompareReleasesQuery {
  @ApiProperty({ description: 'The release compared from' })
  @QueryRowId({ message: 'Name a release by its id.' })
  a: number;

  @ApiProperty({ description: 'The release compared to' })
  @QueryRowId({ message: 'Name a release by its id.' })
  b: number;
}
