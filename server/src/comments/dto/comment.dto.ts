import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsInt, IsOptional, IsString, MaxLength, Min, MinLength, ValidateNested } from 'class-validator';

const trimmed = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

/** Character offsets in the panel's source-locale text, and the text they held. */
export class CommentRangeDto {
  @ApiProperty()
  @IsInt()
  @Min(0)
  from: number;

  @ApiProperty()
  @IsInt()
  @Min(0)
  to: number;

  @ApiProperty()
  @IsString()
  @MaxLength(1000)
  quote: string;
}

export class CreateCommentDto {
  @ApiPropertyOptional({ nullable: true, description: "A panel of the revision's snapshot; none for the story as a whole" })
  @IsOptional()
  @IsInt()
  @Min(1)
  panelId?: number | null;

  @ApiPropertyOptional({ type: CommentRangeDto, nullable: true })
  @IsOptional()
  @ValidateNested()
  @Type(() => CommentRangeDto)
  range?: CommentRangeDto | null;

  @ApiProperty({ example: 'Families may not know the word “friction”; can we say “grip”?' })
  @Transform(trimmed)
  @IsString()
  @MinLength(1, { message: 'Write the comment.' })
  @MaxLength(5000)
  body: string;

  @ApiPropertyOptional({ nullable: true, description: 'The comment this one answers' })
  @IsOptional()
  @IsInt()
  @Min(1)
  parentId?: number | null;
}

export class UpdateCommentDto {
  @ApiProperty()
  @IsBoolean()
  resolved: boolean;
}
