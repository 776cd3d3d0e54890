import { ApiProperty } from '@nestjs/swagger';
import { IsString, MaxLength, MinLength } from 'class-validator';
import { NewPasswordField, PersonNameField } from '../../users/dto/user-fields.js';

export class AcceptInvitationDto {
  @ApiProperty()
  @IsString()
  @MinLength(1)
  @MaxLength(200)
  token: string;

  @PersonNameField()
  name: string;

  @NewPasswordField()
  password: string;
}
