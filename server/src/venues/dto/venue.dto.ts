import { ApiProperty, PartialType } from '@nestjs/swagger';
import { ArrayMaxSize, ArrayUnique, IsArray, Matches, MaxLength } from 'class-validator';
import { LocaleTagField, LocaleTagsField } from './locale-tag.js';
import { SettingsNameField } from './settings-fields.js';

export class CreateVenueDto {
  @SettingsNameField()
  name: string;

  @ApiProperty({ example: 'basalt-point', description: "The venue's key in URLs and release bundles" })
  @Matches(/^[a-z0-9]+(-[a-z0-9]+)*$/, { message: 'The key is lower-case letters and digits, words joined by "-".' })
  @MaxLength(80)
  slug: string;

  @ApiProperty({ example: 'en', description: 'BCP 47 tag stories are written in' })
  @LocaleTagField()
  sourceLocale: string;

  @ApiProperty({ type: [String], example: ['fr', 'es'], description: 'BCP 47 tags stories are translated into' })
  @IsArray()
  @ArrayMaxSize(20)
  @ArrayUnique({ message: 'Each target locale appears once.' })
  @LocaleTagsField()
  targetLocales: string[];
}

export class UpdateVenueDto extends PartialType(CreateVenueDto) {}
