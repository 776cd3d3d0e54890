import { useCallback } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { lookupText, type MediaView } from '@mantlepiece/shared';
import type { PanelMedia, ResolveMedia } from '@mantlepiece/shared/react';
import { mediaKey } from '../../api/media';

/** A panel on a 1920-px screen never needs a wider rendition than the screen. */
const PANEL_SIZES = '(orientation: portrait) 1080px, 1920px';

/** What the panel renderer needs of an asset, in one locale: renditions as a srcset, alt text (by RFC 4647 lookup, en for en-GB), credit. */
export function toPanelMedia(asset: MediaView, locale: string): PanelMedia {
  const renditions = [...asset.renditions].sort((a, b) => a.width - b.width);
  const middle = renditions.find((rendition) => rendition.width >= 1280) ?? renditions[renditions.length - 1];
  return {
    src: middle?.url ?? asset.placeholder,
    srcSet: renditions.map((rendition) => `${rendition.url} ${rendition.width}w`).join(', ') || undefined,
    sizes: PANEL_SIZES,
    alt: lookupText(asset.alt, [locale])?.text ?? '',
    credit: asset.credit ?? undefined,
    width: asset.width,
    height: asset.height,
  };
}

/**
 * Resolves a panel's `mediaId` from the query cache, synchronously, as the renderer asks. The
 * story page loads a panel's assets before its editor opens, and the picker caches what it lists.
 */
export function useResolveMedia(locale: string): ResolveMedia {
  const queryClient = useQueryClient();
  return useCallback(
    (mediaId: string) => {
      const asset = queryClient.getQueryData<MediaView>(mediaKey(Number(mediaId)));
      return asset ? toPanelMedia(asset, locale) : null;
    },
    [queryClient, locale],
  );
}
