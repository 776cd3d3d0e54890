import { ApiProperty } from '@nestjs/swagger';
import { IsNotEmpty, IsString, MaxLength } from 'class-validator';

/** Only shape is checked here: whether the address exists is the 401's business, not a 400's. */
export class SignInDto {
  @ApiProperty({ example: 'curator@demo.test' })
  @IsString()
  @IsNotEmpty({ message: 'Enter your e-mail address.' })
  @MaxLength(254)
  email: string;

  @ApiProperty()
  @IsString()
  @IsNotEmpty({ message: 'Enter your password.' })
  @MaxLength(256)
  password: string;
}
