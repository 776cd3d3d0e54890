import { ApiProperty } from '@nestjs/swagger';
import { IsString, MaxLength } from 'class-validator';
import type { SubmitRequest } from '@mantlepiece/shared';
import { Omittable } from '../../common/validation.js';

export class SubmitForReviewDto implements SubmitRequest {
  @ApiProperty({ description: 'A note to the educators, kept with the revision' })
  @Omittable()
  @IsString()
  @MaxLength(5000)
  note?: string;
}
