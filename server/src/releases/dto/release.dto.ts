import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayUnique, IsArray, IsInt, IsOptional, Min } from 'class-validator';
import { PageQuery } from '../../common/page.js';

export class RequestReleaseDto {
  @ApiPropertyOptional({ type: [Number], description: 'Revisions to carry, one per story; by default the latest approved revision of every story of the gallery' })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(500)
  @ArrayUnique({ message: 'Each revision appears once.' })
  @IsInt({ each: true, message: 'A revision is named by its id.' })
  @Min(1, { each: true, message: 'A revision is named by its id.' })
  revisionIds?: number[];
}

export class ListReleasesQuery extends PageQuery {}

export class CompareReleasesQuery {
  @Type(() => Number)
  @IsInt({ message: 'Name a release by its id.' })
  @Min(1)
  a: number;

  @Type(() => Number)
  @IsInt({ message: 'Name a release by its id.' })
  @Min(1)
  b: number;
}
