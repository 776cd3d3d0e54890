import { applyDecorators } from '@nestjs/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsOptional, IsString, MaxLength, MinLength } from 'class-validator';
import { IsRowId, QueryRowId } from '../../common/validation.js';

/** The name of a Settings record: venue, gallery, station or exhibit. */
export const SettingsNameField = () =>
  applyDecorators(
    ApiProperty({ example: 'Moving Plates Hall' }),
    Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value)),
    IsString(),
    MinLength(1, { message: 'Enter a name.' }),
    MaxLength(160),
  );

/** The id of the record this one belongs to, in a body. */
export const ParentIdField = (description: string) =>
  applyDecorators(ApiProperty({ description }), IsRowId({ message: `Choose the ${description}.` }));

/** `?venueId=` and the like: narrows a list to one parent. */
export const ParentFilterField = () => applyDecorators(ApiPropertyOptional(), IsOptional(), QueryRowId());
