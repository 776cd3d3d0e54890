import { ApiProperty } from '@nestjs/swagger';
import { IsString, Length, MaxLength } from 'class-validator';

export class CompletePairingDto {
  @ApiProperty({ description: 'The poll token pair/start gave the kiosk' })
  @IsString()
  @MaxLength(100)
  pollToken: string;
}

export class PairStationDto {
  @ApiProperty({ example: 'K7M-Q2P', description: 'The code the kiosk shows; spaces, dashes and case do not matter' })
  @IsString()
  @Length(1, 20, { message: 'Type the six characters the kiosk shows.' })
  pairingCode: string;
}
