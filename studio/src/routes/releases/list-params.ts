import { PAGE_SIZE } from '@mantlepiece/shared';
import type { ReleaseListParams } from '../../api/releases';
import { pageFrom, positiveId } from '../../components/lists/list-search';

export interface ReleasesView extends ReleaseListParams {
  galleryId: number | undefined;
  /** The build the page follows, kept in the URL so a reload keeps following it. */
  buildId: number | undefined;
}

export function readReleasesParams(search: URLSearchParams): ReleasesView {
  return { page: pageFrom(search), pageSize: PAGE_SIZE.fallback, galleryId: positiveId(search.get('gallery')), buildId: positiveId(search.get('build')) };
}
