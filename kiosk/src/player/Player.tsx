import { useCallback, useEffect, useMemo, useState } from 'react';
import { directionOf, type KioskSwitch } from '@mantlepiece/shared/kiosk';
import { useReducedMotion } from '@mantlepiece/shared/kiosk';
import type { KioskConfig } from '../app/config';
import { chromeLanguage, i18next } from '../app/i18n';
import type { VisitorEvent } from '../outbox/event-outbox';
import type { PlayableRelease } from '../sync/playable-release';
import { AttractLoop } from './AttractLoop';
import { IdleWarning } from './IdleWarning';
import { StoryMenu } from './StoryMenu';
import { StoryScreen } from './StoryScreen';
import { useIdleReset } from './use-idle-reset';
import { initialSettings, SWITCH_SETTING, type VisitorSettings } from './visitor-settings';
import { VisitorBar } from './VisitorBar';

export type PlayerScreen = { kind: 'attract' } | { kind: 'menu' } | { kind: 'story'; storyId: number; panelIndex: number };

/**
 * What a visitor sees of a release: the attract loop, the story menu and the stories, with the
 * language and accessibility choices, and the idle warning before everything resets.
 */
export function Player({ release, config, record, onScreen }: {
  release: PlayableRelease;
  config: KioskConfig;
  record: (event: VisitorEvent) => void;
  /** Told which screen shows, so a new release is switched to only on the attract loop. */
  onScreen?: (screen: PlayerScreen['kind']) => void;
}) {
  const { manifest } = release;
  const [screen, setScreen] = useState<PlayerScreen>({ kind: 'attract' });
  const [settings, setSettings] = useState<VisitorSettings>(() => initialSettings(manifest.venue.sourceLocale));
  const reducedMotion = useReducedMotion(settings.reducedMotion);
  const t = useMemo(() => i18next.getFixedT(chromeLanguage(settings.locale)), [settings.locale]);

  const reset = useCallback(() => {
    setScreen({ kind: 'attract' });
    setSettings(initialSettings(manifest.venue.sourceLocale));
  }, [manifest.venue.sourceLocale]);
  const idle = useIdleReset({ enabled: screen.kind !== 'attract', idleMs: config.idleMs, warningMs: config.warningMs, onReset: reset });

  useEffect(() => onScreen?.(screen.kind), [screen.kind, onScreen]);

  const chooseLocale = (locale: string) => {
    if (locale === settings.locale) return;
    setSettings((current) => ({ ...current, locale }));
    record({ type: 'language_chosen', locale });
  };
  const flip = (name: KioskSwitch, on: boolean) => {
    setSettings((current) => ({ ...current, [SWITCH_SETTING[name]]: on }));
    record({ type: 'switch_used', switch: name });
  };
  const openStory = (storyId: number) => {
    setScreen({ kind: 'story', storyId, panelIndex: 0 });
    record({ type: 'story_opened', storyId, locale: settings.locale });
  };

  if (screen.kind === 'attract') return <AttractLoop release={release} intervalMs={config.attractMs} onBegin={() => setScreen({ kind: 'menu' })} />;

  const story = screen.kind === 'story' ? manifest.stories.find((candidate) => candidate.id === screen.storyId) : undefined;
  return (
    <div
      className="player"
      lang={settings.locale}
      dir={directionOf(settings.locale)}
      data-large-text={settings.largeText || undefined}
      data-high-contrast={settings.highContrast || undefined}
      data-reduced-motion={reducedMotion || undefined}
    >
      {story && screen.kind === 'story' ? (
        <StoryScreen
          t={t}
          release={release}
          story={story}
          settings={settings}
          reducedMotion={reducedMotion}
          panelIndex={screen.panelIndex}
          onPanel={(panelIndex) => setScreen({ ...screen, panelIndex })}
          onExit={() => setScreen({ kind: 'menu' })}
          record={record}
        />
      ) : (
        <StoryMenu t={t} release={release} locale={settings.locale} onOpen={openStory} />
      )}
      <VisitorBar t={t} locales={manifest.venue.locales} settings={settings} onLocale={chooseLocale} onSwitch={flip} />
      {idle.secondsLeft !== null ? <IdleWarning t={t} secondsLeft={idle.secondsLeft} onStay={idle.stillHere} /> : null}
    </div>
  );
}
