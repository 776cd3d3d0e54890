import { useEffect, useState } from 'react';
import { directionOf, useReducedMotion } from '@mantlepiece/shared/kiosk';
import { kioskLanguages } from '../app/i18n';
import { Multilingual } from '../screens/Multilingual';
import type { PlayableRelease } from '../sync/playable-release';
import { storyImage, storyTitle } from './release-content';

/**
 * The idle screen of a kiosk with stories: one story highlight at a time, changing slowly (a
 * cross-fade of over a second, far from any flash threshold), still under reduced motion. A
 * touch anywhere begins a visit.
 */
export function AttractLoop({ release, intervalMs, onBegin }: { release: PlayableRelease; intervalMs: number; onBegin: () => void }) {
  const { manifest } = release;
  const reducedMotion = useReducedMotion();
  const [index, setIndex] = useState(0);
  const stories = manifest.stories;

  useEffect(() => {
    if (stories.length < 2) return undefined;
    // Under reduced motion the highlight still changes, only half as often and without a fade.
    const timer = setInterval(() => setIndex((current) => (current + 1) % stories.length), reducedMotion ? intervalMs * 2 : intervalMs);
    return () => clearInterval(timer);
  }, [stories.length, intervalMs, reducedMotion]);

  const story = stories[index % Math.max(1, stories.length)];
  const title = story ? storyTitle(story, manifest.venue.sourceLocale, manifest) : null;
  const imageId = story ? storyImage(story, manifest) : undefined;
  const image = imageId ? release.imageUrls.get(imageId) : undefined;
  return (
    <button type="button" className="attract" onClick={onBegin} data-reduced-motion={reducedMotion || undefined}>
      <span className="strata" aria-hidden="true" />
      <span className="venue venue-small">{manifest.venue.name}</span>
      {title ? (
        <span key={story!.id} className="highlight" lang={title.locale} dir={directionOf(title.locale)}>
          {image ? <img src={image} alt="" className="highlight-image" /> : null}
          <span className="highlight-title">{title.text}</span>
        </span>
      ) : null}
      <span className="touch">
        <span className="touch-ring" aria-hidden="true" />
        <span className="touch-text">
          <Multilingual languages={kioskLanguages(manifest.venue.locales)} inline>{(t) => t('attract.touch')}</Multilingual>
        </span>
      </span>
    </button>
  );
}
