import { useEffect, useLayoutEffect, useMemo, useRef, useState, type PointerEvent } from 'react';
import type { TFunction } from 'i18next';
import { directionOf, layoutOfScreen, type ReleaseStory } from '@mantlepiece/shared/kiosk';
import { PanelFrame, PanelView } from '@mantlepiece/shared/kiosk';
import type { VisitorEvent } from '../outbox/event-outbox';
import type { PlayableRelease } from '../sync/playable-release';
import { mediaResolver, panelDoc, panelsInOrder } from './release-content';
import { Chevron } from './Chevron';
import type { VisitorSettings } from './visitor-settings';
import { WidgetTouches } from './widget-touches';

/** A sideways drag this long, and mostly sideways, turns the panel. */
const SWIPE_PX = 80;

function useStageSize() {
  const stage = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState({ width: window.innerWidth, height: window.innerHeight });
  useLayoutEffect(() => {
    const element = stage.current;
    if (!element || typeof ResizeObserver === 'undefined') return undefined;
    const observer = new ResizeObserver(([entry]) => entry && setSize({ width: entry.contentRect.width, height: entry.contentRect.height }));
    observer.observe(element);
    return () => observer.disconnect();
  }, []);
  return { stage, size };
}

/** One story, panel by panel: swipe or the large previous/next buttons, widgets live under touch. */
export function StoryScreen({ t, release, story, settings, reducedMotion, panelIndex, onPanel, onExit, record }: {
  t: TFunction;
  release: PlayableRelease;
  story: ReleaseStory;
  settings: VisitorSettings;
  reducedMotion: boolean;
  panelIndex: number;
  onPanel: (index: number) => void;
  onExit: () => void;
  record: (event: VisitorEvent) => void;
}) {
  const { manifest } = release;
  const panels = useMemo(() => panelsInOrder(story), [story]);
  const panel = panels[Math.min(panelIndex, panels.length - 1)];
  const shown = panel ? panelDoc(story, panel, settings.locale, manifest) : null;
  const dir = directionOf(settings.locale);
  const { stage, size } = useStageSize();
  const layout = layoutOfScreen(size);
  const resolveMedia = useMemo(() => mediaResolver(release, shown?.locale ?? settings.locale), [release, shown?.locale, settings.locale]);
  const shownDoc = shown?.doc;
  const touches = useMemo(() => (panel && shownDoc ? new WidgetTouches(shownDoc, { storyId: story.id, panelId: panel.id }, record) : null), [panel, shownDoc, story.id, record]);
  const swipe = useRef<{ x: number; y: number } | null>(null);

  // Dwell is measured from when a panel appears until it goes (turned, left, or reset).
  useEffect(() => {
    if (!panel) return undefined;
    const shownAt = Date.now();
    return () => record({ type: 'panel_viewed', storyId: story.id, panelId: panel.id, locale: settings.locale, dwellMs: Date.now() - shownAt });
  }, [panel, story.id, settings.locale, record]);

  const go = (step: 1 | -1) => {
    const next = panelIndex + step;
    if (next >= 0 && next < panels.length) onPanel(next);
  };

  const onPointerDown = (event: PointerEvent) => {
    touches?.pointerDown(event.target);
    const onWidget = event.target instanceof Element && event.target.closest('.mp-widget') !== null;
    swipe.current = onWidget ? null : { x: event.clientX, y: event.clientY };
  };
  const onPointerUp = (event: PointerEvent) => {
    touches?.gestureEnded();
    const start = swipe.current;
    swipe.current = null;
    if (!start) return;
    const dx = event.clientX - start.x;
    const dy = event.clientY - start.y;
    if (!(Math.abs(dx) >= SWIPE_PX && Math.abs(dx) >= 1.5 * Math.abs(dy))) return;
    // Panels run in reading order: right to left in Arabic or Hebrew, so the drag is mirrored too.
    const towardsEnd = dir === 'rtl' ? dx > 0 : dx < 0;
    go(towardsEnd ? 1 : -1);
  };

  return (
    <main className="story" dir={dir} lang={settings.locale}>
      <div className="story-top">
        <button type="button" className="chip back-to-menu" onClick={onExit}>
          <Chevron towards="back" /> {t('story.allStories')}
        </button>
        <span className="position" aria-live="polite">{t('story.position', { current: panelIndex + 1, total: panels.length })}</span>
      </div>
      <div className="story-body">
        <button type="button" className="turn" onClick={() => go(-1)} disabled={panelIndex === 0} aria-label={t('story.previous')}>
          <Chevron towards="back" />
        </button>
        <div ref={stage} className="stage" onPointerDown={onPointerDown} onPointerUp={onPointerUp} onPointerCancel={() => { touches?.gestureEnded(); swipe.current = null; }}>
          {shown ? (
            <PanelFrame layout={layout} maxWidth={size.width} maxHeight={size.height}>
              <PanelView
                key={`${story.id}-${panel!.id}-${shown.locale}`}
                doc={shown.doc}
                locale={shown.locale}
                dir={directionOf(shown.locale)}
                layout={layout}
                largeText={settings.largeText}
                highContrast={settings.highContrast}
                reducedMotion={reducedMotion}
                resolveMedia={resolveMedia}
                links="text"
                widgetInput="touch"
                onVisitorParamsChange={(widgetId, params) => touches?.paramsChanged(widgetId, params)}
              />
            </PanelFrame>
          ) : null}
        </div>
        <button type="button" className="turn" onClick={() => go(1)} disabled={panelIndex >= panels.length - 1} aria-label={t('story.next')}>
          <Chevron towards="forward" />
        </button>
      </div>
      <ol className="dots" aria-hidden="true">
        {panels.map((item, index) => <li key={item.id} data-current={index === panelIndex || undefined} />)}
      </ol>
    </main>
  );
}
