import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, MaxLength } from 'class-validator';
import type { SubmitRequest } from '@mantlepiece/shared';

export class SubmitForReviewDto implements SubmitRequest {
  @ApiPropertyOptional({ description: 'A note to the educators, kept with the revision' })
  @IsOptional()
  @IsString()
  @MaxLength(5000)
  note?: string;
}
