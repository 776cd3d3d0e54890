import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { applyDecorators } from '@nestjs/common';
import { ArrayMaxSize, ArrayUnique, IsArray, IsBoolean, IsIn, IsOptional, Matches, MaxLength } from 'class-validator';
import { Omittable, PatchType } from '../../common/validation.js';
import { LocaleTagField, LocaleTagsField } from '../../common/locale-tag.js';
import { SettingsNameField } from './settings-fields.js';
import { TimeZoneField } from './time-zone-field.js';

const SlugField = () =>
  applyDecorators(Matches(/^[a-z0-9]+(-[a-z0-9]+)*$/, { message: 'The key is lower-case letters and digits, words joined by "-".' }), MaxLength(80));

export class CreateVenueDto {
  @SettingsNameField()
  name: string;

  @ApiProperty({ example: 'basalt-point', description: "The venue's key in URLs and release bundles" })
  @SlugField()
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

  @ApiProperty({ enum: [1, 2], default: 1, description: 'How many different educators must approve a revision' })
  @Omittable()
  @IsIn([1, 2], { message: 'A revision needs 1 or 2 approvals.' })
  requiredApprovals?: number;

  @ApiProperty({ default: false, description: 'Whether a release may show the source text where a target locale is incomplete or stale' })
  @Omittable()
  @IsBoolean({ message: 'Say true or false.' })
  fallbackToSource?: boolean;

  @Omittable()
  @TimeZoneField()
  timeZone?: string;
}

export class UpdateVenueDto extends PatchType(CreateVenueDto) {}

/** `GET /api/kiosk/venue?slug=`: the venue a kiosk's install URL (`/kiosk/?venue=<slug>`) names. */
export class KioskVenueQuery {
  @ApiPropertyOptional({ example: 'basalt-point', description: "An unpaired kiosk's venue, by its key; a paired kiosk is answered its own" })
  @IsOptional()
  @SlugField()
  slug?: string;
}
