import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsInt, IsOptional, IsString, MaxLength, Min, MinLength } from 'class-validator';

/** The name of a Settings record: venue, gallery, station or exhibit. */
export const SettingsNameField = () =>
  applyDecorators(
    ApiProperty({ example: 'Moving Plates Hall' }),
    Transform(({ value }) => (typeof value === 'string' ? value.trim() : value)),
    IsString(),
    MinLength(1, { message: 'Enter a name.' }),
    MaxLength(160),
  );

/** The id of the record this one belongs to, in a body. */
export const ParentIdField = (description: string) =>
  applyDecorators(ApiProperty({ description }), IsInt({ message: `Choose the ${description}.` }), Min(1));

/** `?venueId=` and the like: narrows a list to one parent. */
export const ParentFilterField = () => applyDecorators(ApiPropertyOptional(), IsOptional(), Type(() => Number), IsInt(), Min(1));
