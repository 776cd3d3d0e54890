import { ApiProperty } from '@nestjs/swagger';
import { IsString, MaxLength, MinLength } from 'class-validator';
import { NewPasswordField } from '../../users/dto/user-fields.js';

export class CompletePasswordResetDto {
  @ApiProperty()
  @IsString()
  @MinLength(1)
  @MaxLength(200)
  token: string;

  @NewPasswordField()
  password: string;
}
