import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { UNIT_STATUSES, type UnitStatus } from '@mantlepiece/shared';
import { SearchField } from '../../common/list-query.js';
import { PageQuery } from '../../common/page.js';
import { IsIntBetween, QueryRowId, UNSIGNED_INT_MAX } from '../../common/validation.js';
import { LocaleTagField } from '../../common/locale-tag.js';

export class ListWorklistQuery extends PageQuery {
  @SearchField()
  q?: string;

  @ApiPropertyOptional({ example: 'fr', description: 'Only this target locale' })
  @IsOptional()
  @LocaleTagField()
  locale?: string;

  @ApiPropertyOptional({ description: "Only this venue's stories (the studio's current venue); by default every venue of the caller's" })
  @IsOptional()
  @QueryRowId()
  venueId?: number;
}

export class ListUnitsQuery extends PageQuery {
  @ApiPropertyOptional({ enum: UNIT_STATUSES })
  @IsOptional()
  @IsIn(UNIT_STATUSES, { message: `The status is one of ${UNIT_STATUSES.join(', ')}.` })
  status?: UnitStatus;
}

export class SaveTranslationUnitDto {
  @ApiProperty({ example: 'Le {1}roc{/1} monte de {2} cm par an', description: 'The translation in the display form; "" clears it' })
  @IsString()
  @MaxLength(10_000)
  text: string;

  @ApiProperty({ description: 'The version the translator started from; 0 for a unit never translated' })
  @IsIntBetween(0, UNSIGNED_INT_MAX)
  version: number;
}
