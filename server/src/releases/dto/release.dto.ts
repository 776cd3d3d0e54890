import { applyDecorators } from '@nestjs/common';
import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { ArrayMaxSize, ArrayUnique, IsArray } from 'class-validator';
import { PageQuery } from '../../common/page.js';
import { IsRowId, Omittable, QueryRowId } from '../../common/validation.js';

/** A query string's list of ids, written `?leaveOut=4,9` or `?leaveOut=4&leaveOut=9`; anything else is left for the checks to refuse. */
const fromQueryList = () =>
  Transform(({ value }: { value: unknown }) => [value].flat()
    .flatMap((item) => (typeof item === 'string' ? item.split(',') : [item]))
    .map((item) => (typeof item === 'string' && /^\d{1,10}$/.test(item) ? Number(item) : item)));

/** An optional list of distinct row ids, in a body or (`inQuery`) a query string. */
const RowIdList = (noun: 'revision' | 'story', description: string, inQuery = false) =>
  applyDecorators(
    ApiProperty({ type: [Number], description }),
    ...(inQuery ? [fromQueryList()] : []),
    Omittable(),
    IsArray(),
    ArrayMaxSize(500),
    ArrayUnique({ message: `Each ${noun} appears once.` }),
    IsRowId({ each: true, message: `A ${noun} is named by its id.` }),
  );

const REVISIONS = 'Revisions to carry, one per story; by default the latest approved revision of every story of the gallery';
const LEAVE_OUT = 'Stories to leave out of the release (those whose translations are missing), by story id';
const SHOW_IN_SOURCE = 'Stories whose untranslated texts kiosks show in the source language, by story id; only where the venue allows it';

/** What to build: which revisions, and what becomes of stories whose translations are missing. */
export class RequestReleaseDto {
  @RowIdList('revision', REVISIONS)
  revisionIds?: number[];

  @RowIdList('story', LEAVE_OUT)
  leaveOut?: number[];

  @RowIdList('story', SHOW_IN_SOURCE)
  showInSource?: number[];
}

/** The same choices as a build request, in the query string of its preview. */
export class ReleasePreviewQuery {
  @RowIdList('revision', REVISIONS, true)
  revisionIds?: number[];

  @RowIdList('story', LEAVE_OUT, true)
  leaveOut?: number[];

  @RowIdList('story', SHOW_IN_SOURCE, true)
  showInSource?: number[];
}

export type ReleaseChoices = Pick<RequestReleaseDto, 'leaveOut' | 'showInSource'>;

export class ListReleasesQuery extends PageQuery {}

export class CompareReleasesQuery {
  @ApiProperty({ description: 'The release compared from' })
  @QueryRowId({ message: 'Name a release by its id.' })
  a: number;

  @ApiProperty({ description: 'The release compared to' })
  @QueryRowId({ message: 'Name a release by its id.' })
  b: number;
}
