import { ApiProperty } from '@nestjs/swagger';
import { IsObject, IsString } from 'class-validator';

export class ValidateWidgetDto {
  @ApiProperty({ example: 'slope-force', description: 'A widget type from GET /api/widgets.' })
  @IsString()
  type!: string;

  // Checked by the widget's own schema in @mantlepiece/shared, which knows each type's fields.
  @ApiProperty({ example: { massKg: 10, angleDeg: 30, staticFriction: 0.85, kineticFriction: 0.6 } })
  @IsObject({ message: 'The parameters are an object of values by name.' })
  params!: unknown;
}
