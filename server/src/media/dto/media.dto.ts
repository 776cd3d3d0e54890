import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, MaxLength, registerDecorator, ValidateIf } from 'class-validator';
import { Transform } from 'class-transformer';
import { MEDIA_MISSING_FILTERS, MEDIA_SORT, type MediaLicence, type MediaMissingFilter, type MediaSort } from '@mantlepiece/shared';
import { OptionalDateOnlyField } from '../../common/date-only.js';
import { SearchField, SortField } from '../../common/list-query.js';
import { PageQuery } from '../../common/page.js';
import { Omittable, QueryInt, QueryRowId } from '../../common/validation.js';
import { canonicalLocale } from '../../common/locale-tag.js';
import { SPDX_IDS } from '../licence-ids.js';

const MAX_ALT_LENGTH = 1000;

/** The form fields beside an upload's files. */
export class UploadMediaDto {
  @ApiPropertyOptional({ description: 'The venue the images belong to; needed when the uploader keeps images at several venues' })
  @IsOptional()
  @QueryRowId()
  venueId?: number;

  // Multer takes the files out of the body before validation; this only documents the form field they come in.
  @ApiProperty({ type: 'array', items: { type: 'string', format: 'binary' }, description: 'The images, each one under this field name' })
  file: unknown[];
}

export class ListMediaQuery extends PageQuery {
  @SearchField()
  q?: string;

  @ApiPropertyOptional({ enum: MEDIA_MISSING_FILTERS, description: 'Only assets without alt text, or without a credit line' })
  @IsOptional()
  @IsIn(MEDIA_MISSING_FILTERS)
  missing?: MediaMissingFilter;

  @ApiPropertyOptional({ description: 'Only assets whose licence ends within this many days (or has ended)' })
  @IsOptional()
  @QueryInt(0, 3650)
  expiringWithinDays?: number;

  @ApiPropertyOptional({ description: "Only this venue's images (the studio's current venue); by default every venue of the caller's" })
  @IsOptional()
  @QueryRowId()
  venueId?: number;

  @SortField(MEDIA_SORT)
  sort: MediaSort = MEDIA_SORT.fallback;
}

/** Why a licence value is refused, or null when it is one of the two shapes of MediaLicence. */
export function licenceProblem(value: unknown): string | null {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return 'A licence is {kind: "spdx", id} or {kind: "all-rights-reserved", holder}.';
  const { kind, ...rest } = value as Record<string, unknown>;
  const keys = Object.keys(rest);
  if (kind === 'spdx') {
    if (keys.length !== 1 || typeof rest.id !== 'string' || !SPDX_IDS.has(rest.id)) return 'Use an SPDX licence identifier such as CC-BY-4.0 or CC0-1.0.';
    return null;
  }
  if (kind === 'all-rights-reserved') {
    const holder = rest.holder;
    if (keys.length !== 1 || typeof holder !== 'string' || holder.trim().length === 0 || holder.length > 200) return 'Name who holds the rights (up to 200 characters).';
    return null;
  }
  return 'A licence is {kind: "spdx", id} or {kind: "all-rights-reserved", holder}.';
}

export function altTextsProblem(value: unknown): string | null {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return 'Alt text is an object of texts by locale, such as {"en": "…"}.';
  const seen = new Map<string, string>();
  for (const [locale, text] of Object.entries(value)) {
    const canonical = canonicalLocale(locale);
    if (canonical === null) return `"${locale}" is not a BCP 47 language tag, such as en or pt-BR.`;
    if (seen.has(canonical)) return `"${seen.get(canonical)}" and "${locale}" are the same language (${canonical}); give its alt text once.`;
    seen.set(canonical, locale);
    if (typeof text !== 'string' || text.length > MAX_ALT_LENGTH) return `The ${locale} alt text must be text of at most ${MAX_ALT_LENGTH} characters.`;
  }
  return null;
}

/** Alt texts keyed by canonical tags (pt-br → pt-BR), as they are stored; anything else is left for the check to refuse. */
const canonicalAltKeys = (value: unknown): unknown =>
  typeof value === 'object' && value !== null && !Array.isArray(value) && altTextsProblem(value) === null
    ? Object.fromEntries(Object.entries(value).map(([locale, text]) => [canonicalLocale(locale)!, text]))
    : value;

const ValidWith = (problem: (value: unknown) => string | null) => (target: object, propertyName: string | symbol) =>
  registerDecorator({
    name: `valid-${String(propertyName)}`,
    target: target.constructor,
    propertyName: String(propertyName),
    validator: { validate: (value: unknown) => problem(value) === null, defaultMessage: (args) => problem(args?.value) ?? '' },
  });

export class UpdateMediaDto {
  @ApiPropertyOptional({ type: 'string', nullable: true, example: 'Illustration: Basalt Point Earth Science Centre' })
  @IsOptional()
  @IsString()
  @MaxLength(500)
  credit?: string | null;

  @ApiPropertyOptional({
    nullable: true,
    oneOf: [
      { type: 'object', properties: { kind: { type: 'string', enum: ['spdx'] }, id: { type: 'string' } }, required: ['kind', 'id'], additionalProperties: false },
      { type: 'object', properties: { kind: { type: 'string', enum: ['all-rights-reserved'] }, holder: { type: 'string' } }, required: ['kind', 'holder'], additionalProperties: false },
    ],
    example: { kind: 'spdx', id: 'CC-BY-4.0' },
  })
  @ValidateIf((_dto, value) => value !== undefined && value !== null)
  @ValidWith(licenceProblem)
  licence?: MediaLicence | null;

  @OptionalDateOnlyField('Last day the licence allows showing the image')
  licenceExpiresOn?: string | null;

  @ApiProperty({
    type: 'object',
    additionalProperties: { type: 'string' },
    example: { en: 'A pan of soup with arrows rising in the middle' },
    description: 'Per locale; an empty text removes that locale',
  })
  @Omittable()
  @Transform(({ value }) => canonicalAltKeys(value))
  @ValidWith(altTextsProblem)
  alt?: Record<string, string>;
}
