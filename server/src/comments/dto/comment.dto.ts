import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsOptional, IsString, MaxLength, MinLength } from 'class-validator';
import { IsIntBetween, IsRowId, NestedObject, UNSIGNED_INT_MAX } from '../../common/validation.js';

const trimmed = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

/** Character offsets in the panel's source-locale text, and the text they held. */
export class CommentRangeDto {
  @ApiProperty()
  @IsIntBetween(0, UNSIGNED_INT_MAX)
  from: number;

  @ApiProperty()
  @IsIntBetween(0, UNSIGNED_INT_MAX)
  to: number;

  @ApiProperty()
  @IsString()
  @MaxLength(1000)
  quote: string;
}

export class CreateCommentDto {
  @ApiPropertyOptional({ type: 'integer', nullable: true, description: "A panel of the revision's snapshot; none for the story as a whole" })
  @IsOptional()
  @IsRowId()
  panelId?: number | null;

  @ApiPropertyOptional({ type: CommentRangeDto, nullable: true })
  @IsOptional()
  @NestedObject(() => CommentRangeDto)
  range?: CommentRangeDto | null;

  @ApiProperty({ example: 'Families may not know the word “friction”; can we say “grip”?' })
  @Transform(trimmed)
  @IsString()
  @MinLength(1, { message: 'Write the comment.' })
  @MaxLength(5000)
  body: string;

  @ApiPropertyOptional({ type: 'integer', nullable: true, description: 'The comment this one answers' })
  @IsOptional()
  @IsRowId()
  parentId?: number | null;
}

export class UpdateCommentDto {
  @ApiProperty()
  @IsBoolean()
  resolved: boolean;
}
