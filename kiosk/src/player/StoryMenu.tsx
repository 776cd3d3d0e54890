import { useRef, type CSSProperties } from 'react';
import type { TFunction } from 'i18next';
import { directionOf, MoreBelowCue, useMoreBelow, type MoreBelowLook } from '@mantlepiece/shared/kiosk';
import type { PlayableRelease } from '../sync/playable-release';
import { menuGrid } from './menu-grid';
import { storyImage, storyTitle } from './release-content';

/** The cue that more cards wait below (many stories, or Larger text), in the menu's padding and colours. */
const MENU_MORE_BELOW: MoreBelowLook = { padBlock: '2rem', padInline: '3rem', fade: 'var(--deep)', surface: 'var(--deep-2)', text: 'var(--sand)', border: 'var(--magma)' };

/** Every story of the release as a large card, titled in the visitor's language, the cards sharing out the whole screen. */
export function StoryMenu({ t, release, locale, onOpen }: { t: TFunction; release: PlayableRelease; locale: string; onOpen: (storyId: number) => void }) {
  const { manifest } = release;
  const scroller = useRef<HTMLElement>(null);
  const moreBelow = useMoreBelow(scroller, manifest);
  const count = manifest.stories.length;
  const landscape = menuGrid(count, 'landscape');
  const portrait = menuGrid(count, 'portrait');
  // The stylesheet picks the pair for the screen's orientation.
  const grid = {
    '--menu-columns-landscape': landscape.columns,
    '--menu-rows-landscape': landscape.rows,
    '--menu-columns-portrait': portrait.columns,
    '--menu-rows-portrait': portrait.rows,
  } as CSSProperties;
  return (
    <main className="menu" ref={scroller}>
      <h1>{t('menu.title')}</h1>
      <ul className="story-cards" style={grid}>
        {manifest.stories.map((story) => {
          const title = storyTitle(story, locale, manifest);
          const imageId = storyImage(story, manifest);
          const image = imageId ? release.imageUrls.get(imageId) : undefined;
          return (
            <li key={story.id}>
              <button type="button" className="story-card" onClick={() => onOpen(story.id)}>
                {image ? <img src={image} alt="" /> : <span className="story-card-blank" aria-hidden="true" />}
                <span className="story-card-title" lang={title.locale} dir={directionOf(title.locale)}>{title.text}</span>
                <span className="story-card-count">{t('menu.panels', { count: story.panels.length })}</span>
              </button>
            </li>
          );
        })}
      </ul>
      {moreBelow ? <MoreBelowCue look={MENU_MORE_BELOW} /> : null}
    </main>
  );
}
